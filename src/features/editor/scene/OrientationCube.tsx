import type { RefObject } from 'react';
import * as THREE from 'three';
import { useEditorStoreApi } from '../store/editorStore';
import { useScene } from './sceneContext';

type FaceName = 'front' | 'back' | 'right' | 'left' | 'top' | 'bottom';

/** Each face: its label, where the camera goes (target → camera), and its CSS placement on the cube. */
const FACES: { name: FaceName; label: string; direction: [number, number, number]; css: string }[] = [
  { name: 'front', label: 'Front', direction: [0, 0, 1], css: 'translateZ(var(--half))' },
  { name: 'back', label: 'Back', direction: [0, 0, -1], css: 'rotateY(180deg) translateZ(var(--half))' },
  { name: 'right', label: 'Right', direction: [1, 0, 0], css: 'rotateY(90deg) translateZ(var(--half))' },
  { name: 'left', label: 'Left', direction: [-1, 0, 0], css: 'rotateY(-90deg) translateZ(var(--half))' },
  { name: 'top', label: 'Top', direction: [0, 1, 0.001], css: 'rotateX(90deg) translateZ(var(--half))' },
  { name: 'bottom', label: 'Under', direction: [0, -1, 0.001], css: 'rotateX(-90deg) translateZ(var(--half))' },
];

interface OrientationCubeProps {
  /** The element the in-canvas sync turns with the camera (required; from useRef). */
  cubeRef: RefObject<HTMLDivElement | null>;
  /** Edge length of the cube, px (default 64). */
  size?: number;
}

/**
 * Slotwise's orientation cube: an HTML cube in the canvas corner that turns with the camera.
 * Clicking a face looks at the design from that side; the buttons below give the iso view and
 * fit everything. Being HTML it costs no draw calls and works with keyboard and touch.
 */
export function OrientationCube({ cubeRef, size = 64 }: OrientationCubeProps) {
  const store = useEditorStoreApi();
  const { aimCamera } = useScene();
  return (
    <div className="pointer-events-none absolute right-3 top-3 flex select-none flex-col items-center gap-2" aria-label="Camera views" role="group">
      <div className="pointer-events-auto" style={{ width: size + 24, height: size + 24, display: 'grid', placeItems: 'center' }}>
        <div ref={cubeRef} style={{ width: size, height: size, position: 'relative', transformStyle: 'preserve-3d', ['--half' as string]: `${size / 2}px` }}>
          {FACES.map((face) => (
            <button
              key={face.name}
              type="button"
              aria-label={`${face.label} view`}
              title={`${face.label} view`}
              onClick={() => aimCamera.current?.(new THREE.Vector3(...face.direction))}
              className="absolute inset-0 flex items-center justify-center border border-ink-muted/40 bg-paper-raised/85 text-[11px] font-medium uppercase tracking-wide text-ink-soft hover:border-accent hover:bg-accent-soft hover:text-accent-strong focus-visible:outline focus-visible:outline-2 focus-visible:outline-accent"
              style={{ transform: face.css, backfaceVisibility: 'hidden' }}
            >
              {face.label}
            </button>
          ))}
        </div>
      </div>
      <div className="pointer-events-auto flex gap-1">
        <button
          type="button"
          onClick={() => store.getState().requestView('iso')}
          className="min-h-[44px] min-w-[44px] rounded-md border border-paper-line bg-paper-raised/90 px-2 text-xs text-ink-soft hover:border-accent hover:text-accent-strong focus-visible:outline focus-visible:outline-2 focus-visible:outline-accent"
        >
          Iso
        </button>
        <button
          type="button"
          onClick={() => store.getState().requestFrame('all')}
          className="min-h-[44px] min-w-[44px] rounded-md border border-paper-line bg-paper-raised/90 px-2 text-xs text-ink-soft hover:border-accent hover:text-accent-strong focus-visible:outline focus-visible:outline-2 focus-visible:outline-accent"
        >
          Fit all
        </button>
      </div>
    </div>
  );
}

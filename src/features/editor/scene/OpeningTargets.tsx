import { useMemo } from 'react';
import type { ThreeEvent } from '@react-three/fiber';
import { findOpenings } from '@/domain/design/openings';
import { useEditorStore, useEditorStoreApi } from '../store/editorStore';
import { CLICK_SLOP_PX } from '@/components/viewer';
import { useScene } from '@/components/viewer';

/**
 * With the fill-opening tool, every frame opening (two parallel pairs of profiles bounding a
 * rectangle) shows as a translucent rectangle; clicking one hands its id to the store's
 * pickOpening. Few openings, so one small mesh each, sharing geometry and material. Takes no props.
 */
export function OpeningTargets() {
  const tool = useEditorStore((s) => s.tool);
  const design = useEditorStore((s) => s.design);
  const picked = useEditorStore((s) => s.pickedOpeningId);
  const store = useEditorStoreApi();
  const { resources, catalogue } = useScene();
  const openings = useMemo(() => (tool === 'fill-opening' ? findOpenings(design, catalogue) : []), [tool, design, catalogue]);
  if (openings.length === 0) return null;
  const geometry = resources.hardwareGeometry('plane');
  const material = resources.surface('opening');
  const pickedMaterial = resources.surface('preview');

  return (
    <group name="opening-targets">
      {openings.map((opening) => {
        const { normal, width, height, center } = opening.rect;
        // The plane faces +z; turn it to face the opening's normal with width and height on the other two axes.
        const rotation: [number, number, number] = normal === 'x' ? [0, Math.PI / 2, Math.PI / 2] : normal === 'y' ? [-Math.PI / 2, 0, 0] : [0, 0, 0];
        const scale: [number, number, number] = [width, height, 1];
        return (
          <mesh
            key={opening.id}
            geometry={geometry}
            material={opening.id === picked ? pickedMaterial : material}
            position={center}
            rotation={rotation}
            scale={scale}
            renderOrder={5}
            onClick={(e: ThreeEvent<MouseEvent>) => {
              if (e.delta > CLICK_SLOP_PX) return;
              e.stopPropagation();
              const state = store.getState() as { pickOpening?: (id: string | null) => void };
              state.pickOpening?.(opening.id);
            }}
          />
        );
      })}
    </group>
  );
}

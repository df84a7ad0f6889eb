import { useEffect, useMemo, useRef } from 'react';
import { useThree } from '@react-three/fiber';
import { TransformControls } from '@react-three/drei';
import * as THREE from 'three';
import { translateParts } from '@/domain/design/operations';
import type { DesignDocument } from '@/domain/design/schema';
import { formatLength } from '@/domain/units';
import { useEditorStore, useEditorStoreApi } from '../store/editorStore';
import { unitIncrement } from '../snapping/steps';
import { useScene } from '@/components/viewer';

interface MoveGizmoProps {
  /** Snap step for the drag, mm; default the unit increment (1 mm, or 1/16 in in inch units). */
  step?: number;
  /** On-screen size of the arrows (default 0.8). */
  size?: number;
}

/**
 * Translate arrows on the selected profiles and panels. A drag is one gesture: beginGesture on
 * press, a throttled previewDesign while moving (no React state per frame), endGesture on
 * release, so the whole move is one history entry. Orbiting pauses during the drag.
 */
export function MoveGizmo({ step, size = 0.8 }: MoveGizmoProps) {
  const store = useEditorStoreApi();
  const tool = useEditorStore((s) => s.tool);
  const selection = useEditorStore((s) => s.selection);
  const design = useEditorStore((s) => s.design);
  const units = useEditorStore((s) => s.units);
  const { gizmoBusy } = useScene();
  const invalidate = useThree((s) => s.invalidate);
  const proxy = useMemo(() => new THREE.Object3D(), []);
  const drag = useRef<{ startDesign: DesignDocument; origin: THREE.Vector3; ids: string[]; frame: number | null } | null>(null);

  const movable = useMemo(() => {
    const ids = new Set(selection);
    const profiles = design.profiles.filter((p) => ids.has(p.id));
    const panels = design.panels.filter((p) => ids.has(p.id));
    return { ids: [...profiles.map((p) => p.id), ...panels.map((p) => p.id)], origin: profiles[0]?.start ?? panels[0]?.rect.center ?? null };
  }, [selection, design]);

  useEffect(() => {
    // Between drags the arrows sit on the first selected part's start point (a grid point, so snapped offsets stay whole).
    if (drag.current || !movable.origin) return;
    proxy.position.set(...movable.origin);
    proxy.updateMatrixWorld();
    invalidate();
  }, [movable, proxy, invalidate]);

  const snap = step ?? unitIncrement(units);
  const visible = tool === 'select' && movable.ids.length > 0;

  const applyPreview = () => {
    const d = drag.current;
    if (!d) return;
    d.frame = null;
    const offset = proxy.position.clone().sub(d.origin);
    store.getState().previewDesign(translateParts(d.startDesign, d.ids, [offset.x, offset.y, offset.z]));
  };

  if (!visible) return null;
  return (
    <>
      <primitive object={proxy} />
      <TransformControls
        object={proxy}
        mode="translate"
        translationSnap={snap}
        size={size}
        onMouseDown={() => {
          gizmoBusy.current = true;
          const state = store.getState();
          state.beginGesture();
          drag.current = { startDesign: state.design, origin: proxy.position.clone(), ids: movable.ids, frame: null };
        }}
        onObjectChange={() => {
          const d = drag.current;
          if (d && d.frame === null) d.frame = requestAnimationFrame(applyPreview);
        }}
        onMouseUp={() => {
          const d = drag.current;
          if (d) {
            if (d.frame !== null) cancelAnimationFrame(d.frame);
            applyPreview();
            const distance = proxy.position.distanceTo(d.origin);
            drag.current = null;
            const what = d.ids.length === 1 ? '1 part' : `${d.ids.length} parts`;
            store.getState().endGesture(`Move ${what} ${formatLength(distance, store.getState().units)}`);
          }
          // The click that ends the drag must not clear the selection.
          setTimeout(() => {
            gizmoBusy.current = false;
          }, 0);
        }}
      />
    </>
  );
}

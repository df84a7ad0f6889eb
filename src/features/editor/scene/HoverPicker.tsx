import { useEffect } from 'react';
import { useThree } from '@react-three/fiber';
import * as THREE from 'three';
import { useEditorStoreApi } from '../store/editorStore';
import { partIdOfHit, useScene } from '@/components/viewer';

interface HoverPickerProps {
  /** Least time between two hover ray casts, ms (default 50). */
  intervalMs?: number;
}

/**
 * Hover without a ray cast per mouse event: at most one cast every `intervalMs` against the
 * pickable batches, writing the part under the pointer to the store's hoveredId.
 */
export function HoverPicker({ intervalMs = 50 }: HoverPickerProps) {
  const store = useEditorStoreApi();
  const { pickables, gizmoBusy } = useScene();
  const gl = useThree((s) => s.gl);
  const camera = useThree((s) => s.camera);

  useEffect(() => {
    const element = gl.domElement;
    const raycaster = new THREE.Raycaster();
    const ndc = new THREE.Vector2();
    let lastCast = 0;
    let pending: number | null = null;
    let lastEvent: PointerEvent | null = null;

    const cast = () => {
      pending = null;
      lastCast = performance.now();
      const e = lastEvent;
      const state = store.getState();
      if (!e || state.tool === 'draw-profile' || gizmoBusy.current || e.buttons !== 0) return;
      const rect = element.getBoundingClientRect();
      ndc.set(((e.clientX - rect.left) / rect.width) * 2 - 1, -((e.clientY - rect.top) / rect.height) * 2 + 1);
      raycaster.setFromCamera(ndc, camera);
      const hit = raycaster.intersectObjects([...pickables], true)[0];
      const id = hit ? partIdOfHit(hit.object, hit.instanceId) : null;
      state.setHovered(id);
      element.style.cursor = id && state.tool === 'select' ? 'pointer' : '';
    };

    const onMove = (e: PointerEvent) => {
      lastEvent = e;
      if (pending !== null) return;
      const wait = Math.max(0, intervalMs - (performance.now() - lastCast));
      pending = window.setTimeout(cast, wait);
    };
    const onLeave = () => {
      lastEvent = null;
      store.getState().setHovered(null);
      element.style.cursor = '';
    };
    element.addEventListener('pointermove', onMove);
    element.addEventListener('pointerleave', onLeave);
    return () => {
      if (pending !== null) window.clearTimeout(pending);
      element.removeEventListener('pointermove', onMove);
      element.removeEventListener('pointerleave', onLeave);
    };
  }, [gl, camera, store, pickables, gizmoBusy, intervalMs]);

  return null;
}

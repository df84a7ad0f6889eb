import { useEffect, useRef } from 'react';
import { useThree } from '@react-three/fiber';
import * as THREE from 'three';
import { partIdOfHit, useScene } from '../sceneContext';
import { CLICK_SLOP_PX } from '../useSelectOnClick';

export interface PickedPoint {
  /** World point on the part's surface, mm (design coordinates: Y up, front at -Z). */
  point: [number, number, number];
  partId: string | null;
}

/**
 * Calls `onPick` with the surface point under a click (not a drag) on a part, while `enabled`.
 * Clipped-away geometry is skipped, so a pick in a section view lands on the cut face behind.
 */
export function usePointPick(enabled: boolean, onPick: (picked: PickedPoint) => void): void {
  const { gl, camera } = useThree();
  const { pickables } = useScene();
  const onPickRef = useRef(onPick);
  onPickRef.current = onPick;

  useEffect(() => {
    if (!enabled) return;
    const element = gl.domElement;
    let down: { x: number; y: number } | null = null;
    const raycaster = new THREE.Raycaster();
    const onDown = (event: PointerEvent) => (down = { x: event.clientX, y: event.clientY });
    const onUp = (event: PointerEvent) => {
      if (!down || Math.hypot(event.clientX - down.x, event.clientY - down.y) > CLICK_SLOP_PX) return;
      down = null;
      const rect = element.getBoundingClientRect();
      const ndc = new THREE.Vector2(((event.clientX - rect.left) / rect.width) * 2 - 1, -((event.clientY - rect.top) / rect.height) * 2 + 1);
      raycaster.setFromCamera(ndc, camera);
      const planes = gl.clippingPlanes;
      const hits = raycaster.intersectObjects([...pickables], true).filter((hit) => planes.every((plane) => plane.distanceToPoint(hit.point) >= 0));
      const hit = hits[0];
      if (!hit) return;
      onPickRef.current({ point: [hit.point.x, hit.point.y, hit.point.z], partId: partIdOfHit(hit.object, hit.instanceId) });
    };
    element.addEventListener('pointerdown', onDown);
    element.addEventListener('pointerup', onUp);
    return () => {
      element.removeEventListener('pointerdown', onDown);
      element.removeEventListener('pointerup', onUp);
    };
  }, [enabled, gl, camera, pickables]);
}

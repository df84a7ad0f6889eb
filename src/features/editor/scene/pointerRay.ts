/** Pointer → world ray and a world-size tolerance for a pixel distance, for the scene tools. */
import * as THREE from 'three';
import type { Ray } from '../snapping/rayMath';

const raycaster = new THREE.Raycaster();
const ndc = new THREE.Vector2();

export function pointerRay(event: { clientX: number; clientY: number }, element: HTMLElement, camera: THREE.Camera): Ray {
  const rect = element.getBoundingClientRect();
  ndc.set(((event.clientX - rect.left) / rect.width) * 2 - 1, -((event.clientY - rect.top) / rect.height) * 2 + 1);
  raycaster.setFromCamera(ndc, camera);
  const { origin, direction } = raycaster.ray;
  return { origin: [origin.x, origin.y, origin.z], direction: [direction.x, direction.y, direction.z] };
}

/** Millimetres one CSS pixel covers at `distance` mm in front of a perspective camera. */
export function mmPerPixel(camera: THREE.Camera, element: HTMLElement, distance: number): number {
  const fov = (camera as THREE.PerspectiveCamera).fov ?? 40;
  return (2 * distance * Math.tan(THREE.MathUtils.degToRad(fov) / 2)) / Math.max(1, element.clientHeight);
}

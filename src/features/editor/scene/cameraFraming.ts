/** Camera placement maths for fitting parts and the standard views (pure, mm). */
import * as THREE from 'three';
import type { EditorView } from '../store/editorStore';
import type { PartAnchor } from './sceneLayout';

/** Direction from the target to the camera for each standard view (Y up). */
export const VIEW_DIRECTIONS: Record<EditorView, THREE.Vector3> = {
  front: new THREE.Vector3(0, 0, 1),
  side: new THREE.Vector3(1, 0, 0),
  // Not exactly straight down: orbit controls need a horizontal hint for "up" on screen.
  top: new THREE.Vector3(0, 1, 0.001).normalize(),
  iso: new THREE.Vector3(1, 0.8, 1.3).normalize(),
};

/** The sphere around the given parts (all when `ids` is 'all'), or a 1 m sphere at the origin when there are none. */
export function boundingSphereOf(anchors: Map<string, PartAnchor>, ids: string[] | 'all'): THREE.Sphere {
  const box = new THREE.Box3();
  const list = ids === 'all' ? [...anchors.values()] : ids.map((id) => anchors.get(id)).filter((a): a is PartAnchor => !!a);
  const p = new THREE.Vector3();
  for (const a of list) {
    if (a.box) {
      box.expandByPoint(p.set(...a.box.min));
      box.expandByPoint(p.set(...a.box.max));
      continue;
    }
    box.expandByPoint(p.set(a.center[0] - a.radius, a.center[1] - a.radius, a.center[2] - a.radius));
    box.expandByPoint(p.set(a.center[0] + a.radius, a.center[1] + a.radius, a.center[2] + a.radius));
  }
  if (box.isEmpty()) return new THREE.Sphere(new THREE.Vector3(0, 300, 0), 600);
  const sphere = new THREE.Sphere();
  box.getCenter(sphere.center);
  sphere.radius = Math.max(50, box.getSize(p).length() / 2);
  return sphere;
}

/** Distance from the sphere's centre at which a perspective camera sees all of it. */
export function fitDistance(sphere: THREE.Sphere, fovDeg: number, aspect: number): number {
  const vertical = THREE.MathUtils.degToRad(fovDeg) / 2;
  const horizontal = Math.atan(Math.tan(vertical) * aspect);
  const half = Math.min(vertical, horizontal);
  // A sphere fit leaves room around a box; 0.95 of it still shows every corner of typical frames.
  return (sphere.radius / Math.sin(half)) * 0.95;
}

/** Camera placement maths for fitting parts and the named views (pure, mm). */
import * as THREE from 'three';
import type { PartAnchor } from './sceneLayout';
import type { ViewName } from './viewerTypes';

/**
 * Direction from the target to the camera for each named view (Y up). Front is -Z: the front
 * camera stands at -Z. The three-quarter view looks from the front, a little from the left-hand
 * side of the screen (+X) and from above.
 */
export const VIEW_DIRECTIONS: Record<ViewName, THREE.Vector3> = {
  front: new THREE.Vector3(0, 0, -1),
  back: new THREE.Vector3(0, 0, 1),
  left: new THREE.Vector3(-1, 0, 0),
  right: new THREE.Vector3(1, 0, 0),
  // Not exactly straight down: orbit controls need a horizontal hint for "up" on screen; the
  // hint toward -Z puts the front edge at the bottom of the screen.
  top: new THREE.Vector3(0, 1, -0.001).normalize(),
  iso: new THREE.Vector3(1, 0.8, -1.3).normalize(),
};

/** The sphere around the given parts (all when `ids` is 'all'), or a 1 m sphere at the origin when there are none. */
export function boundingSphereOf(anchors: Map<string, PartAnchor>, ids: readonly string[] | 'all'): THREE.Sphere {
  const box = boundingBoxOf(anchors, ids);
  if (box.isEmpty()) return new THREE.Sphere(new THREE.Vector3(0, 300, 0), 600);
  const sphere = new THREE.Sphere();
  box.getCenter(sphere.center);
  sphere.radius = Math.max(50, box.getSize(new THREE.Vector3()).length() / 2);
  return sphere;
}

/** The world box around the given parts (mm); empty when none is known. */
export function boundingBoxOf(anchors: Map<string, PartAnchor>, ids: readonly string[] | 'all'): THREE.Box3 {
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
  return box;
}

/** Distance from the sphere's centre at which a perspective camera sees all of it (no crop, mm). */
export function fitDistance(sphere: THREE.Sphere, fovDeg: number, aspect: number): number {
  const vertical = THREE.MathUtils.degToRad(fovDeg) / 2;
  const horizontal = Math.atan(Math.tan(vertical) * aspect);
  const half = Math.min(vertical, horizontal);
  return sphere.radius / Math.sin(half);
}

/**
 * Distance along `direction` (target → camera, unit) from the box's centre at which every corner of
 * the box projects inside the view with `margin` (share of the half-view kept free, default 0.06).
 * Tighter than the sphere fit for long thin frames, and never crops: each corner is checked.
 */
export function fitBoxDistance(box: THREE.Box3, direction: THREE.Vector3, fovDeg: number, aspect: number, margin = 0.06): number {
  const center = box.getCenter(new THREE.Vector3());
  const forward = direction.clone().normalize().negate();
  const worldUp = Math.abs(forward.y) > 0.999 ? new THREE.Vector3(0, 0, 1) : new THREE.Vector3(0, 1, 0);
  const right = new THREE.Vector3().crossVectors(forward, worldUp).normalize();
  const up = new THREE.Vector3().crossVectors(right, forward).normalize();
  const tanV = Math.tan(THREE.MathUtils.degToRad(fovDeg) / 2) * (1 - margin);
  const tanH = tanV * aspect;
  let distance = 0;
  const corner = new THREE.Vector3();
  for (let i = 0; i < 8; i++) {
    corner.set(i & 1 ? box.max.x : box.min.x, i & 2 ? box.max.y : box.min.y, i & 4 ? box.max.z : box.min.z).sub(center);
    const x = Math.abs(corner.dot(right));
    const y = Math.abs(corner.dot(up));
    const z = corner.dot(forward); // toward the camera is negative
    // The corner is inside when x / (d + z) <= tanH and y / (d + z) <= tanV.
    distance = Math.max(distance, x / tanH - z, y / tanV - z);
  }
  return Math.max(distance, 100);
}

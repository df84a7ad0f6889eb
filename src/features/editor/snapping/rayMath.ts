/** Ray geometry on plain tuples (mm), so snapping stays testable without three.js. */
import { addScaled, dot, sub, type ReadonlyVec3, type Vec3 } from '@/domain/geometry';

/** A pointer ray in world space; `direction` need not be normalised. */
export interface Ray {
  origin: ReadonlyVec3;
  direction: ReadonlyVec3;
}

/** Closest approach between a ray and a point: the point on the ray, its parameter and the gap (mm). */
export function rayPointApproach(ray: Ray, point: ReadonlyVec3): { t: number; distance: number } {
  const d = unit(ray.direction);
  const t = Math.max(0, dot(sub(point, ray.origin), d));
  const onRay = addScaled(ray.origin, d, t);
  return { t, distance: Math.hypot(point[0] - onRay[0], point[1] - onRay[1], point[2] - onRay[2]) };
}

/**
 * Closest approach between a ray and the segment a→b: `s` in [0, 1] along the segment,
 * `t` along the (normalised) ray, and the gap between the two closest points, mm.
 */
export function raySegmentApproach(ray: Ray, a: ReadonlyVec3, b: ReadonlyVec3): { s: number; t: number; distance: number; point: Vec3 } {
  const d1 = unit(ray.direction);
  const d2 = sub(b, a);
  const r = sub(ray.origin, a);
  const segLenSq = dot(d2, d2);
  const bDot = dot(d1, d2);
  const c = dot(d1, r);
  const f = dot(d2, r);
  const denom = segLenSq - bDot * bDot; // |d1|² = 1
  // Closest points of the two infinite lines, then clamp to the segment and to the ray's start.
  let s = segLenSq === 0 ? 0 : clamp(denom > 1e-9 ? (f - bDot * c) / denom : f / segLenSq, 0, 1);
  let t = Math.max(0, dot(sub(addScaled(a, d2, s), ray.origin), d1));
  if (segLenSq > 0) s = clamp(dot(sub(addScaled(ray.origin, d1, t), a), d2) / segLenSq, 0, 1);
  const point = addScaled(a, d2, s);
  t = Math.max(0, dot(sub(point, ray.origin), d1));
  const onRay = addScaled(ray.origin, d1, t);
  return { s, t, distance: Math.hypot(point[0] - onRay[0], point[1] - onRay[1], point[2] - onRay[2]), point };
}

/** Where the ray meets the plane `axisIndex` = `value` (e.g. y = 0), or null when parallel or behind. */
export function rayAxisPlane(ray: Ray, axisIndex: 0 | 1 | 2, value: number): Vec3 | null {
  const dn = ray.direction[axisIndex];
  if (Math.abs(dn) < 1e-12) return null;
  const t = (value - ray.origin[axisIndex]) / dn;
  if (t < 0) return null;
  const p = addScaled(ray.origin, ray.direction, t);
  p[axisIndex] = value;
  return p;
}

/** Closest approach between a ray and the infinite line through `point` along `axis` (unit). */
export function rayLineApproach(ray: Ray, point: ReadonlyVec3, axis: ReadonlyVec3): { along: number; distance: number } {
  const d1 = unit(ray.direction);
  const r = sub(ray.origin, point);
  const b = dot(d1, axis);
  const c = dot(d1, r);
  const f = dot(axis, r);
  const denom = 1 - b * b;
  if (denom < 1e-9) {
    // Looking straight down the line: it only passes through the pointer at the point itself.
    return { along: 0, distance: rayPointApproach(ray, point).distance };
  }
  const t = Math.max(0, (b * f - c) / denom);
  const onRay = addScaled(ray.origin, d1, t);
  const along = dot(sub(onRay, point), axis);
  const onLine = addScaled(point, axis, along);
  return { along, distance: Math.hypot(onLine[0] - onRay[0], onLine[1] - onRay[1], onLine[2] - onRay[2]) };
}

function unit(v: ReadonlyVec3): Vec3 {
  const l = Math.hypot(v[0], v[1], v[2]);
  return l === 0 ? [0, 0, -1] : [v[0] / l, v[1] / l, v[2] / l];
}

function clamp(x: number, lo: number, hi: number): number {
  return x < lo ? lo : x > hi ? hi : x;
}

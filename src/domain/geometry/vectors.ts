/** Small 3-vector helpers on tuples; mm unless stated. */
export type Vec3 = [number, number, number];
export type ReadonlyVec3 = readonly [number, number, number];

export function add(a: ReadonlyVec3, b: ReadonlyVec3): Vec3 {
  return [a[0] + b[0], a[1] + b[1], a[2] + b[2]];
}
export function sub(a: ReadonlyVec3, b: ReadonlyVec3): Vec3 {
  return [a[0] - b[0], a[1] - b[1], a[2] - b[2]];
}
export function scale(a: ReadonlyVec3, s: number): Vec3 {
  return [a[0] * s, a[1] * s, a[2] * s];
}
export function addScaled(a: ReadonlyVec3, b: ReadonlyVec3, s: number): Vec3 {
  return [a[0] + b[0] * s, a[1] + b[1] * s, a[2] + b[2] * s];
}
export function dot(a: ReadonlyVec3, b: ReadonlyVec3): number {
  return a[0] * b[0] + a[1] * b[1] + a[2] * b[2];
}
export function cross(a: ReadonlyVec3, b: ReadonlyVec3): Vec3 {
  return [a[1] * b[2] - a[2] * b[1], a[2] * b[0] - a[0] * b[2], a[0] * b[1] - a[1] * b[0]];
}
export function length(a: ReadonlyVec3): number {
  return Math.hypot(a[0], a[1], a[2]);
}
export function normalize(a: ReadonlyVec3): Vec3 {
  const l = length(a);
  return l === 0 ? [0, 0, 0] : [a[0] / l, a[1] / l, a[2] / l];
}
export function distance(a: ReadonlyVec3, b: ReadonlyVec3): number {
  return Math.hypot(a[0] - b[0], a[1] - b[1], a[2] - b[2]);
}
/** Index (0 = x, 1 = y, 2 = z) of the component with the largest magnitude. */
export function dominantAxis(a: ReadonlyVec3): 0 | 1 | 2 {
  const ax = Math.abs(a[0]);
  const ay = Math.abs(a[1]);
  const az = Math.abs(a[2]);
  if (ax >= ay && ax >= az) return 0;
  return ay >= az ? 1 : 2;
}

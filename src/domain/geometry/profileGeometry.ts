/**
 * Where a profile is in space: its ends, its cross-section axes and its bounding box.
 *
 * Convention (schema.ts): at roll 0 the section's local x (width) axis is world X, unless the
 * profile runs along X, in which case it is world Z. Local y (height) = direction × local x.
 * `rollDeg` turns local x towards local y about the profile's own axis. Slot faces 0..3 are
 * counted counter-clockwise from local +x: 0 = +x, 1 = +y, 2 = −x, 3 = −y.
 */
import type { Box } from './box';
import { addScaled, cross, dominantAxis, dot, normalize, type ReadonlyVec3, type Vec3 } from './vectors';

export interface ProfilePlacement {
  start: ReadonlyVec3;
  direction: ReadonlyVec3;
  length: number;
  rollDeg?: number;
}

export interface SectionAxes {
  /** Unit vector along the profile. */
  axis: Vec3;
  /** Local x of the section (the variant's width direction). */
  u: Vec3;
  /** Local y of the section (the variant's height direction). */
  v: Vec3;
}

export function sectionAxes(direction: ReadonlyVec3, rollDeg = 0): SectionAxes {
  const axis = normalize(direction);
  const reference: Vec3 = dominantAxis(axis) === 0 ? [0, 0, 1] : [1, 0, 0];
  // Remove any component along the axis so angled profiles still get a perpendicular frame.
  const u0 = normalize(addScaled(reference, axis, -dot(reference, axis)));
  const v0 = cross(axis, u0);
  const r = (rollDeg * Math.PI) / 180;
  const c = Math.cos(r);
  const s = Math.sin(r);
  const u: Vec3 = [u0[0] * c + v0[0] * s, u0[1] * c + v0[1] * s, u0[2] * c + v0[2] * s];
  const v: Vec3 = [-u0[0] * s + v0[0] * c, -u0[1] * s + v0[1] * c, -u0[2] * s + v0[2] * c];
  return { axis, u: snap(u), v: snap(v) };
}

/** Removes floating-point dust (cos 90° = 6e-17) so axis-aligned frames stay exact. */
function snap(a: Vec3): Vec3 {
  return [snapValue(a[0]), snapValue(a[1]), snapValue(a[2])];
}
function snapValue(x: number): number {
  if (Math.abs(x) < 1e-12) return 0;
  if (Math.abs(x - 1) < 1e-12) return 1;
  if (Math.abs(x + 1) < 1e-12) return -1;
  return x;
}

/** World point at `along` mm from the profile's start. */
export function pointAlongProfile(p: ProfilePlacement, along: number): Vec3 {
  return addScaled(p.start, p.direction, along);
}

export function profileEndPoint(p: ProfilePlacement, end: 'start' | 'end'): Vec3 {
  return end === 'start' ? [p.start[0], p.start[1], p.start[2]] : pointAlongProfile(p, p.length);
}

/** Outward unit normal of slot face 0..3 in world space. */
export function faceNormal(axes: SectionAxes, face: number): Vec3 {
  switch (((face % 4) + 4) % 4) {
    case 0:
      return axes.u;
    case 1:
      return axes.v;
    case 2:
      return [0 - axes.u[0], 0 - axes.u[1], 0 - axes.u[2]];
    default:
      return [0 - axes.v[0], 0 - axes.v[1], 0 - axes.v[2]];
  }
}

/**
 * Axis-aligned bounding box of a profile of section `width` × `height` mm.
 * Exact for axis-aligned profiles; a tight enclosure for angled ones.
 */
export function profileBoundingBox(p: ProfilePlacement, width: number, height: number, axes: SectionAxes = sectionAxes(p.direction, p.rollDeg ?? 0)): Box {
  return profileBoundingBoxBetween(p.start, pointAlongProfile(p, p.length), width, height, axes);
}

/** `profileBoundingBox` from the profile's start and end points (mm), for callers that have the end already. */
export function profileBoundingBoxBetween(start: ReadonlyVec3, end: ReadonlyVec3, width: number, height: number, axes: SectionAxes): Box {
  const hw = width / 2;
  const hh = height / 2;
  const ex = Math.abs(axes.u[0]) * hw + Math.abs(axes.v[0]) * hh;
  const ey = Math.abs(axes.u[1]) * hw + Math.abs(axes.v[1]) * hh;
  const ez = Math.abs(axes.u[2]) * hw + Math.abs(axes.v[2]) * hh;
  return {
    minX: Math.min(start[0], end[0]) - ex,
    minY: Math.min(start[1], end[1]) - ey,
    minZ: Math.min(start[2], end[2]) - ez,
    maxX: Math.max(start[0], end[0]) + ex,
    maxY: Math.max(start[1], end[1]) + ey,
    maxZ: Math.max(start[2], end[2]) + ez,
  };
}

/**
 * `profileBoundingBoxBetween` written into `out` from `offset` as six numbers (min x, y, z, max x,
 * y, z), the layout of the spatial grid's corner table: no box object.
 */
export function profileBoundsInto(start: ReadonlyVec3, end: ReadonlyVec3, width: number, height: number, axes: SectionAxes, out: Float64Array, offset: number): void {
  const hw = width / 2;
  const hh = height / 2;
  const ex = Math.abs(axes.u[0]) * hw + Math.abs(axes.v[0]) * hh;
  const ey = Math.abs(axes.u[1]) * hw + Math.abs(axes.v[1]) * hh;
  const ez = Math.abs(axes.u[2]) * hw + Math.abs(axes.v[2]) * hh;
  out[offset] = Math.min(start[0], end[0]) - ex;
  out[offset + 1] = Math.min(start[1], end[1]) - ey;
  out[offset + 2] = Math.min(start[2], end[2]) - ez;
  out[offset + 3] = Math.max(start[0], end[0]) + ex;
  out[offset + 4] = Math.max(start[1], end[1]) + ey;
  out[offset + 5] = Math.max(start[2], end[2]) + ez;
}

/** `sectionHalfExtentAlong` a world axis (0 = x, 1 = y, 2 = z), mm, without a direction vector per call. */
export function sectionHalfExtentAlongAxis(axes: SectionAxes, width: number, height: number, axis: 0 | 1 | 2): number {
  // The dot product with a unit axis is that component (the other terms are zeros).
  return (Math.abs(axes.u[axis]) * width) / 2 + (Math.abs(axes.v[axis]) * height) / 2;
}

/** The section's extent (mm) seen along a world direction: how far it reaches each side of its axis. */
export function sectionHalfExtentAlong(axes: SectionAxes, width: number, height: number, worldDir: ReadonlyVec3): number {
  return (Math.abs(dot(axes.u, worldDir)) * width) / 2 + (Math.abs(dot(axes.v, worldDir)) * height) / 2;
}

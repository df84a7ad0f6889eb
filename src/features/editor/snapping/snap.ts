/**
 * Where a pointer (a ray from the camera) or a dragged point lands: on another profile's end point,
 * on a face centre line, on a slot line, or on the grid. Pure TypeScript, mm, no three.js.
 */
import type { DesignDocument } from '@/domain/design/schema';
import { addScaled, faceNormal, pointAlongProfile, sectionAxes, sub, dot, type ReadonlyVec3, type Vec3 } from '@/domain/geometry';
import { rayAxisPlane, rayPointApproach, raySegmentApproach, type Ray } from './rayMath';

export type { Ray } from './rayMath';

export type SnapKind = 'end' | 'face-centre' | 'slot-line' | 'grid';

export interface SnapResult {
  point: Vec3;
  kind: SnapKind;
  /** The profile snapped to (not set for the grid). */
  profileId?: string;
  /** Slot face 0..3 of that profile, for face-centre and slot-line snaps. */
  face?: number;
  /** Gap between the pointer and the target, mm (0 for the grid). */
  distance: number;
}

export interface SnapOptions {
  /** Grid step, mm (e.g. 10, or 25.4 for a 1 in grid). */
  grid: number;
  /** How close (mm, in the world) the pointer must pass a target to take it. */
  tolerance: number;
  /** Profiles to ignore, such as the ones being moved. */
  excludeIds?: readonly string[];
  /** Positions along a profile line are rounded to this step from its start, mm (default: not rounded). */
  alongStep?: number;
  /** The work plane a ray falls back to: world axis and offset, mm (default y = 0, the floor). */
  plane?: { axis: 0 | 1 | 2; value: number };
}

/** The part of the catalogue snapping needs: each variant's section size. */
export interface SnapCatalogue {
  variants: ReadonlyArray<{ id: string; width: number; height: number }>;
}

export interface LineTarget {
  profileId: string;
  face: number;
  kind: 'face-centre' | 'slot-line';
  /** Outward normal of the face the line lies on. */
  normal: Vec3;
  a: Vec3;
  b: Vec3;
  length: number;
}

/** Snaps a pointer ray or a point to the nearest design feature, falling back to the grid. */
export function snapPoint(input: Ray | ReadonlyVec3, design: DesignDocument, catalogue: SnapCatalogue, opts: SnapOptions): SnapResult {
  const ray = isRay(input) ? input : null;
  const point = isRay(input) ? null : input;
  const gap = (p: ReadonlyVec3) => (ray ? rayPointApproach(ray, p).distance : distance3(point!, p));
  const exclude = new Set(opts.excludeIds ?? []);
  const sizes = new Map(catalogue.variants.map((v) => [v.id, v]));

  // End points win whenever one is within tolerance: joints happen at ends.
  let bestEnd: SnapResult | null = null;
  for (const profile of design.profiles) {
    if (exclude.has(profile.id)) continue;
    for (const end of [profile.start, pointAlongProfile(profile, profile.length)]) {
      const d = gap(end);
      if (d <= opts.tolerance && (!bestEnd || d < bestEnd.distance)) {
        bestEnd = { point: [end[0], end[1], end[2]], kind: 'end', profileId: profile.id, distance: d };
      }
    }
  }
  if (bestEnd) return bestEnd;

  let bestLine: SnapResult | null = null;
  for (const profile of design.profiles) {
    if (exclude.has(profile.id)) continue;
    const size = sizes.get(profile.variantId);
    if (!size) continue;
    for (const line of profileLines(profile, size.width, size.height)) {
      // A face turned away from the camera is hidden behind its own profile.
      if (ray && dot(line.normal, ray.direction) > 1e-9) continue;
      const s = ray ? raySegmentApproach(ray, line.a, line.b).s : segmentParameter(point!, line.a, line.b);
      const along = roundAlong(s * line.length, opts.alongStep, line.length);
      const onLine = addScaled(line.a, sub(line.b, line.a), line.length === 0 ? 0 : along / line.length);
      const d = gap(onLine);
      if (d > opts.tolerance) continue;
      // Face centre lines win a tie over slot lines on the same face.
      const better = !bestLine || d < bestLine.distance - 1e-6 || (Math.abs(d - bestLine.distance) <= 1e-6 && line.kind === 'face-centre' && bestLine.kind !== 'face-centre');
      if (better) bestLine = { point: onLine, kind: line.kind, profileId: profile.id, face: line.face, distance: d };
    }
  }
  if (bestLine) return bestLine;

  return { point: gridPoint(ray, point, opts), kind: 'grid', distance: 0 };
}

/**
 * The lines a profile offers: the centre line of each of its four faces, plus a slot line at every
 * cell centre of a face that spans more than one cell (the 80 mm faces of a 40 × 80).
 */
export function profileLines(
  profile: DesignDocument['profiles'][number],
  width: number,
  height: number,
): LineTarget[] {
  const axes = sectionAxes(profile.direction, profile.rollDeg ?? 0);
  const end = pointAlongProfile(profile, profile.length);
  const cell = Math.min(width, height);
  const lines: LineTarget[] = [];
  for (let face = 0; face < 4; face++) {
    const normal = faceNormal(axes, face);
    const depth = face % 2 === 0 ? width / 2 : height / 2;
    const span = face % 2 === 0 ? height : width;
    const spanDir = face % 2 === 0 ? axes.v : axes.u;
    const offset = (base: ReadonlyVec3, across: number) => addScaled(addScaled(base, normal, depth), spanDir, across);
    lines.push({ profileId: profile.id, face, kind: 'face-centre', normal, a: offset(profile.start, 0), b: offset(end, 0), length: profile.length });
    const cells = Math.max(1, Math.round(span / cell));
    if (cells < 2) continue;
    for (let i = 0; i < cells; i++) {
      const across = -span / 2 + cell * (i + 0.5);
      if (Math.abs(across) < 1e-6) continue;
      lines.push({ profileId: profile.id, face, kind: 'slot-line', normal, a: offset(profile.start, across), b: offset(end, across), length: profile.length });
    }
  }
  return lines;
}

function gridPoint(ray: Ray | null, point: ReadonlyVec3 | null, opts: SnapOptions): Vec3 {
  const g = opts.grid > 0 ? opts.grid : 1;
  const round = (x: number) => Math.round(x / g) * g + 0; // + 0 turns -0 into 0
  if (point) return [round(point[0]), round(point[1]), round(point[2])];
  const plane = opts.plane ?? { axis: 1, value: 0 };
  const hit = rayAxisPlane(ray!, plane.axis, plane.value);
  // Looking away from the work plane: fall back to the point under the camera.
  const p: Vec3 = hit ?? [ray!.origin[0], ray!.origin[1], ray!.origin[2]];
  const out: Vec3 = [round(p[0]), round(p[1]), round(p[2])];
  out[plane.axis] = plane.value;
  return out;
}

function roundAlong(along: number, step: number | undefined, length: number): number {
  if (!step || step <= 0) return along;
  return Math.min(length, Math.max(0, Math.round(along / step) * step));
}

function segmentParameter(p: ReadonlyVec3, a: ReadonlyVec3, b: ReadonlyVec3): number {
  const ab = sub(b, a);
  const lenSq = dot(ab, ab);
  if (lenSq === 0) return 0;
  return Math.min(1, Math.max(0, dot(sub(p, a), ab) / lenSq));
}

function distance3(a: ReadonlyVec3, b: ReadonlyVec3): number {
  return Math.hypot(a[0] - b[0], a[1] - b[1], a[2] - b[2]);
}

function isRay(input: Ray | ReadonlyVec3): input is Ray {
  return !Array.isArray(input) && typeof input === 'object' && 'origin' in input;
}

/**
 * The draw-profile tool's second point: the pointer ray constrained to the world axis it follows
 * best from the first point, its length rounded to the unit step or taken from a snapped end.
 */
import type { DesignDocument } from '@/domain/design/schema';
import { dot, sub, type ReadonlyVec3, type Vec3 } from '@/domain/geometry';
import { rayLineApproach, type Ray } from './rayMath';
import { snapPoint, type SnapCatalogue, type SnapKind } from './snap';
import { roundToStep } from './steps';

export interface DrawTarget {
  /** World axis index the new profile runs along. */
  axisIndex: 0 | 1 | 2;
  /** Unit direction from the first point (±axis). */
  direction: Vec3;
  /** mm, ≥ 0. */
  length: number;
  end: Vec3;
  /** What fixed the length: another profile's end, a face, or the unit step. */
  kind: SnapKind | 'step';
}

const AXES: readonly Vec3[] = [
  [1, 0, 0],
  [0, 1, 0],
  [0, 0, 1],
];

export function drawTarget(
  start: ReadonlyVec3,
  ray: Ray,
  design: DesignDocument,
  catalogue: SnapCatalogue,
  opts: { step: number; tolerance: number; grid: number },
): DrawTarget {
  // The axis whose line through the first point passes closest to the pointer.
  let axisIndex: 0 | 1 | 2 = 0;
  let best = Infinity;
  let along = 0;
  for (const i of [0, 1, 2] as const) {
    const approach = rayLineApproach(ray, start, AXES[i]);
    if (approach.distance < best) {
      best = approach.distance;
      axisIndex = i;
      along = approach.along;
    }
  }
  const axis = AXES[axisIndex];
  let kind: DrawTarget['kind'] = 'step';
  let signedLength = roundToStep(along, opts.step);

  // A nearby end point, or a face of a profile crossing this axis, fixes the length exactly,
  // but only when it lies on the drawing line (a target off to the side would pull the end away).
  const snapped = snapPoint(ray, design, catalogue, { grid: opts.grid, tolerance: opts.tolerance });
  if (snapped.kind !== 'grid' && snapped.profileId) {
    const crossing = snapped.kind === 'end' || !isParallelTo(design, snapped.profileId, axis);
    const projected = dot(sub(snapped.point, start), axis);
    const offLine = sub(sub(snapped.point, start), [axis[0] * projected, axis[1] * projected, axis[2] * projected]);
    const onLine = Math.hypot(offLine[0], offLine[1], offLine[2]) <= opts.tolerance;
    if (crossing && onLine && Math.abs(projected) > 1e-6) {
      signedLength = projected;
      kind = snapped.kind;
    }
  }

  const sign = signedLength < 0 ? -1 : 1;
  const direction: Vec3 = [axis[0] * sign + 0, axis[1] * sign + 0, axis[2] * sign + 0];
  const length = Math.abs(signedLength);
  const end: Vec3 = [start[0] + direction[0] * length, start[1] + direction[1] * length, start[2] + direction[2] * length];
  return { axisIndex, direction, length, end, kind };
}

function isParallelTo(design: DesignDocument, profileId: string, axis: ReadonlyVec3): boolean {
  const profile = design.profiles.find((p) => p.id === profileId);
  return !!profile && Math.abs(Math.abs(dot(profile.direction, axis)) - 1) < 1e-6;
}

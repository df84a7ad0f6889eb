/** Small geometric questions the checks ask about profiles, mm. */
import { distancePointToCorners, type Box } from '../geometry/box';
import { faceNormal, sectionHalfExtentAlong } from '../geometry/profileGeometry';
import { addScaled, dot, type ReadonlyVec3, type Vec3 } from '../geometry/vectors';
import type { AnalysisContext, ProfileInfo } from '../analysis/context';

/** Distance from a point to a box (0 inside). */
export function distancePointToBox(p: ReadonlyVec3, b: Box): number {
  return distancePointToCorners(p, b.minX, b.minY, b.minZ, b.maxX, b.maxY, b.maxZ);
}

/** Distance from a point to profile `index`'s box (0 inside), read from the shared grid's copy of the boxes. */
export function distancePointToProfile(ctx: AnalysisContext, p: ReadonlyVec3, index: number): number {
  return ctx.profileGrid.distanceToPoint(index, p);
}

/** Where a point projects onto the profile's axis, mm from its start (clamped to the profile). */
export function projectAlong(info: ProfileInfo, p: ReadonlyVec3): number {
  // dot(p − start, direction), written out so no vector is made per call.
  const s = info.startPoint;
  const d = info.profile.direction;
  const t = (p[0] - s[0]) * d[0] + (p[1] - s[1]) * d[1] + (p[2] - s[2]) * d[2];
  return Math.min(Math.max(t, 0), info.profile.length);
}

/** The slot face (0..3) whose outward normal is closest to `direction`, and how close (cosine). */
export function faceFacing(info: ProfileInfo, direction: ReadonlyVec3): { face: number; cosine: number } {
  // Faces 0..3 have normals +u, +v, −u, −v.
  const cu = dot(info.axes.u, direction);
  const cv = dot(info.axes.v, direction);
  if (Math.abs(cu) >= Math.abs(cv)) return cu >= 0 ? { face: 0, cosine: cu } : { face: 2, cosine: -cu };
  return cv >= 0 ? { face: 1, cosine: cv } : { face: 3, cosine: -cv };
}

/** Point on the outside of slot face `face`, `along` mm from the start, lifted `lift` mm off the face. */
export function pointOffFace(info: ProfileInfo, face: number, along: number, lift: number): Vec3 {
  const n = faceNormal(info.axes, face);
  const half = sectionHalfExtentAlong(info.axes, info.width, info.height, n);
  const onAxis = addScaled(info.startPoint, info.profile.direction, along);
  return addScaled(onAxis, n, half + lift);
}

/** Other profiles whose box contains point `p` (within `margin` mm). */
export function profilesAtPoint(ctx: AnalysisContext, p: ReadonlyVec3, margin: number, exceptIndex = -1): ProfileInfo[] {
  const out: ProfileInfo[] = [];
  const probe: Box = { minX: p[0], minY: p[1], minZ: p[2], maxX: p[0], maxY: p[1], maxZ: p[2] };
  ctx.profileGrid.forEachNear(
    probe,
    (i) => {
      if (i === exceptIndex) return;
      if (distancePointToProfile(ctx, p, i) <= margin) out.push(ctx.profiles[i]);
    },
    margin,
  );
  return out;
}

/** The first other profile whose box contains point `p` (within `margin` mm) and passes `accept`, or undefined. */
export function firstProfileAtPoint(
  ctx: AnalysisContext,
  p: ReadonlyVec3,
  margin: number,
  exceptIndex: number,
  accept: (info: ProfileInfo) => boolean,
): ProfileInfo | undefined {
  let found: ProfileInfo | undefined;
  const probe: Box = { minX: p[0], minY: p[1], minZ: p[2], maxX: p[0], maxY: p[1], maxZ: p[2] };
  ctx.profileGrid.forEachNear(
    probe,
    (i) => {
      if (i === exceptIndex) return false;
      const info = ctx.profiles[i];
      if (distancePointToProfile(ctx, p, i) > margin || !accept(info)) return false;
      found = info;
      return true;
    },
    margin,
  );
  return found;
}

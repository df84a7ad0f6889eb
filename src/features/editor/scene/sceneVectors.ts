/** Small vector helpers and the part anchor shared by the scene layouts (mm). */
import { dot, scale, sub, type ReadonlyVec3, type Vec3 } from '@/domain/geometry';

/** Where a part is, roughly: a centre and a radius, for badges and camera framing (mm). */
export interface PartAnchor {
  center: Vec3;
  radius: number;
  /** Tight world box when known (profiles), mm; otherwise the sphere's box is used. */
  box?: { min: Vec3; max: Vec3 };
}

export function unitAxis(i: 0 | 1 | 2): Vec3 {
  return i === 0 ? [1, 0, 0] : i === 1 ? [0, 1, 0] : [0, 0, 1];
}

/** Any unit vector perpendicular to `a`. */
export function perpendicular(a: ReadonlyVec3): Vec3 {
  const helper: Vec3 = Math.abs(a[1]) < 0.9 ? [0, 1, 0] : [1, 0, 0];
  const p = sub(helper, scale(a, dot(helper, a)));
  const l = Math.hypot(p[0], p[1], p[2]);
  return [p[0] / l, p[1] / l, p[2] / l];
}

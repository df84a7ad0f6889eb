/**
 * The frame's footprint on the floor (convex hull, in the X–Z plane, of every part resting at the
 * lowest level) and how far the centre of mass is from its nearest edge: the tip-over lever arm.
 */
import type { Vec3 } from '../geometry/vectors';
import type { AnalysisContext } from './context';

const FLOOR_TOLERANCE_MM = 1;

type P2 = [number, number];

/** Floor contact points (x, z), mm. */
export function floorContactPoints(ctx: AnalysisContext): P2[] {
  let floor = Infinity;
  for (const p of ctx.profiles) floor = Math.min(floor, p.box.minY);
  const points: P2[] = [];
  for (const p of ctx.profiles) {
    if (p.box.minY > floor + FLOOR_TOLERANCE_MM) continue;
    const b = p.box;
    points.push([b.minX, b.minZ], [b.maxX, b.minZ], [b.maxX, b.maxZ], [b.minX, b.maxZ]);
  }
  return points;
}

/** Convex hull, counter-clockwise (monotone chain). */
export function convexHull(points: P2[]): P2[] {
  const pts = [...points].sort((a, b) => a[0] - b[0] || a[1] - b[1]);
  if (pts.length <= 2) return pts;
  const cross = (o: P2, a: P2, b: P2) => (a[0] - o[0]) * (b[1] - o[1]) - (a[1] - o[1]) * (b[0] - o[0]);
  const lower: P2[] = [];
  for (const p of pts) {
    while (lower.length >= 2 && cross(lower[lower.length - 2], lower[lower.length - 1], p) <= 0) lower.pop();
    lower.push(p);
  }
  const upper: P2[] = [];
  for (let i = pts.length - 1; i >= 0; i--) {
    const p = pts[i];
    while (upper.length >= 2 && cross(upper[upper.length - 2], upper[upper.length - 1], p) <= 0) upper.pop();
    upper.push(p);
  }
  upper.pop();
  lower.pop();
  return lower.concat(upper);
}

/**
 * Signed distance (mm) from the centre of mass, projected on the floor, to the nearest footprint
 * edge: positive inside, negative outside. Null when nothing stands on the floor.
 */
export function footprintLeverArm(ctx: AnalysisContext, centre: Vec3): { distance: number; edge: string } | null {
  const hull = convexHull(floorContactPoints(ctx));
  if (hull.length < 3) return null;
  const c: P2 = [centre[0], centre[2]];
  let best = Infinity;
  let bestEdge = '';
  for (let i = 0; i < hull.length; i++) {
    const a = hull[i];
    const b = hull[(i + 1) % hull.length];
    const ex = b[0] - a[0];
    const ez = b[1] - a[1];
    const len = Math.hypot(ex, ez);
    if (len === 0) continue;
    // Inside distance for a counter-clockwise hull: the cross product of the edge and the point.
    const d = (ex * (c[1] - a[1]) - ez * (c[0] - a[0])) / len;
    if (d < best) {
      best = d;
      bestEdge = edgeName(ez / len, -ex / len);
    }
  }
  return { distance: best, edge: bestEdge };
}

/** Names an edge by its outward normal (x, z): +x right, −x left, +z front, −z back. */
function edgeName(nx: number, nz: number): string {
  if (Math.abs(nx) >= Math.abs(nz)) return nx > 0 ? 'right' : 'left';
  return nz > 0 ? 'front' : 'back';
}

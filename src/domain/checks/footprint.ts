/**
 * The frame's footprint on the floor (convex hull, in the X–Z plane) and how far the centre of mass
 * is from its nearest edge: the tip-over lever arm. Where feet or casters are fitted to the lowest
 * profile ends, the footprint runs through them (their stems sit on the profile's axis); otherwise
 * through every profile resting at the lowest level. Edges are named with front = −Z.
 */
import type { Vec3 } from '../geometry/vectors';
import type { AnalysisContext } from '../analysis/context';

const FLOOR_TOLERANCE_MM = 1;

type P2 = [number, number];

/**
 * The frame's lowest and highest level, mm: the lowest profile box bottom and the highest top
 * (Infinity and −Infinity without profiles). Worked out once per analysis: the legs, the footprint
 * and every tip-over check ask for it.
 */
export function frameLevels(ctx: AnalysisContext): { floor: number; top: number } {
  let levels = ctx.memo.get('frameLevels') as { floor: number; top: number } | undefined;
  if (!levels) {
    let floor = Infinity;
    let top = -Infinity;
    const grid = ctx.profileGrid;
    const count = ctx.profiles.length;
    for (let i = 0; i < count; i++) {
      floor = Math.min(floor, grid.minY(i));
      top = Math.max(top, grid.maxY(i));
    }
    levels = { floor, top };
    ctx.memo.set('frameLevels', levels);
  }
  return levels;
}

/** Floor contact points (x, z), mm, and whether feet or profiles make them. */
export function floorContact(ctx: AnalysisContext): { points: P2[]; kind: 'feet' | 'profiles' } {
  const { floor } = frameLevels(ctx);
  const feet: P2[] = [];
  for (const p of ctx.profiles) {
    if (ctx.profileGrid.minY(p.index) > floor + FLOOR_TOLERANCE_MM + Math.max(p.width, p.height)) continue;
    for (let e = 0; e < 2; e++) {
      const point = e === 0 ? p.startPoint : p.endPoint;
      const accessories = e === 0 ? p.startAccessories : p.endAccessories;
      if (point[1] > floor + FLOOR_TOLERANCE_MM + Math.max(p.width, p.height) / 2) continue;
      if (accessories.some((a) => a.kind === 'leveling-foot' || a.kind === 'caster')) feet.push([point[0], point[2]]);
    }
  }
  if (feet.length >= 3) return { points: feet, kind: 'feet' };
  return { points: floorContactPoints(ctx), kind: 'profiles' };
}

/** Floor contact points (x, z), mm, of the profiles resting at the lowest level. */
export function floorContactPoints(ctx: AnalysisContext): P2[] {
  const { floor } = frameLevels(ctx);
  const points: P2[] = [];
  for (const p of ctx.profiles) {
    if (ctx.profileGrid.minY(p.index) > floor + FLOOR_TOLERANCE_MM) continue;
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

/** Whether an end has a foot or caster (a loop, not `some` with a closure, for every low profile end). */
function hasFootOrCaster(accessories: readonly { kind: string }[]): boolean {
  for (let k = 0; k < accessories.length; k++) {
    const kind = accessories[k].kind;
    if (kind === 'leveling-foot' || kind === 'caster') return true;
  }
  return false;
}

/** Plan points (x, z), mm, in two growing lists of numbers: no pair list per point. */
export interface PlanPoints {
  x: number[];
  z: number[];
}

/**
 * `floorContact` as plan points in two number lists (thousands of feet in a large frame): the
 * same points in the same order.
 */
function floorContactXZ(ctx: AnalysisContext): { points: PlanPoints; kind: 'feet' | 'profiles' } {
  const { floor } = frameLevels(ctx);
  const grid = ctx.profileGrid;
  const feet: PlanPoints = { x: [], z: [] };
  // Read from the context once for the loop.
  const profiles = ctx.profiles;
  for (let i = 0; i < profiles.length; i++) {
    const p = profiles[i];
    const reach = Math.max(p.width, p.height);
    if (grid.minY(p.index) > floor + FLOOR_TOLERANCE_MM + reach) continue;
    for (let e = 0; e < 2; e++) {
      const point = e === 0 ? p.startPoint : p.endPoint;
      if (point[1] > floor + FLOOR_TOLERANCE_MM + reach / 2) continue;
      if (hasFootOrCaster(e === 0 ? p.startAccessories : p.endAccessories)) {
        feet.x.push(point[0]);
        feet.z.push(point[2]);
      }
    }
  }
  if (feet.x.length >= 3) return { points: feet, kind: 'feet' };
  const points: PlanPoints = { x: [], z: [] };
  for (let i = 0; i < profiles.length; i++) {
    const p = profiles[i];
    if (grid.minY(p.index) > floor + FLOOR_TOLERANCE_MM) continue;
    const b = p.box;
    points.x.push(b.minX, b.maxX, b.maxX, b.minX);
    points.z.push(b.minZ, b.minZ, b.maxZ, b.maxZ);
  }
  return { points, kind: 'profiles' };
}

/**
 * `convexHull` of plan points in two lists: the points are ordered by index (no copy of each
 * point), and only the hull's corners become pairs. The same corners in the same order.
 */
export function convexHullXZ(points: PlanPoints): P2[] {
  const { x, z } = points;
  const columns = x.length > 2 && plainNumbers(x) && plainNumbers(z) ? columnEnds(x, z) : null;
  if (columns && columns.x.length >= 3) return chain(columns.x, columns.z);
  // Otherwise (−0, non-finite numbers, or too few columns) every point, in the hull's sort order.
  const order: number[] = [];
  for (let k = 0; k < x.length; k++) order.push(k);
  order.sort((a, b) => x[a] - x[b] || z[a] - z[b]);
  if (order.length <= 2) return order.map((k) => [x[k], z[k]] as P2);
  return chain(
    order.map((k) => x[k]),
    order.map((k) => z[k]),
  );
}

/** Whether every number is finite and none is −0 (the fast hull below assumes both). */
function plainNumbers(values: readonly number[]): boolean {
  for (let k = 0; k < values.length; k++) {
    const v = values[k];
    if (!Number.isFinite(v) || (v === 0 && 1 / v < 0)) return false;
  }
  return true;
}

/**
 * The points that can be hull corners, in the hull's sort order (x, then z): per distinct x, the
 * lowest and the highest z. The monotone chain drops the rest anyway (a point between two of the
 * same x is popped with a cross product of exactly 0 as soon as the next one arrives, and pops
 * nothing before: its cross product with the point below it is positive), and duplicates likewise,
 * so it finds the same corners. Feet of a large frame stand in a few rows: thousands of points,
 * a hundred or so candidates, and a plain numeric sort instead of one with a comparator.
 */
function columnEnds(x: readonly number[], z: readonly number[]): PlanPoints {
  const n = x.length;
  const sorted = Float64Array.from(x).sort();
  const ux = new Float64Array(n);
  let m = 0;
  for (let k = 0; k < n; k++) if (k === 0 || sorted[k] !== sorted[k - 1]) ux[m++] = sorted[k];
  const low = new Float64Array(m).fill(Infinity);
  const high = new Float64Array(m).fill(-Infinity);
  for (let k = 0; k < n; k++) {
    // The column of x[k]: a binary search in the distinct values.
    let a = 0;
    let b = m - 1;
    while (a < b) {
      const mid = (a + b) >> 1;
      if (ux[mid] < x[k]) a = mid + 1;
      else b = mid;
    }
    if (z[k] < low[a]) low[a] = z[k];
    if (z[k] > high[a]) high[a] = z[k];
  }
  const out: PlanPoints = { x: [], z: [] };
  for (let c = 0; c < m; c++) {
    out.x.push(ux[c]);
    out.z.push(low[c]);
    if (high[c] > low[c]) {
      out.x.push(ux[c]);
      out.z.push(high[c]);
    }
  }
  return out;
}

/** The monotone chain of `convexHull` over points already in its sort order. */
function chain(x: readonly number[], z: readonly number[]): P2[] {
  const n = x.length;
  const lower: number[] = [];
  for (let p = 0; p < n; p++) {
    while (lower.length >= 2 && crossAt(x, z, lower[lower.length - 2], lower[lower.length - 1], p) <= 0) lower.pop();
    lower.push(p);
  }
  const upper: number[] = [];
  for (let p = n - 1; p >= 0; p--) {
    while (upper.length >= 2 && crossAt(x, z, upper[upper.length - 2], upper[upper.length - 1], p) <= 0) upper.pop();
    upper.push(p);
  }
  upper.pop();
  lower.pop();
  const hull: P2[] = [];
  for (const k of lower) hull.push([x[k], z[k]]);
  for (const k of upper) hull.push([x[k], z[k]]);
  return hull;
}

/** `cross` of `convexHull` for points o, a, b given by index. */
function crossAt(x: readonly number[], z: readonly number[], o: number, a: number, b: number): number {
  return (x[a] - x[o]) * (z[b] - z[o]) - (z[a] - z[o]) * (x[b] - x[o]);
}

/**
 * Signed distance (mm) from the centre of mass, projected on the floor, to the nearest footprint
 * edge: positive inside, negative outside. Null when nothing stands on the floor.
 */
export function footprintLeverArm(ctx: AnalysisContext, centre: Vec3): { distance: number; edge: string; footprint: 'feet' | 'profiles' } | null {
  // The footprint is the same for the empty frame and every load case: found once per analysis.
  let footprint = ctx.memo.get('footprint') as { kind: 'feet' | 'profiles'; hull: P2[] } | undefined;
  if (!footprint) {
    const contact = floorContactXZ(ctx);
    footprint = { kind: contact.kind, hull: convexHullXZ(contact.points) };
    ctx.memo.set('footprint', footprint);
  }
  const hull = footprint.hull;
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
  return { distance: best, edge: bestEdge, footprint: footprint.kind };
}

/** Names an edge by its outward normal (x, z): +x right, −x left, −z front, +z back (the design format's front is −Z). */
export function edgeName(nx: number, nz: number): string {
  if (Math.abs(nx) >= Math.abs(nz)) return nx > 0 ? 'right' : 'left';
  return nz < 0 ? 'front' : 'back';
}

/**
 * How vertical loads share out between the legs, by statics. Units: mm, N.
 *
 * Four legs at the corners of a rectangle: each load splits bilinearly by where it sits (exact for
 * a top that spans simply between the legs). Any other layout: a rigid top on equally stiff legs
 * (reaction = P/n + moment terms about the legs' centroid), with legs that would pull clamped at
 * zero and the rest scaled back up to the total. Derived from equilibrium; no published figure.
 */
export interface LegPosition {
  id: string;
  /** Plan position (x, z), mm. */
  x: number;
  z: number;
}

export interface PlanLoad {
  /** N, downward. */
  force: number;
  x: number;
  z: number;
}

const SAME_MM = 1;

function rectangleCorners(xs: Float64Array, zs: Float64Array): { xs: [number, number]; zs: [number, number] } | null {
  if (xs.length !== 4) return null;
  const rx = [...new Set(Array.from(xs, (x) => Math.round(x / SAME_MM)))].sort((a, b) => a - b);
  const rz = [...new Set(Array.from(zs, (z) => Math.round(z / SAME_MM)))].sort((a, b) => a - b);
  if (rx.length !== 2 || rz.length !== 2) return null;
  const corners = new Set(Array.from(xs, (x, i) => `${Math.round(x / SAME_MM)}|${Math.round(zs[i] / SAME_MM)}`));
  if (corners.size !== 4) return null;
  return { xs: [rx[0] * SAME_MM, rx[1] * SAME_MM], zs: [rz[0] * SAME_MM, rz[1] * SAME_MM] };
}

/** Each leg's share of the loads, N, in the order of `legs`. */
export function shareLegLoads(legs: LegPosition[], loads: PlanLoad[]): number[] {
  const xs = new Float64Array(legs.length);
  const zs = new Float64Array(legs.length);
  for (let i = 0; i < legs.length; i++) {
    xs[i] = legs[i].x;
    zs[i] = legs[i].z;
  }
  return Array.from(shareLegLoadsAt(xs, zs, loads));
}

/**
 * `shareLegLoads` with the legs' plan positions in two typed lists (x, z, mm): no object per leg
 * and no list that changes element kind as shares are added (thousands of legs in a large frame).
 */
export function shareLegLoadsAt(xs: Float64Array, zs: Float64Array, loads: readonly PlanLoad[]): Float64Array {
  const n = xs.length;
  const out = new Float64Array(n);
  if (n === 0) return out;
  const rect = rectangleCorners(xs, zs);
  // The legs' centroid and spread do not depend on the load: worked out once, in the same order.
  let cx = 0;
  let cz = 0;
  let sxx = 0;
  let szz = 0;
  // Each leg's offset from the centroid, worked out once for every load.
  const dx = new Float64Array(n);
  const dz = new Float64Array(n);
  if (!rect) {
    for (let i = 0; i < n; i++) cx += xs[i];
    cx /= n;
    for (let i = 0; i < n; i++) cz += zs[i];
    cz /= n;
    for (let i = 0; i < n; i++) dx[i] = xs[i] - cx;
    for (let i = 0; i < n; i++) dz[i] = zs[i] - cz;
    for (let i = 0; i < n; i++) sxx += dx[i] ** 2;
    for (let i = 0; i < n; i++) szz += dz[i] ** 2;
  }
  const shares = new Float64Array(n);
  for (const load of loads) {
    if (!(load.force > 0)) continue;
    if (rect) {
      const [x0, x1] = rect.xs;
      const [z0, z1] = rect.zs;
      const u = Math.min(1, Math.max(0, (load.x - x0) / (x1 - x0)));
      const v = Math.min(1, Math.max(0, (load.z - z0) / (z1 - z0)));
      for (let i = 0; i < n; i++) {
        const wu = Math.abs(xs[i] - x0) < SAME_MM ? 1 - u : u;
        const wv = Math.abs(zs[i] - z0) < SAME_MM ? 1 - v : v;
        out[i] += load.force * wu * wv;
      }
      continue;
    }
    let total = 0;
    const ax = load.x - cx;
    const az = load.z - cz;
    const even = 1 / n;
    for (let i = 0; i < n; i++) {
      let r = even;
      if (sxx > 0) r += (ax * dx[i]) / sxx;
      if (szz > 0) r += (az * dz[i]) / szz;
      shares[i] = Math.max(0, r);
      total += shares[i];
    }
    for (let i = 0; i < n; i++) out[i] += total > 0 ? (load.force * shares[i]) / total : load.force / n;
  }
  return out;
}

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

function rectangleCorners(legs: LegPosition[]): { xs: [number, number]; zs: [number, number] } | null {
  if (legs.length !== 4) return null;
  const xs = [...new Set(legs.map((l) => Math.round(l.x / SAME_MM)))].sort((a, b) => a - b);
  const zs = [...new Set(legs.map((l) => Math.round(l.z / SAME_MM)))].sort((a, b) => a - b);
  if (xs.length !== 2 || zs.length !== 2) return null;
  const corners = new Set(legs.map((l) => `${Math.round(l.x / SAME_MM)}|${Math.round(l.z / SAME_MM)}`));
  if (corners.size !== 4) return null;
  return { xs: [xs[0] * SAME_MM, xs[1] * SAME_MM], zs: [zs[0] * SAME_MM, zs[1] * SAME_MM] };
}

/** Each leg's share of the loads, N, in the order of `legs`. */
export function shareLegLoads(legs: LegPosition[], loads: PlanLoad[]): number[] {
  const out = legs.map(() => 0);
  if (legs.length === 0) return out;
  const rect = rectangleCorners(legs);
  const n = legs.length;
  // The legs' centroid and spread do not depend on the load: worked out once, in the same order.
  let cx = 0;
  let cz = 0;
  let sxx = 0;
  let szz = 0;
  if (!rect) {
    for (const l of legs) cx += l.x;
    cx /= n;
    for (const l of legs) cz += l.z;
    cz /= n;
    for (const l of legs) sxx += (l.x - cx) ** 2;
    for (const l of legs) szz += (l.z - cz) ** 2;
  }
  const shares = new Array<number>(n);
  for (const load of loads) {
    if (!(load.force > 0)) continue;
    if (rect) {
      const [x0, x1] = rect.xs;
      const [z0, z1] = rect.zs;
      const u = Math.min(1, Math.max(0, (load.x - x0) / (x1 - x0)));
      const v = Math.min(1, Math.max(0, (load.z - z0) / (z1 - z0)));
      legs.forEach((leg, i) => {
        const wu = Math.abs(leg.x - x0) < SAME_MM ? 1 - u : u;
        const wv = Math.abs(leg.z - z0) < SAME_MM ? 1 - v : v;
        out[i] += load.force * wu * wv;
      });
      continue;
    }
    let total = 0;
    for (let i = 0; i < n; i++) {
      const l = legs[i];
      let r = 1 / n;
      if (sxx > 0) r += ((load.x - cx) * (l.x - cx)) / sxx;
      if (szz > 0) r += ((load.z - cz) * (l.z - cz)) / szz;
      shares[i] = Math.max(0, r);
      total += shares[i];
    }
    for (let i = 0; i < n; i++) out[i] += total > 0 ? (load.force * shares[i]) / total : load.force / n;
  }
  return out;
}

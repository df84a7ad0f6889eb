/**
 * Frame openings a panel can fill: in each plane of axis-aligned profiles, two parallel pairs
 * that bound a rectangle with nothing crossing it. The rectangle is the clear size between the
 * profiles' inner faces (a captured panel adds the slot engagement on each edge). mm.
 */
import { defaultCatalogue, getVariant } from '../catalogue';
import type { Catalogue } from '../catalogue/types';
import { sectionAxes, sectionHalfExtentAlong } from '../geometry/profileGeometry';
import type { Axis, DesignDocument, Vec3 } from './schema';
import { JOINT_TOLERANCE_MM } from './jointDetection';

export interface FrameOpening {
  id: string;
  /** Four profile ids: the two along the width axis, then the two along the height axis. */
  boundedBy: [string, string, string, string];
  rect: { center: Vec3; normal: Axis; width: number; height: number };
}

const AXES: Axis[] = ['x', 'y', 'z'];
/** Plane coordinates are grouped to this many mm. */
const PLANE_GRID_MM = 0.5;
const unit = (i: number): Vec3 => [i === 0 ? 1 : 0, i === 1 ? 1 : 0, i === 2 ? 1 : 0];

interface Member {
  id: string;
  /** Coordinate of the axis along the other in-plane axis. */
  at: number;
  /** Span along the profile's own axis. */
  from: number;
  to: number;
  /** Half the section across the plane's other in-plane axis (towards the opening). */
  half: number;
}

function axisIndexOf(d: readonly number[]): 0 | 1 | 2 | -1 {
  for (let i = 0; i < 3; i++) if (Math.abs(Math.abs(d[i]) - 1) < 1e-9) return i as 0 | 1 | 2;
  return -1;
}

export function findOpenings(design: DesignDocument, catalogue: Catalogue = defaultCatalogue): FrameOpening[] {
  const tol = JOINT_TOLERANCE_MM;
  // plane key → members along each of the two in-plane axes
  const planes = new Map<string, { normal: 0 | 1 | 2; coord: number; along: [Member[], Member[]] }>();
  for (const p of design.profiles) {
    const a = axisIndexOf(p.direction);
    if (a === -1) continue;
    const v = getVariant(catalogue, p.variantId);
    const axes = sectionAxes(p.direction, p.rollDeg);
    const from = Math.min(p.start[a], p.start[a] + p.direction[a] * p.length);
    const to = Math.max(p.start[a], p.start[a] + p.direction[a] * p.length);
    for (let n = 0 as 0 | 1 | 2; n < 3; n = (n + 1) as 0 | 1 | 2) {
      if (n === a) continue;
      const other = (3 - n - a) as 0 | 1 | 2;
      const coord = Math.round(p.start[n] / PLANE_GRID_MM) * PLANE_GRID_MM;
      const key = `${n}:${coord}`;
      let plane = planes.get(key);
      if (!plane) {
        plane = { normal: n, coord, along: [[], []] };
        planes.set(key, plane);
      }
      const [w] = AXES.map((_, i) => i).filter((i) => i !== n);
      const slot = a === w ? 0 : 1;
      plane.along[slot].push({
        id: p.id,
        at: p.start[other],
        from,
        to,
        half: sectionHalfExtentAlong(axes, v?.width ?? 40, v?.height ?? 40, unit(other)),
      });
    }
  }

  const out: FrameOpening[] = [];
  const seen = new Set<string>();
  for (const plane of planes.values()) {
    const [wIdx, hIdx] = [0, 1, 2].filter((i) => i !== plane.normal) as [0 | 1 | 2, 0 | 1 | 2];
    const alongW = plane.along[0].sort((m, n) => m.at - n.at); // profiles along width, ordered by height position
    const alongH = plane.along[1].sort((m, n) => m.at - n.at); // profiles along height, ordered by width position
    const sideAts = alongH.map((m) => m.at);
    const maxSideHalf = alongH.reduce((h, m) => Math.max(h, m.half), 0);
    for (let i = 0; i < alongW.length; i++) {
      const bottom = alongW[i];
      for (let j = i + 1; j < alongW.length; j++) {
        const top = alongW[j];
        if (top.at - bottom.at < tol) continue;
        const spanFrom = Math.max(bottom.from, top.from);
        const spanTo = Math.min(bottom.to, top.to);
        if (spanTo - spanFrom <= tol) continue; // not facing each other
        const y0 = bottom.at + bottom.half;
        const y1 = top.at - top.half;
        if (y1 - y0 <= tol) continue;
        // Uprights that reach from the bottom member to the top member, inside both spans.
        const sides: Member[] = [];
        for (let k = lowerBound(sideAts, spanFrom - maxSideHalf - tol); k < alongH.length && alongH[k].at <= spanTo + maxSideHalf + tol; k++) {
          const s = alongH[k];
          if (s.from <= y0 + tol && s.to >= y1 - tol && s.at >= spanFrom - s.half - tol && s.at <= spanTo + s.half + tol) sides.push(s);
        }
        for (let k = 0; k + 1 < sides.length; k++) {
          const left = sides[k];
          const right = sides[k + 1];
          const x0 = left.at + left.half;
          const x1 = right.at - right.half;
          if (x1 - x0 <= tol) continue;
          // The bottom and top members must cover the clear width.
          if (bottom.from > x0 + tol || bottom.to < x1 - tol || top.from > x0 + tol || top.to < x1 - tol) continue;
          // Nothing along the width may cross the rectangle between them (sorted, so only indices between i and j).
          let crossed = false;
          for (let m = i + 1; m < j && !crossed; m++) {
            const c = alongW[m];
            crossed = c.at > bottom.at + tol && c.at < top.at - tol && c.from < x1 - tol && c.to > x0 + tol;
          }
          if (crossed) continue;
          const boundedBy: [string, string, string, string] = [bottom.id, top.id, left.id, right.id];
          const id = `opening:${AXES[plane.normal]}:${boundedBy.join('+')}`;
          if (seen.has(id)) continue;
          seen.add(id);
          const center: Vec3 = [0, 0, 0];
          center[plane.normal] = plane.coord;
          center[wIdx] = round((x0 + x1) / 2);
          center[hIdx] = round((y0 + y1) / 2);
          out.push({ id, boundedBy, rect: { center, normal: AXES[plane.normal], width: round(x1 - x0), height: round(y1 - y0) } });
        }
        // The nearest top member that the sides reach closes these openings; stop looking higher.
        if (sides.length >= 2) break;
      }
    }
  }
  return out;
}

/** First index whose value is at least `v` in an ascending array. */
function lowerBound(values: number[], v: number): number {
  let lo = 0;
  let hi = values.length;
  while (lo < hi) {
    const mid = (lo + hi) >> 1;
    if (values[mid] < v) lo = mid + 1;
    else hi = mid;
  }
  return lo;
}

const round = (v: number) => Math.round(v * 1000) / 1000;

/** The opening whose bounding profiles are exactly these four (any order). */
export function openingBoundedBy(openings: FrameOpening[], ids: string[]): FrameOpening | undefined {
  const want = [...ids].sort().join('+');
  return openings.find((o) => [...o.boundedBy].sort().join('+') === want);
}

/**
 * The panel rectangle that fills an opening, mm: a captured sheet keeps the clear opening (the
 * core adds the slot engagement); a face-mounted sheet covers the profiles' faces and sits on them,
 * on the +normal side.
 */
export function panelRectForOpening(
  opening: FrameOpening,
  mounting: 'captured' | 'face',
  thickness: number,
  sectionSize: number,
): FrameOpening['rect'] {
  const center = [...opening.rect.center] as Vec3;
  if (mounting === 'captured') return { ...opening.rect, center };
  center[AXES.indexOf(opening.rect.normal)] += sectionSize / 2 + thickness / 2;
  return { ...opening.rect, center, width: opening.rect.width + sectionSize, height: opening.rect.height + sectionSize };
}

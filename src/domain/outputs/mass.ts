/**
 * Mass (kg) and centre of mass (mm): profiles as mass per metre × length at their midpoints,
 * panels as area × thickness × density at their centres, hardware at its joint or accessory.
 * Overall size from the boxes of profiles and panels.
 */
import type { MassSummary } from '../analysis/types';
import { expandBoxInPlace, isEmptyBox } from '../geometry/box';
import type { AnalysisContext } from '../analysis/context';
import type { HardwareSummary } from './hardware';
import type { PanelSheet } from './panelSheets';

export function massSummary(ctx: AnalysisContext, hardware: HardwareSummary, sheets: PanelSheet[]): MassSummary {
  const byCategory: Record<string, number> = {};
  // Sums kept in plain locals (no closure over them), added in the same order as always.
  let total = 0;
  let mx = 0;
  let my = 0;
  let mz = 0;
  // Every profile box, grown from the empty box (the grid found it when it was built).
  const box = ctx.profileGrid.bounds();
  let profileKg = 0;
  let profiles = 0;
  for (const p of ctx.profiles) {
    // Mass per metre is area × alloy density unless the supplier's figure overrides it.
    const kg = ((p.variant?.massPerMetre ?? 0) * p.profile.length) / 1000;
    if (!(kg > 0)) continue;
    profileKg += kg;
    profiles += 1;
    total += kg;
    mx += kg * ((p.startPoint[0] + p.endPoint[0]) / 2);
    my += kg * ((p.startPoint[1] + p.endPoint[1]) / 2);
    mz += kg * ((p.startPoint[2] + p.endPoint[2]) / 2);
  }
  if (profiles > 0) byCategory.profile = profileKg;
  let panelKg = 0;
  let panels = 0;
  for (const s of sheets) {
    expandBoxInPlace(box, s.info.box);
    const kg = s.mass;
    if (!(kg > 0)) continue;
    const c = s.info.panel.rect.center;
    panelKg += kg;
    panels += 1;
    total += kg;
    mx += kg * c[0];
    my += kg * c[1];
    mz += kg * c[2];
  }
  if (panels > 0) byCategory.panel = panelKg;
  for (const [category, m] of hardware.massByCategory) {
    if (m.kg > 0) {
      byCategory[category] = (byCategory[category] ?? 0) + m.kg;
      total += m.kg;
      mx += m.mx;
      my += m.my;
      mz += m.mz;
    }
  }
  // Hardware without a position still counts in the total, at the frame's centre of mass.
  for (const [category, m] of hardware.massByCategory) {
    if (!(m.unplacedKg > 0)) continue;
    byCategory[category] = (byCategory[category] ?? 0) + m.unplacedKg;
    const scale = total > 0 ? (total + m.unplacedKg) / total : 1;
    total += m.unplacedKg;
    mx *= scale;
    my *= scale;
    mz *= scale;
  }
  for (const k of Object.keys(byCategory)) byCategory[k] = round(byCategory[k], 4);
  const empty = isEmptyBox(box);
  const min: [number, number, number] = empty ? [0, 0, 0] : [box.minX, box.minY, box.minZ];
  const max: [number, number, number] = empty ? [0, 0, 0] : [box.maxX, box.maxY, box.maxZ];
  return {
    total: round(total, 4),
    byCategory,
    centreOfMass: total > 0 ? [round(mx / total, 2), round(my / total, 2), round(mz / total, 2)] : [0, 0, 0],
    overallSize: { x: round(max[0] - min[0], 2), y: round(max[1] - min[1], 2), z: round(max[2] - min[2], 2) },
    boundingBox: { min: min.map((v) => round(v, 2)) as [number, number, number], max: max.map((v) => round(v, 2)) as [number, number, number] },
  };
}

function round(v: number, decimals: number): number {
  const f = 10 ** decimals;
  const r = Math.round(v * f) / f;
  return Object.is(r, -0) ? 0 : r;
}

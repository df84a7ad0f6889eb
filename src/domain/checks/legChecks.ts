/**
 * Leg checks of one load case: the plan loads shared among the legs by statics, each leg checked
 * as a column for flexural buckling (EN 1999-1-1 §6.3.1) and, on an unbraced frame, for axial
 * force with the bending its share of the side load causes (§6.3.3), and each foot's load against
 * its demo rating. Part of the structure estimates (`structureResults`). Units: mm, N, MPa, N·mm.
 */
import type { LegResult, RackingResult } from '../analysis/types';
import type { AnalysisContext, ProfileInfo } from '../analysis/context';
import { axialBendingUtilisation, columnCapacity } from '../structure/aluminiumColumns';
import { EFFECTIVE_LENGTH_FACTORS, type EndCondition } from '../structure/columns';
import { shareLegLoadsAt } from '../structure/legLoads';

/** Legs stand on feet: pinned at the floor. Braced frames: pinned at the top too (K = 1.0). */
export const BRACED_LEG_END_CONDITION: EndCondition = 'pinned-pinned';
/** Unbraced frames: pinned at the floor, held against rotation but free to sway at the top (K = 2.0). */
export const UNBRACED_LEG_END_CONDITION: EndCondition = 'pinned-fixed-sway';

/** Per leg section and length: the column capacity, rounded for the results, and the side-load bending (N·mm). */
interface LegColumn {
  cap: ReturnType<typeof columnCapacity>;
  criticalLoad: number;
  squashLoad: number;
  chi: number;
  bucklingLoad: number;
  moment: number;
  bendingMoment: number;
  sectionModulus: number;
}

/** The leg column of a section and length from `columns`, worked out on first use. */
function legColumn(
  columns: Map<object, Map<number, LegColumn>>,
  props: NonNullable<ProfileInfo['variant']>['sectionProperties'],
  length: number,
  K: number,
  f0: number,
  E: number,
  racking: RackingResult,
  legCount: number,
): LegColumn {
  let byLength = columns.get(props);
  if (!byLength) columns.set(props, (byLength = new Map()));
  let column = byLength.get(length);
  if (column) return column;
  const I = Math.min(props.ix, props.iy);
  const cap = columnCapacity({ area: props.area, secondMoment: I, proofStrength: f0, elasticModulus: E, effectiveLength: K * length });
  // Side loads on an unbraced frame: each leg takes an equal share as shear, bending it from its top joint.
  const mx = racking.bracedX ? 0 : (racking.sideLoadX / legCount) * length;
  const mz = racking.bracedZ ? 0 : (racking.sideLoadZ / legCount) * length;
  const moment = Math.hypot(mx, mz);
  column = {
    cap,
    criticalLoad: round(cap.criticalLoad),
    squashLoad: round(cap.squashLoad),
    chi: Math.round(cap.chi * 10000) / 10000,
    bucklingLoad: round(cap.bucklingLoad),
    moment,
    bendingMoment: Math.round(moment),
    sectionModulus: Math.min(props.sx, props.sy),
  };
  byLength.set(length, column);
  return column;
}

export function legChecks(ctx: AnalysisContext, legs: ProfileInfo[], loads: { force: number; x: number; z: number }[], racking: RackingResult, E: number, f0: number): LegResult[] {
  if (legs.length === 0) return [];
  // Plan positions in typed lists: no object per leg.
  const xs = new Float64Array(legs.length);
  const zs = new Float64Array(legs.length);
  for (let i = 0; i < legs.length; i++) {
    xs[i] = legs[i].startPoint[0];
    zs[i] = legs[i].startPoint[2];
  }
  const shares = shareLegLoadsAt(xs, zs, loads);
  const braced = racking.bracedX && racking.bracedZ;
  const endCondition = braced ? BRACED_LEG_END_CONDITION : UNBRACED_LEG_END_CONDITION;
  const K = EFFECTIVE_LENGTH_FACTORS[endCondition].recommended;
  const sf = ctx.design.settings.safetyFactor;
  const results: LegResult[] = [];
  // Legs repeat a few sections and lengths: one column capacity, rounded figure and side-load
  // bending per section and length (the results share them).
  const columns = new Map<object, Map<number, LegColumn>>();
  // Feet and casters repeat a few catalogue parts: the last rating looked up is kept.
  let lastPartId: string | undefined;
  let lastRating: number | null = null;
  // Legs come in runs of one section and length: the last column is kept beside the maps.
  let lastProps: object | undefined;
  let lastLength = NaN;
  let lastColumn: LegColumn | undefined;
  for (let i = 0; i < legs.length; i++) {
    const leg = legs[i];
    const props = leg.variant?.sectionProperties;
    if (!props) continue;
    const length = leg.profile.length;
    let column = props === lastProps && length === lastLength ? lastColumn : undefined;
    if (!column) column = legColumn(columns, props, length, K, f0, E, racking, legs.length);
    lastProps = props;
    lastLength = length;
    lastColumn = column;
    const cap = column.cap;
    const load = shares[i];
    const combined = axialBendingUtilisation({ axialLoad: load, bucklingLoad: cap.bucklingLoad, moment: column.moment, sectionModulus: column.sectionModulus, proofStrength: f0, safetyFactor: sf });
    const utilisation = load / (cap.bucklingLoad / sf);
    const bottomEnd = leg.startPoint[1] <= leg.endPoint[1] ? leg.startAccessories : leg.endAccessories;
    let foot: (typeof bottomEnd)[number] | undefined;
    for (let k = 0; k < bottomEnd.length; k++) {
      const a = bottomEnd[k];
      if (a.kind === 'leveling-foot' || a.kind === 'caster') {
        foot = a;
        break;
      }
    }
    let rating: number | null = null;
    if (foot) {
      if (foot.partId !== lastPartId) {
        lastPartId = foot.partId;
        lastRating = ctx.catalogue.accessories.get(foot.partId)?.demoLoadRating ?? null;
      }
      rating = lastRating;
    }
    // Written in the order the results have always had: the support, when there is one, before `ok`.
    const result: Omit<LegResult, 'support' | 'ok'> & Partial<Pick<LegResult, 'support' | 'ok'>> = {
      profileId: leg.profile.id,
      length,
      endCondition,
      effectiveLengthFactor: K,
      load: round(load),
      criticalLoad: column.criticalLoad,
      squashLoad: column.squashLoad,
      chi: column.chi,
      bucklingLoad: column.bucklingLoad,
      utilisation: Math.round(utilisation * 10000) / 10000,
      bendingMoment: column.bendingMoment,
      combinedUtilisation: Math.round(combined * 10000) / 10000,
    };
    if (foot) result.support = { accessoryId: foot.id, rating };
    result.ok = combined <= 1 && (rating === null || load <= rating);
    results.push(result as LegResult);
  }
  return results;
}


function round(v: number): number {
  return Math.round(v * 100) / 100;
}

/**
 * Structure findings, made from the estimates in `structureResults.ts`: stress and sag of loaded
 * members, joints that would slip, legs that would buckle or overload their feet, shelves that sag,
 * unbraced frames under side loads, and tip-over (always: the empty frame and every load case).
 * Units in messages: mm, N, MPa.
 */
import type { Finding, StabilityResult, StructureResult, TipOverResult } from '../analysis/types';
import { END_CONDITION_LABELS, type EndCondition } from '../structure/columns';
import type { AnalysisContext } from '../analysis/context';
import { findingId, formatNumber, mm, panelName, profileName } from '../analysis/describe';
import { structureResults, type FrameMass } from './structureResults';

export { GRAVITY, structureCautions, type FrameMass } from './structureResults';
export { findLegs, panelSupports } from './frameShape';

const CHECK = 'structure';

/** Results and findings together, for analyzeDesign. */
export function structureAnalysis(ctx: AnalysisContext, frame: FrameMass): { results: StructureResult[]; stability: StabilityResult; findings: Finding[] } {
  const { results, stability } = structureResults(ctx, frame);
  return { results, stability, findings: structureFindings(ctx, results, stability) };
}

export function structureFindings(ctx: AnalysisContext, results: StructureResult[], stability: StabilityResult): Finding[] {
  const out: Finding[] = [];
  for (const r of results) loadCaseFindings(ctx, r, out);
  if (stability.empty) tipOverFinding(stability.empty, 'The empty frame', ['empty'], out);
  return out;
}

function nameOf(ctx: AnalysisContext, profileId: string): string {
  return profileName(ctx.profileById.get(profileId), profileId);
}

function loadCaseFindings(ctx: AnalysisContext, r: StructureResult, out: Finding[]): void {
  const lc = `In load case "${r.loadCaseName}"`;
  const sf = r.settings.safetyFactor;
  for (const p of r.problems) {
    const id = p.partIds[0];
    if (p.reason === 'unknown-load-target') {
      out.push({ id: findingId(CHECK, 'unknown-load-target', [r.loadCaseId, id]), check: CHECK, severity: 'error', partIds: [id], message: `Load case "${r.loadCaseName}" puts a load on a part that is not in the design; remove that load or pick the part again.` });
    } else if (p.reason === 'panel-unsupported') {
      out.push({ id: findingId(CHECK, 'panel-unsupported', [r.loadCaseId, id]), check: CHECK, severity: 'warning', partIds: [id], message: `${lc}, ${panelName(ctx.panels.find((i) => i.panel.id === id)?.panel)} carries ${formatNumber(p.force ?? 0, 0)} N but Slotwise found no profiles under it to carry the load.` });
    } else {
      out.push({ id: findingId(CHECK, 'unsupported', [r.loadCaseId, id]), check: CHECK, severity: 'warning', partIds: p.partIds, message: `${lc}, ${profileName(ctx.profileById.get(id), id)} carries ${formatNumber(p.force ?? 0, 0)} N but no joint supports it, so Slotwise cannot estimate its bending.` });
    }
  }
  // Names are written only for parts that get a finding (most members and legs get none).
  for (const m of r.members) {
    if (!m.stressOk) {
      out.push({
        id: findingId(CHECK, 'stress', [r.loadCaseId, m.profileId]),
        check: CHECK,
        severity: 'error',
        partIds: [m.profileId],
        message: `${lc}, ${nameOf(ctx, m.profileId)} reaches an estimated ${formatNumber(m.maxStress)} MPa bending stress, above the ${formatNumber(m.allowableStress)} MPa allowed (minimum yield ${formatNumber(r.settings.minYield)} MPa ÷ safety factor ${formatNumber(sf, 2)}). Use a deeper profile, add a support or reduce the load.`,
        data: { maxStressMpa: m.maxStress, allowableStressMpa: m.allowableStress },
      });
    }
    if (!m.deflectionOk) {
      out.push({
        id: findingId(CHECK, 'deflection', [r.loadCaseId, m.profileId]),
        check: CHECK,
        severity: 'warning',
        partIds: [m.profileId],
        message: `${lc}, ${nameOf(ctx, m.profileId)} sags an estimated ${mm(m.maxDeflection)} over its ${mm(m.span)} span, more than span/${formatNumber(r.settings.deflectionLimitRatio, 0)} = ${mm(m.deflectionLimit)}. Add a support, turn a 40 × 80 profile on edge, or use a stiffer profile.`,
        data: { maxDeflectionMm: m.maxDeflection, limitMm: m.deflectionLimit, spanMm: m.span },
      });
    }
  }
  for (const j of r.joints) {
    if (j.ok) continue;
    const name = profileName(ctx.profileById.get(j.profileId), j.profileId);
    const how = j.mode === 'slip' ? 'before its T-nuts slip' : 'before its screw shears';
    out.push({
      id: findingId(CHECK, 'joint-slip', [r.loadCaseId, j.jointId, j.profileId]),
      check: CHECK,
      severity: j.reaction > j.capacity ? 'error' : 'warning',
      partIds: [j.jointId, j.profileId],
      message: `${lc}, joint ${j.jointId} takes about ${formatNumber(j.reaction, 0)} N from ${name}, more than the ${formatNumber(j.allowable, 0)} N it holds ${how} (estimated ${formatNumber(j.capacity, 0)} N ÷ safety factor ${formatNumber(sf, 2)}). Add a second bracket on the opposite face, a gusset plate, or a support under the member.`,
      data: { reactionN: j.reaction, allowableN: j.allowable, capacityN: j.capacity },
    });
  }
  // An index loop: this runs once per load case, often before the engine optimises it, and an
  // unoptimised for…of makes a result object per leg (thousands at 8,000 profiles).
  for (let i = 0; i < r.legs.length; i++) {
    const leg = r.legs[i];
    if (leg.combinedUtilisation > 1) {
      const bending = leg.bendingMoment > 0 ? ` together with about ${formatNumber(leg.bendingMoment / 1000, 1)} N·m bending from the side load` : '';
      out.push({
        id: findingId(CHECK, 'leg-buckling', [r.loadCaseId, leg.profileId]),
        check: CHECK,
        severity: 'error',
        partIds: [leg.profileId],
        message: `${lc}, leg ${nameOf(ctx, leg.profileId)} carries about ${formatNumber(leg.load, 0)} N${bending}; it holds an estimated ${formatNumber(leg.bucklingLoad, 0)} N before buckling (EN 1999-1-1 χ = ${formatNumber(leg.chi, 2)}, ${END_CONDITION_LABELS[leg.endCondition as EndCondition]?.toLowerCase() ?? leg.endCondition}, K = ${formatNumber(leg.effectiveLengthFactor, 2)}), ÷ safety factor ${formatNumber(sf, 2)}. Brace the frame or use a larger profile.`,
        data: { loadN: leg.load, bucklingLoadN: leg.bucklingLoad, combinedUtilisation: leg.combinedUtilisation },
      });
    }
    if (leg.support && leg.support.rating !== null && leg.load > leg.support.rating) {
      out.push({
        id: findingId(CHECK, 'support-rating', [r.loadCaseId, leg.support.accessoryId]),
        check: CHECK,
        severity: 'warning',
        partIds: [leg.support.accessoryId, leg.profileId],
        message: `${lc}, the foot or caster under leg ${nameOf(ctx, leg.profileId)} carries about ${formatNumber(leg.load, 0)} N, above its ${formatNumber(leg.support.rating, 0)} N demo rating. Use a stronger foot or caster and check the supplier’s rating.`,
        data: { loadN: leg.load, ratingN: leg.support.rating },
      });
    }
  }
  for (const p of r.panels) {
    if (p.ok) continue;
    out.push({
      id: findingId(CHECK, 'panel-sag', [r.loadCaseId, p.panelId]),
      check: CHECK,
      severity: 'warning',
      partIds: [p.panelId],
      message: `${lc}, ${panelName(ctx.panels.find((i) => i.panel.id === p.panelId)?.panel)} sags an estimated ${mm(p.deflection)} across its ${mm(p.span)} span (${p.method === 'one-way-strip' ? 'as a strip on two supports' : 'as a plate supported on four edges'}), more than span/${formatNumber(r.settings.deflectionLimitRatio, 0)} = ${mm(p.limit)}. Use a thicker sheet or add a cross rail under it.`,
      data: { deflectionMm: p.deflection, limitMm: p.limit, spanMm: p.span },
    });
  }
  const loose: string[] = [];
  if (r.racking.sideLoadX > 0 && !r.racking.bracedX) loose.push(`${formatNumber(r.racking.sideLoadX, 0)} N side to side (X)`);
  if (r.racking.sideLoadZ > 0 && !r.racking.bracedZ) loose.push(`${formatNumber(r.racking.sideLoadZ, 0)} N front to back (Z)`);
  if (loose.length > 0) {
    out.push({
      id: findingId(CHECK, 'racking', [r.loadCaseId]),
      check: CHECK,
      severity: 'warning',
      partIds: [],
      message: `${lc}, the frame takes ${loose.join(' and ')} with no brace, gusset plate or panel against racking in that direction: only the corner joints resist it, and they slip and flex. Add a gusset plate at the top corners or a diagonal brace.`,
      data: { sideLoadXN: r.racking.sideLoadX, sideLoadZN: r.racking.sideLoadZ },
    });
  }
  if (r.tipOver) tipOverFinding(r.tipOver, lc, [r.loadCaseId], out);
}

function tipOverFinding(t: TipOverResult, subject: string, key: string[], out: Finding[]): void {
  const data = { forceN: t.force, thresholdN: t.threshold, leverArmMm: t.leverArm, pushHeightMm: t.pushHeight, footprint: t.footprint };
  if (t.force <= 0) {
    out.push({
      id: findingId(CHECK, 'tips-unaided', key),
      check: CHECK,
      severity: 'error',
      partIds: [],
      message: `${subject}, the centre of mass lies outside the footprint, past the ${t.edge} edge: the frame tips over by itself. Widen the base or move the load.`,
      data,
    });
    return;
  }
  const push = `a horizontal push of about ${formatNumber(t.force, 0)} N at ${mm(t.pushHeight)} above the floor tips the frame over its ${t.edge} edge`;
  if (t.threshold > 0 && t.force < t.threshold) {
    out.push({
      id: findingId(CHECK, 'tip-over', key),
      check: CHECK,
      severity: 'warning',
      partIds: [],
      message: `${subject}, ${push}, less than the ${formatNumber(t.threshold, 0)} N a free-standing unit over 1,000 mm should resist (EN 16122:2012 test at the top edge). Fix it to a wall, widen the base or add weight low down.`,
      data,
    });
    return;
  }
  out.push({
    id: findingId(CHECK, 'tip-over', key),
    check: CHECK,
    severity: 'note',
    partIds: [],
    message: `${subject}, ${push} (estimate; fix tall frames to a wall).`,
    data,
  });
}

/**
 * Structure estimates per load case: beam deflection and bending stress of loaded members, Euler
 * buckling of the legs, and the push that tips the frame over. Estimates only, with cautions.
 * Units: mm, N, MPa.
 */
import type { Finding, LegResult, MemberResult, StructureResult, TipOverResult, Vec3Tuple } from '../analysisTypes';
import type { Load, LoadCase } from '../design/schema';
import { beamResponse, type BeamCase } from '../structure/beams';
import { EFFECTIVE_LENGTH_FACTORS, eulerCriticalLoad, type EndCondition } from '../structure/columns';
import { tipOverForce } from '../structure/tipOver';
import { panelAxes } from '../geometry/panelGeometry';
import { pointAlongProfile } from '../geometry/profileGeometry';
import { dominantAxis, dot, type Vec3 } from '../geometry/vectors';
import { memberAlong, type AnalysisContext, type PanelInfo, type ProfileInfo } from './context';
import { findingId, formatNumber, mm, panelName, profileName } from './describe';
import { footprintLeverArm } from './footprint';

const CHECK = 'structure';
/** Standard gravity, m/s² (exact by definition, CGPM 1901). */
export const GRAVITY = 9.80665;
/** Legs on feet are treated as fixed at the floor and free at the top: conservative (brief). */
export const LEG_END_CONDITION: EndCondition = 'fixed-free';
/** A point load this close to mid-span (share of span) may use the fixed-ends centre-load case. */
const CENTRE_BAND = 0.1;
/** A direction component above this counts as vertical. */
const VERTICAL = 0.999;
const FLOOR_TOLERANCE_MM = 1;

export const STRUCTURE_CAUTIONS: readonly string[] = [
  'These are estimates from textbook beam and column formulas, not a structural design.',
  'Shear deflection is neglected: at these spans it is a few per cent at most.',
  'Joints are treated as simple supports unless the load case says fixed; real T-slot joints slip and flex, so deflection can be larger.',
  'Several loads on one member are added at their worst points, which overstates the result.',
  `Legs are checked as fixed at the floor and free at the top (K = ${EFFECTIVE_LENGTH_FACTORS[LEG_END_CONDITION].recommended}), which is conservative for a braced frame.`,
  'Tip-over assumes the frame does not slide first and is not fixed to the floor or a wall.',
  'Section properties are computed from Slotwise\u2019s own drawing of the profile; use the supplier\u2019s published figures where they differ.',
  'Defer to the supplier\u2019s data, local codes and a qualified engineer before loading a frame that people work near.',
];

export interface FrameMass {
  /** kg */
  total: number;
  /** mm */
  centreOfMass: Vec3Tuple;
}

interface Accumulator {
  result: MemberResult;
}

export function structureAnalysis(ctx: AnalysisContext, frame: FrameMass): { results: StructureResult[]; findings: Finding[] } {
  const results: StructureResult[] = [];
  const findings: Finding[] = [];
  const supports = new Map<string, number[]>();
  const supportsOf = (info: ProfileInfo): number[] => {
    let list = supports.get(info.profile.id);
    if (!list) {
      list = [...new Set(info.joints.flatMap((j) => j.members.filter((m) => m.profileId === info.profile.id).map((m) => memberAlong(info, m))))].sort((a, b) => a - b);
      supports.set(info.profile.id, list);
    }
    return list;
  };
  const legs = findLegs(ctx);
  for (const loadCase of ctx.design.loadCases) {
    results.push(analyseLoadCase(ctx, loadCase, frame, supportsOf, legs, findings));
  }
  return { results, findings };
}

function analyseLoadCase(
  ctx: AnalysisContext,
  loadCase: LoadCase,
  frame: FrameMass,
  supportsOf: (info: ProfileInfo) => number[],
  legs: ProfileInfo[],
  out: Finding[],
): StructureResult {
  const members = new Map<string, Accumulator>();
  const alloy = ctx.alloy;
  const E = alloy?.elasticModulus ?? 68900;
  const allowable = (alloy?.minYield ?? 110) / ctx.design.settings.safetyFactor;
  const ratio = ctx.design.settings.deflectionLimitRatio;
  let verticalLoad = 0;
  const loadMoments: [number, number, number] = [0, 0, 0];

  const addBeam = (info: ProfileInfo, load: number, dir: Vec3, shape: 'point' | 'uniform', along: number, label: string, ids: string[]) => {
    const props = info.variant?.sectionProperties;
    if (!props) return;
    const a = info.profile.direction;
    const axial = dot(dir, a);
    const t: Vec3 = [dir[0] - axial * a[0], dir[1] - axial * a[1], dir[2] - axial * a[2]];
    const tLen = Math.hypot(t[0], t[1], t[2]);
    if (tLen < 1e-6) return; // along the member: no bending
    const transverse = load * tLen;
    const cu = Math.abs(dot(t, info.axes.u)) / tLen;
    const cv = Math.abs(dot(t, info.axes.v)) / tLen;
    // Load along local y bends about local x (ix, sx); along local x about local y (iy, sy).
    const I = 1 / ((cu * cu) / props.iy + (cv * cv) / props.ix);
    const S = 1 / (cu / props.sy + cv / props.sx);
    const s = supportsOf(info);
    const left = lastAtMost(s, along);
    const right = firstAtLeast(s, along);
    let beamCase: BeamCase;
    let span: number;
    let at: number | undefined;
    if (left !== null && right !== null && right - left > 1e-6) {
      span = right - left;
      const offset = along - left;
      if (shape === 'uniform') beamCase = loadCase.support === 'fixed' ? 'fixed-uniform' : 'simple-uniform';
      else if (loadCase.support === 'fixed' && Math.abs(offset - span / 2) <= CENTRE_BAND * span) beamCase = 'fixed-centre-point';
      else {
        beamCase = 'simple-point-at';
        at = offset;
      }
    } else if (left !== null && right !== null) {
      return; // the load sits on a support
    } else if (left !== null || right !== null) {
      span = Math.abs(along - (left ?? right)!);
      if (span < 1e-6) return;
      beamCase = 'cantilever-end-point';
    } else {
      out.push({
        id: findingId(CHECK, 'unsupported', [loadCase.id, info.profile.id]),
        check: CHECK,
        severity: 'warning',
        partIds: [info.profile.id, ...ids],
        message: `In load case "${loadCase.name}", ${profileName(info, info.profile.id)} carries ${label} but no joint supports it, so Slotwise cannot estimate its bending.`,
      });
      return;
    }
    const r = beamResponse({ case: beamCase, span, load: transverse, at, elasticModulus: E, secondMoment: I, sectionModulus: S });
    const existing = members.get(info.profile.id);
    if (existing) {
      const m = existing.result;
      m.load += transverse;
      m.maxMoment += r.maxMoment;
      m.maxDeflection += r.maxDeflection;
      m.maxStress += r.maxStress;
      if (span > m.span) {
        m.span = span;
        m.deflectionLimit = span / ratio;
      }
      m.beamCase = m.beamCase === beamCase ? beamCase : 'combined';
      m.deflectionOk = m.maxDeflection <= m.deflectionLimit;
      m.stressOk = m.maxStress <= m.allowableStress;
      return;
    }
    const limit = span / ratio;
    members.set(info.profile.id, {
      result: {
        profileId: info.profile.id,
        span,
        support: loadCase.support,
        beamCase,
        load: transverse,
        secondMoment: I,
        sectionModulus: S,
        maxMoment: r.maxMoment,
        maxDeflection: r.maxDeflection,
        deflectionLimit: limit,
        deflectionOk: r.maxDeflection <= limit,
        maxStress: r.maxStress,
        allowableStress: allowable,
        stressOk: r.maxStress <= allowable,
      },
    });
  };

  for (const load of loadCase.loads) {
    const applied = applyLoad(ctx, loadCase, load, addBeam, out);
    if (!applied) continue;
    verticalLoad += applied.vertical;
    for (let k = 0; k < 3; k++) loadMoments[k] += applied.vertical * applied.point[k];
  }

  const memberResults = [...members.values()].map((m) => m.result);
  for (const m of memberResults) reportMember(ctx, loadCase, m, ratio, out);

  const frameWeight = frame.total * GRAVITY;
  const totalWeight = frameWeight + verticalLoad;
  const legResults = legChecks(ctx, loadCase, legs, totalWeight, E, out);
  const centre: Vec3 =
    totalWeight > 0
      ? [0, 1, 2].map((k) => (frameWeight * frame.centreOfMass[k] + loadMoments[k]) / totalWeight) as Vec3
      : [frame.centreOfMass[0], frame.centreOfMass[1], frame.centreOfMass[2]];
  const tipOver = loadCase.tipOverHeight ? tipOverCheck(ctx, loadCase, totalWeight, centre, out) : null;
  return {
    loadCaseId: loadCase.id,
    loadCaseName: loadCase.name,
    members: memberResults.map(roundMember),
    legs: legResults,
    tipOver,
    cautions: [...STRUCTURE_CAUTIONS],
  };
}

type AddBeam = (info: ProfileInfo, load: number, dir: Vec3, shape: 'point' | 'uniform', along: number, label: string, ids: string[]) => void;

/** Applies one load to its members; returns its downward part and where it acts, for legs and tip-over. */
function applyLoad(ctx: AnalysisContext, loadCase: LoadCase, load: Load, addBeam: AddBeam, out: Finding[]): { vertical: number; point: Vec3 } | null {
  const unknown = (id: string, what: string) => {
    out.push({
      id: findingId(CHECK, 'unknown-load-target', [loadCase.id, id]),
      check: CHECK,
      severity: 'error',
      partIds: [id],
      message: `Load case "${loadCase.name}" puts a load on a ${what} that is not in the design. Remove the load or pick another ${what}.`,
    });
    return null;
  };
  if (load.kind === 'point') {
    const info = ctx.profileById.get(load.profileId);
    if (!info) return unknown(load.profileId, 'profile');
    const along = Math.min(load.along, info.profile.length);
    const dir: Vec3 = [load.direction[0], load.direction[1], load.direction[2]];
    addBeam(info, load.force, dir, 'point', along, `a ${formatNumber(load.force, 0)} N load`, []);
    return { vertical: Math.max(0, -dir[1]) * load.force, point: pointAlongProfile(info.profile, along) };
  }
  const down: Vec3 = [0, -1, 0];
  if (load.panelId) {
    const panel = ctx.panelById.get(load.panelId);
    if (!panel) return unknown(load.panelId, 'panel');
    const supports = panelSupports(ctx, panel);
    if (supports.length === 0) {
      out.push({
        id: findingId(CHECK, 'panel-unsupported', [loadCase.id, panel.panel.id]),
        check: CHECK,
        severity: 'warning',
        partIds: [panel.panel.id],
        message: `In load case "${loadCase.name}", ${panelName(panel.panel)} carries ${formatNumber(load.totalForce, 0)} N but Slotwise found no profiles under it to carry the load.`,
      });
    }
    for (const s of supports) {
      const mid = clampAlong(s, dot(subtract(panel.panel.rect.center, s.startPoint), s.profile.direction));
      addBeam(s, load.totalForce / supports.length, down, 'uniform', mid, `part of the load on ${panelName(panel.panel)}`, [panel.panel.id]);
    }
    const c = panel.panel.rect.center;
    return { vertical: load.totalForce, point: [c[0], c[1], c[2]] };
  }
  if (load.profileId) {
    const info = ctx.profileById.get(load.profileId);
    if (!info) return unknown(load.profileId, 'profile');
    addBeam(info, load.totalForce, down, 'uniform', info.profile.length / 2, `${formatNumber(load.totalForce, 0)} N spread along it`, []);
    return { vertical: load.totalForce, point: pointAlongProfile(info.profile, info.profile.length / 2) };
  }
  return null;
}

function subtract(a: readonly number[], b: readonly number[]): Vec3 {
  return [a[0] - b[0], a[1] - b[1], a[2] - b[2]];
}

function clampAlong(info: ProfileInfo, t: number): number {
  return Math.min(Math.max(t, 0), info.profile.length);
}

/** The two profiles along the panel's longer edges that carry it (its frame, or profiles under a face-mounted sheet). */
export function panelSupports(ctx: AnalysisContext, panel: PanelInfo): ProfileInfo[] {
  const { n, w, h } = panelAxes(panel.panel.rect.normal);
  const longAxis = panel.panel.rect.width >= panel.panel.rect.height ? w : h;
  let candidates: ProfileInfo[];
  if (panel.panel.mounting === 'captured' && panel.bounding.length > 0) {
    candidates = panel.bounding;
  } else {
    candidates = [];
    ctx.profileGrid.forEachNear(panel.box, (i) => candidates.push(ctx.profiles[i]), 1);
    candidates = candidates.filter((c) => dominantAxis(c.profile.direction) !== n);
  }
  const along = candidates.filter((c) => dominantAxis(c.profile.direction) === longAxis);
  const pool = along.length >= 2 ? along : candidates;
  if (pool.length <= 2) return pool;
  // Two on opposite sides: the extreme positions across the long edges.
  const across = longAxis === w ? h : w;
  const sorted = [...pool].sort((a, b) => a.startPoint[across] - b.startPoint[across]);
  return [sorted[0], sorted[sorted.length - 1]];
}

function reportMember(ctx: AnalysisContext, loadCase: LoadCase, m: MemberResult, ratio: number, out: Finding[]): void {
  const info = ctx.profileById.get(m.profileId);
  const name = profileName(info, m.profileId);
  if (!m.stressOk) {
    out.push({
      id: findingId(CHECK, 'stress', [loadCase.id, m.profileId]),
      check: CHECK,
      severity: 'error',
      partIds: [m.profileId],
      message: `In load case "${loadCase.name}", ${name} reaches an estimated ${formatNumber(m.maxStress)} MPa bending stress, above the ${formatNumber(m.allowableStress)} MPa allowed (minimum yield ÷ safety factor ${ctx.design.settings.safetyFactor}). Use a deeper profile, add a support or reduce the load.`,
      data: { maxStressMpa: round(m.maxStress), allowableStressMpa: round(m.allowableStress) },
    });
  }
  if (!m.deflectionOk) {
    out.push({
      id: findingId(CHECK, 'deflection', [loadCase.id, m.profileId]),
      check: CHECK,
      severity: 'warning',
      partIds: [m.profileId],
      message: `In load case "${loadCase.name}", ${name} sags an estimated ${mm(m.maxDeflection)} over its ${mm(m.span)} span, more than span/${formatNumber(ratio, 0)} = ${mm(m.deflectionLimit)}. Add a support, turn a 40 × 80 profile on edge, or use a stiffer profile.`,
      data: { maxDeflectionMm: round(m.maxDeflection), limitMm: round(m.deflectionLimit), spanMm: round(m.span) },
    });
  }
}

/** Vertical profiles whose lower end stands at the lowest level of the frame. */
export function findLegs(ctx: AnalysisContext): ProfileInfo[] {
  let floor = Infinity;
  for (const p of ctx.profiles) floor = Math.min(floor, p.box.minY);
  const legs: ProfileInfo[] = [];
  for (const p of ctx.profiles) {
    if (Math.abs(p.profile.direction[1]) < VERTICAL) continue;
    const bottom = Math.min(p.startPoint[1], p.endPoint[1]);
    if (bottom - floor <= FLOOR_TOLERANCE_MM + Math.max(p.width, p.height) / 2) legs.push(p);
  }
  return legs;
}

function legChecks(ctx: AnalysisContext, loadCase: LoadCase, legs: ProfileInfo[], totalWeight: number, E: number, out: Finding[]): LegResult[] {
  if (legs.length === 0) return [];
  const share = totalWeight / legs.length;
  const K = EFFECTIVE_LENGTH_FACTORS[LEG_END_CONDITION].recommended;
  const warnAt = 1 / ctx.design.settings.safetyFactor;
  const results: LegResult[] = [];
  for (const leg of legs) {
    const props = leg.variant?.sectionProperties;
    if (!props) continue;
    const I = Math.min(props.ix, props.iy);
    const pcr = eulerCriticalLoad({ elasticModulus: E, secondMoment: I, length: leg.profile.length, endCondition: LEG_END_CONDITION, factor: 'recommended' });
    const utilisation = share / pcr;
    results.push({
      profileId: leg.profile.id,
      length: leg.profile.length,
      endCondition: LEG_END_CONDITION,
      effectiveLengthFactor: K,
      load: round(share),
      bucklingLoad: round(pcr),
      utilisation: Math.round(utilisation * 10000) / 10000,
      ok: utilisation <= warnAt,
    });
    if (utilisation > warnAt) {
      out.push({
        id: findingId(CHECK, 'leg-buckling', [loadCase.id, leg.profile.id]),
        check: CHECK,
        severity: utilisation > 1 ? 'error' : 'warning',
        partIds: [leg.profile.id],
        message: `In load case "${loadCase.name}", ${profileName(leg)} carries about ${formatNumber(share, 0)} N against an estimated buckling load of ${formatNumber(pcr, 0)} N (${formatNumber(utilisation * 100, 0)} %, fixed at the floor and free at the top). Brace the legs or use a larger profile.`,
        data: { loadN: round(share), bucklingLoadN: round(pcr), utilisation: round(utilisation) },
      });
    }
  }
  return results;
}

function tipOverCheck(ctx: AnalysisContext, loadCase: LoadCase, weight: number, centre: Vec3, out: Finding[]): TipOverResult | null {
  const pushHeight = loadCase.tipOverHeight!;
  const lever = footprintLeverArm(ctx, centre);
  if (!lever) return null;
  const force = lever.distance > 0 ? tipOverForce({ weight, leverArm: lever.distance, pushHeight }) : 0;
  const result: TipOverResult = {
    pushHeight,
    weight: round(weight),
    leverArm: round(Math.max(0, lever.distance)),
    force: round(force),
    edge: lever.edge,
  };
  if (lever.distance <= 0) {
    out.push({
      id: findingId(CHECK, 'tips-unaided', [loadCase.id]),
      check: CHECK,
      severity: 'error',
      partIds: [],
      message: `In load case "${loadCase.name}", the centre of mass lies outside the footprint, past the ${lever.edge} edge: the frame tips over by itself. Widen the base or move the load.`,
    });
  } else {
    out.push({
      id: findingId(CHECK, 'tip-over', [loadCase.id]),
      check: CHECK,
      severity: 'note',
      partIds: [],
      message: `In load case "${loadCase.name}", a horizontal push of about ${formatNumber(force, 0)} N at ${mm(pushHeight)} above the floor tips the frame over its ${lever.edge} edge (estimate; fix tall frames to a wall).`,
      data: { forceN: round(force), leverArmMm: round(lever.distance), pushHeightMm: pushHeight },
    });
  }
  return result;
}

function lastAtMost(sorted: number[], x: number): number | null {
  let r: number | null = null;
  for (const s of sorted) if (s <= x + 1e-6) r = s;
  return r;
}
function firstAtLeast(sorted: number[], x: number): number | null {
  for (const s of sorted) if (s >= x - 1e-6) return s;
  return null;
}

function roundMember(m: MemberResult): MemberResult {
  return {
    ...m,
    span: round(m.span),
    load: round(m.load),
    secondMoment: Math.round(m.secondMoment),
    sectionModulus: Math.round(m.sectionModulus),
    maxMoment: Math.round(m.maxMoment),
    maxDeflection: Math.round(m.maxDeflection * 1000) / 1000,
    deflectionLimit: Math.round(m.deflectionLimit * 1000) / 1000,
    maxStress: Math.round(m.maxStress * 100) / 100,
    allowableStress: Math.round(m.allowableStress * 100) / 100,
  };
}

function round(v: number): number {
  return Math.round(v * 100) / 100;
}

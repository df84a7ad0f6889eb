/**
 * Structure estimates as data: per load case, beam deflection and bending stress of loaded members,
 * the reactions through their joints against the joints' slip capacity, leg loads shared by statics
 * and checked for flexural buckling (EN 1999-1-1 §6.3.1) with axial + bending (§6.3.3) in
 * `legChecks.ts`, shelf sag, racking and tip-over. Tip-over is always run: the empty frame and
 * every load case, pushed at the top edge unless the load case names a height. Findings are made
 * from these results in `structureFindings.ts`. Units: mm, N, MPa, N·mm.
 */
import type {
  JointLoadResult,
  MemberResult,
  PanelSagResult,
  RackingResult,
  StabilityResult,
  StructureProblem,
  StructureResult,
  TipOverResult,
  Vec3Tuple,
} from '../analysis/types';
import { jointCapacity } from '../catalogue/jointCapacity';
import type { DesignSettings, Load, LoadCase } from '../design/schema';
import { pointAlongProfile } from '../geometry/profileGeometry';
import { dot, type Vec3 } from '../geometry/vectors';
import { beamResponse, type BeamCase } from '../structure/beams';
import { oneWayStripDeflection, simplySupportedPlateDeflection } from '../structure/plates';
import { PUSH_TEST_MIN_HEIGHT_MM, STABILITY_PUSH_FORCE_N } from '../structure/stability';
import { tipOverForce } from '../structure/tipOver';
import { legChecks } from './legChecks';
import { memberAlong, type AnalysisContext, type PanelInfo, type ProfileInfo } from '../analysis/context';
import { footprintLeverArm, frameLevels } from './footprint';
import { findLegs, frameBracing, panelSupports } from './frameShape';

/** Standard gravity, m/s² (exact by definition, CGPM 1901). */
export const GRAVITY = 9.80665;
/** A point load this close to mid-span (share of span) may use the fixed-ends centre-load case. */
const CENTRE_BAND = 0.1;

export interface FrameMass {
  /** kg */
  total: number;
  /** mm */
  centreOfMass: Vec3Tuple;
}

/** Cautions for the estimate, with the settings actually in force, and what Slotwise does not check. */
export function structureCautions(settings: Pick<DesignSettings, 'safetyFactor' | 'deflectionLimitRatio' | 'alloyId'>, minYield: number): string[] {
  return [
    'These are estimates from textbook formulas, not a structural design.',
    `Settings in force: deflection limit span/${round(settings.deflectionLimitRatio)}, allowable stress ${round(minYield)} MPa minimum yield (${settings.alloyId}) ÷ safety factor ${round(settings.safetyFactor)} = ${round(minYield / settings.safetyFactor)} MPa.`,
    'Shear deflection is neglected: at these spans it is a few per cent at most.',
    'Joints are treated as simple supports unless the load case says fixed; real T-slot joints slip and flex, so deflection can be larger.',
    'Joint slip uses a tightening torque, friction and nut factor recalled from memory; the supplier’s published slip loads govern.',
    'Legs are pinned at the floor (K = 1.0 in a braced frame, 2.0 with sway in an unbraced one) and checked with the EN 1999-1-1 buckling reduction, capped at the squash load A·f₀.',
    `Tip-over is checked for the empty frame and each load case, pushed at the top edge; frames taller than ${PUSH_TEST_MIN_HEIGHT_MM} mm should resist ${STABILITY_PUSH_FORCE_N} N there (EN 16122:2012 method, force from memory). It assumes the frame does not slide first and is not fixed to the floor or a wall.`,
    'Section properties come from Slotwise’s own drawing of the profile; use the supplier’s published figures where they differ.',
    'Not checked: local buckling of thin walls, fatigue and vibration, dynamic or impact loads, moment capacity of joints, screws pulling out of tapped ends, welds, the floor under the feet, and drawers or doors opened on a loaded frame (ASTM F2057-23).',
    'Defer to the supplier’s data, local codes and a qualified engineer before loading a frame that people work near.',
  ];
}

interface Reaction {
  profileId: string;
  along: number;
  force: number;
}

export interface StructureAnalysis {
  results: StructureResult[];
  stability: StabilityResult;
}

export function structureResults(ctx: AnalysisContext, frame: FrameMass): StructureAnalysis {
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
  const bracing = frameBracing(ctx);
  const results = ctx.design.loadCases.map((loadCase) => analyseLoadCase(ctx, loadCase, frame, supportsOf, legs, bracing));
  const frameWeight = frame.total * GRAVITY;
  const empty = tipOverCheck(ctx, undefined, frameWeight, [frame.centreOfMass[0], frame.centreOfMass[1], frame.centreOfMass[2]]);
  let worst: StabilityResult['worst'] = null;
  for (const r of results) {
    if (r.tipOver && (!worst || r.tipOver.force < worst.force)) worst = { ...r.tipOver, loadCaseId: r.loadCaseId, loadCaseName: r.loadCaseName };
  }
  return { results, stability: { empty, worst } };
}

function analyseLoadCase(
  ctx: AnalysisContext,
  loadCase: LoadCase,
  frame: FrameMass,
  supportsOf: (info: ProfileInfo) => number[],
  legs: ProfileInfo[],
  bracing: { x: boolean; z: boolean },
): StructureResult {
  const members = new Map<string, MemberResult>();
  const reactions = new Map<string, Reaction>();
  const problems: StructureProblem[] = [];
  const settings = ctx.design.settings;
  const E = ctx.alloy?.elasticModulus ?? 68900;
  const minYield = ctx.alloy?.minYield ?? 110;
  const allowable = minYield / settings.safetyFactor;
  const ratio = settings.deflectionLimitRatio;
  const planLoads: { force: number; x: number; z: number }[] = [];
  const loadMoments: [number, number, number] = [0, 0, 0];
  let verticalLoad = 0;
  const racking: RackingResult = { bracedX: bracing.x, bracedZ: bracing.z, sideLoadX: 0, sideLoadZ: 0 };
  const panels: PanelSagResult[] = [];

  const react = (info: ProfileInfo, along: number, force: number) => {
    const key = `${info.profile.id}@${along}`;
    const r = reactions.get(key);
    if (r) r.force += force;
    else reactions.set(key, { profileId: info.profile.id, along, force });
  };

  const addBeam: AddBeam = (info, load, dir, shape, along, ids) => {
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
      const share = beamCase === 'simple-point-at' ? offset / span : 0.5;
      react(info, left, transverse * (1 - share));
      react(info, right, transverse * share);
    } else if (left !== null && right !== null) {
      react(info, left, transverse);
      return; // the load sits on a support
    } else if (left !== null || right !== null) {
      const support = (left ?? right)!;
      span = Math.abs(along - support);
      if (span < 1e-6) return;
      beamCase = 'cantilever-end-point';
      react(info, support, transverse);
    } else {
      problems.push({ reason: 'unsupported', partIds: [info.profile.id, ...ids], force: round(transverse) });
      return;
    }
    const r = beamResponse({ case: beamCase, span, load: transverse, at, elasticModulus: E, secondMoment: I, sectionModulus: S });
    const m = members.get(info.profile.id);
    if (m) {
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
    });
  };

  for (const load of loadCase.loads) {
    const applied = applyLoad(ctx, load, addBeam, problems, panels);
    if (!applied) continue;
    verticalLoad += applied.vertical;
    racking.sideLoadX += applied.sideX;
    racking.sideLoadZ += applied.sideZ;
    if (applied.vertical > 0) planLoads.push({ force: applied.vertical, x: applied.point[0], z: applied.point[2] });
    for (let k = 0; k < 3; k++) loadMoments[k] += applied.vertical * applied.point[k];
  }

  const frameWeight = frame.total * GRAVITY;
  planLoads.push({ force: frameWeight, x: frame.centreOfMass[0], z: frame.centreOfMass[2] });
  const totalWeight = frameWeight + verticalLoad;
  const legResults = legChecks(ctx, legs, planLoads, racking, E, minYield);
  const centre: Vec3 =
    totalWeight > 0
      ? ([0, 1, 2].map((k) => (frameWeight * frame.centreOfMass[k] + loadMoments[k]) / totalWeight) as Vec3)
      : [frame.centreOfMass[0], frame.centreOfMass[1], frame.centreOfMass[2]];
  const tipOver = tipOverCheck(ctx, loadCase, totalWeight, centre);
  for (const p of panels) p.limit = round(p.span / ratio);
  for (const p of panels) p.ok = p.deflection <= p.limit;
  return {
    loadCaseId: loadCase.id,
    loadCaseName: loadCase.name,
    members: [...members.values()].map(roundMember),
    legs: legResults,
    tipOver,
    joints: jointChecks(ctx, [...reactions.values()]),
    panels,
    racking: { ...racking, sideLoadX: round(racking.sideLoadX), sideLoadZ: round(racking.sideLoadZ) },
    problems,
    settings: { safetyFactor: settings.safetyFactor, deflectionLimitRatio: ratio, alloyId: settings.alloyId, minYield },
    cautions: structureCautions(settings, minYield),
  };
}

type AddBeam = (info: ProfileInfo, load: number, dir: Vec3, shape: 'point' | 'uniform', along: number, ids: string[]) => void;

interface Applied {
  vertical: number;
  sideX: number;
  sideZ: number;
  point: Vec3;
}

/** Applies one load to its members; returns its downward and side parts and where it acts. */
function applyLoad(ctx: AnalysisContext, load: Load, addBeam: AddBeam, problems: StructureProblem[], panels: PanelSagResult[]): Applied | null {
  const unknown = (id: string) => {
    problems.push({ reason: 'unknown-load-target', partIds: [id] });
    return null;
  };
  if (load.kind === 'point') {
    const info = ctx.profileById.get(load.profileId);
    if (!info) return unknown(load.profileId);
    const along = Math.min(load.along, info.profile.length);
    const dir: Vec3 = [load.direction[0], load.direction[1], load.direction[2]];
    addBeam(info, load.force, dir, 'point', along, []);
    return {
      vertical: Math.max(0, -dir[1]) * load.force,
      sideX: Math.abs(dir[0]) * load.force,
      sideZ: Math.abs(dir[2]) * load.force,
      point: pointAlongProfile(info.profile, along),
    };
  }
  const down: Vec3 = [0, -1, 0];
  if (load.panelId) {
    const panel = ctx.panelById.get(load.panelId);
    if (!panel) return unknown(load.panelId);
    const supports = panelSupports(ctx, panel);
    if (supports.length === 0) problems.push({ reason: 'panel-unsupported', partIds: [panel.panel.id], force: load.totalForce });
    for (const s of supports) {
      const mid = clampAlong(s, dot(subtract(panel.panel.rect.center, s.startPoint), s.profile.direction));
      addBeam(s, load.totalForce / supports.length, down, 'uniform', mid, [panel.panel.id]);
    }
    const sag = panelSag(panel, load.totalForce, supports.length);
    if (sag) panels.push(sag);
    const c = panel.panel.rect.center;
    return { vertical: load.totalForce, sideX: 0, sideZ: 0, point: [c[0], c[1], c[2]] };
  }
  if (load.profileId) {
    const info = ctx.profileById.get(load.profileId);
    if (!info) return unknown(load.profileId);
    addBeam(info, load.totalForce, down, 'uniform', info.profile.length / 2, []);
    return { vertical: load.totalForce, sideX: 0, sideZ: 0, point: pointAlongProfile(info.profile, info.profile.length / 2) };
  }
  return null;
}

/**
 * Sag of a horizontal panel under a spread load: a simply supported rectangle (Roark) when it is
 * captured on all four sides, otherwise a one-way strip across its shorter side. Null for panels
 * whose material has no modulus, or that are not horizontal. The limit is filled in by the caller.
 */
export function panelSag(panel: PanelInfo, totalForce: number, supportCount: number): PanelSagResult | null {
  const E = panel.material?.elasticModulus;
  if (!E || supportCount === 0) return null;
  if (panel.panel.rect.normal !== 'y') return null;
  const { width, height } = panel.panel.rect;
  const t = panel.panel.thickness;
  const pressure = totalForce / (width * height);
  const short = Math.min(width, height);
  const fourSides = panel.panel.mounting === 'captured' && panel.bounding.length >= 4;
  const deflection = fourSides
    ? simplySupportedPlateDeflection({ a: width, b: height, thickness: t, pressure, elasticModulus: E })
    : oneWayStripDeflection({ span: short, thickness: t, pressure, elasticModulus: E });
  return {
    panelId: panel.panel.id,
    method: fourSides ? 'plate-simply-supported' : 'one-way-strip',
    span: round(short),
    deflection: Math.round(deflection * 1000) / 1000,
    limit: 0,
    elasticModulus: E,
    ok: true,
  };
}

function subtract(a: readonly number[], b: readonly number[]): Vec3 {
  return [a[0] - b[0], a[1] - b[1], a[2] - b[2]];
}

function clampAlong(info: ProfileInfo, t: number): number {
  return Math.min(Math.max(t, 0), info.profile.length);
}

/** Each member's end reactions against the connectors at that end (slip per T-nut, or screw shear). */
function jointChecks(ctx: AnalysisContext, reactions: Reaction[]): JointLoadResult[] {
  const sf = ctx.design.settings.safetyFactor;
  const out: JointLoadResult[] = [];
  for (const r of reactions) {
    const info = ctx.profileById.get(r.profileId);
    if (!info?.system || r.force <= 0) continue;
    const joints = info.joints.filter((j) => j.members.some((m) => m.profileId === r.profileId && Math.abs(memberAlong(info, m) - r.along) < 1e-6));
    if (joints.length === 0) continue;
    let capacity = 0;
    let mode: JointLoadResult['mode'] = 'slip';
    for (const joint of joints) {
      const connector = ctx.catalogue.connectors.get(joint.connectorId);
      if (!connector) continue;
      const c = jointCapacity(connector, info.system);
      if (!c) continue;
      capacity += c.capacity * joint.quantity;
      if (c.mode === 'screw-shear') mode = 'screw-shear';
    }
    if (capacity <= 0) continue;
    const allowable = capacity / sf;
    out.push({ jointId: joints[0].id, profileId: r.profileId, reaction: round(r.force), capacity: round(capacity), allowable: round(allowable), mode, ok: r.force <= allowable });
  }
  return out;
}

/** Push at the top edge (or the load case's height) that tips the frame; null when nothing stands on the floor. */
function tipOverCheck(ctx: AnalysisContext, loadCase: LoadCase | undefined, weight: number, centre: Vec3): TipOverResult | null {
  if (ctx.profiles.length === 0) return null;
  const { floor, top } = frameLevels(ctx);
  const height = top - floor;
  const pushHeight = loadCase?.tipOverHeight ?? height;
  if (!(pushHeight > 0)) return null;
  const lever = footprintLeverArm(ctx, [centre[0], centre[1] - floor, centre[2]]);
  if (!lever) return null;
  const force = lever.distance > 0 ? tipOverForce({ weight, leverArm: lever.distance, pushHeight }) : 0;
  return {
    pushHeight: round(pushHeight),
    weight: round(weight),
    leverArm: round(Math.max(0, lever.distance)),
    force: round(force),
    edge: lever.edge,
    threshold: height > PUSH_TEST_MIN_HEIGHT_MM ? STABILITY_PUSH_FORCE_N : 0,
    footprint: lever.footprint,
  };
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

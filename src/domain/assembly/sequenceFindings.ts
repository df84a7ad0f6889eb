/**
 * The feasibility check of the assembly sequence (`design.steps`), run by `analyzeDesign`.
 * Each broken constraint is one error finding that names both steps and the parts, with a fix
 * that moves a step ("Move step 7 before step 5"). Rules (common practice, no source):
 *
 * - references: steps name existing parts and sub-assemblies; every part is in exactly one step;
 * - a joint is made no earlier than its profiles are placed;
 * - slide-in T-nuts enter a slot from an open end: the joint goes in before both ends of the
 *   profile are closed by other joints or end accessories;
 * - a captured panel slides along its slots, so it goes in before the last member (or joint) of
 *   its frame;
 * - a profile or face panel must be reachable along some axis direction, given the parts placed
 *   in earlier steps (a swept box to the edge of the design must not pass through them);
 * - a sub-assembly is joined along its join direction without passing through parts already
 *   placed; and it is not built in its build orientation after it has been turned over.
 *
 * Parts of a sub-assembly count as in place, for parts outside it, from the step that joins it.
 * Lengths mm.
 */
import type { Finding, FindingFix } from '../analysis/types';
import type { Box } from '../geometry/box';
import type { Joint, ProfileEnd, Vec3 } from '../design/schema';
import { accessoriesAt, allDesignIds, CONTACT_TOLERANCE_MM, jointsAt, type AnalysisContext, type ProfileInfo } from '../analysis/context';
import { capitalise, findingId, jointName, panelName, profileName } from '../analysis/describe';
import { useDropInTNutsFix } from '../checks/fixes';

/** The name people read for any part of the design (labels, never internal ids). */
function nameOf(ctx: AnalysisContext, id: string): string {
  const profile = ctx.profileById.get(id);
  if (profile) return profileName(profile);
  const panel = ctx.panels.find((p) => p.panel.id === id);
  if (panel) return panelName(panel.panel);
  const joint = ctx.design.joints.find((j) => j.id === id);
  if (joint) return jointName(ctx, joint);
  const accessory = ctx.design.accessories.find((a) => a.id === id);
  if (accessory) return `the ${accessory.kind.replace(/-/g, ' ')}`;
  return 'a part';
}

const CHECK = 'sequence';
/** Accessories that close a profile end's slots. */
const SLOT_CLOSING_ACCESSORIES = new Set(['end-cap', 'leveling-foot', 'caster']);
/** Two boxes block each other only when they overlap by more than this, mm (touching is fine). */
const BLOCK_TOLERANCE_MM = CONTACT_TOLERANCE_MM;

/** Where each part goes in, in step indices. */
interface StepModel {
  /** First step naming the part. */
  stepOf: Map<string, number>;
  /** Sub-assembly id of each profile/panel listed in a sub-assembly. */
  groupOf: Map<string, string>;
  /** Step that joins each sub-assembly (kind 'join'). */
  joinStepOf: Map<string, number>;
  title: (i: number) => string;
  stepIds: string[];
}

function buildModel(ctx: AnalysisContext): StepModel {
  const { design } = ctx;
  const stepOf = new Map<string, number>();
  design.steps.forEach((step, index) => {
    for (const id of step.partIds) if (!stepOf.has(id)) stepOf.set(id, index);
  });
  const groupOf = new Map<string, string>();
  for (const sub of design.subAssemblies) for (const id of [...sub.profileIds, ...sub.panelIds]) if (!groupOf.has(id)) groupOf.set(id, sub.id);
  const joinStepOf = new Map<string, number>();
  design.steps.forEach((s, i) => {
    if (s.kind === 'join' && s.subAssemblyId && !joinStepOf.has(s.subAssemblyId)) joinStepOf.set(s.subAssemblyId, i);
  });
  return {
    stepOf,
    groupOf,
    joinStepOf,
    title: (i: number) => `step ${i + 1} ("${design.steps[i].title}")`,
    stepIds: design.steps.map((s) => s.id),
  };
}

/** When `partId` is in place as seen from `observerId`: its own step inside its sub-assembly, else the join step. */
function placedAt(model: StepModel, partId: string, observerId?: string): number | undefined {
  const own = model.stepOf.get(partId);
  if (own === undefined) return undefined;
  const group = model.groupOf.get(partId);
  if (!group) return own;
  if (observerId !== undefined && model.groupOf.get(observerId) === group) return own;
  const join = model.joinStepOf.get(group);
  return join === undefined ? own : Math.max(own, join);
}

function moveBeforeFix(model: StepModel, moving: number, before: number): FindingFix {
  return {
    label: `Move step ${moving + 1} before step ${before + 1}`,
    operation: { type: 'moveStepBefore', payload: { stepId: model.stepIds[moving], beforeStepId: model.stepIds[before] } },
  };
}

export function sequenceFindings(ctx: AnalysisContext): Finding[] {
  const { design } = ctx;
  const out: Finding[] = [];
  checkReferences(ctx, out);
  if (design.steps.length === 0) return out;
  const model = buildModel(ctx);
  checkCoverage(ctx, model, out);

  for (const joint of design.joints) {
    const js = model.stepOf.get(joint.id);
    if (js === undefined) continue;
    for (const m of joint.members) {
      const ps = placedAt(model, m.profileId, joint.members.every((o) => model.groupOf.get(o.profileId) === model.groupOf.get(m.profileId)) ? m.profileId : undefined);
      if (ps !== undefined && ps > js) {
        out.push({
          id: findingId(CHECK, 'joint-before-profile', [joint.id, m.profileId]),
          check: CHECK,
          severity: 'error',
          partIds: [joint.id, m.profileId],
          message: `${capitalise(jointName(ctx, joint))} is made in ${model.title(js)}, before ${nameOf(ctx, m.profileId)} is in place in ${model.title(ps)}. Move step ${ps + 1} before step ${js + 1}.`,
          fix: moveBeforeFix(model, ps, js),
        });
      }
    }
    if (joint.tNut === 'slide-in') checkSlideInTNuts(ctx, model, joint, js, out);
  }

  checkCapturedPanels(ctx, model, out);
  checkReachability(ctx, model, out);
  checkSubAssemblies(ctx, model, out);
  return out;
}

/** When (step index) an end of a profile is closed by a joint or an end accessory, other than `except`. */
function endClosedAt(info: ProfileInfo, end: ProfileEnd, except: Joint, model: StepModel): number | null {
  let at: number | null = null;
  for (const j of jointsAt(info, end)) {
    if (j.id === except.id) continue;
    const s = model.stepOf.get(j.id);
    if (s !== undefined) at = at === null ? s : Math.min(at, s);
  }
  for (const a of accessoriesAt(info, end)) {
    if (!SLOT_CLOSING_ACCESSORIES.has(a.kind)) continue;
    const s = model.stepOf.get(a.id);
    if (s !== undefined) at = at === null ? s : Math.min(at, s);
  }
  return at;
}

function checkSlideInTNuts(ctx: AnalysisContext, model: StepModel, joint: Joint, jointStep: number, out: Finding[]): void {
  const connector = ctx.catalogue.connectors.get(joint.connectorId);
  if (connector && connector.tNutCount === 0) return;
  for (const m of joint.members) {
    const info = ctx.profileById.get(m.profileId);
    if (!info) continue;
    const startClosed = endClosedAt(info, 'start', joint, model);
    const endClosed = endClosedAt(info, 'end', joint, model);
    // Slide-in T-nuts need one open end; the end being joined by this joint is still open.
    const jointEnd = m.at === 'span' ? null : m.at;
    const startBlocked = jointEnd !== 'start' && startClosed !== null && startClosed < jointStep;
    const endBlocked = jointEnd !== 'end' && endClosed !== null && endClosed < jointStep;
    if (!startBlocked || !endBlocked) continue;
    const last = Math.max(startClosed as number, endClosed as number);
    out.push({
      id: findingId(CHECK, 'slide-in-closed', [joint.id, info.profile.id]),
      check: CHECK,
      severity: 'error',
      partIds: [joint.id, info.profile.id],
      message: `${capitalise(jointName(ctx, joint))} uses slide-in T-nuts in ${profileName(info, info.profile.id)}, but both its ends are closed before ${model.title(jointStep)} (in ${model.title(startClosed as number)} and ${model.title(endClosed as number)}). Move step ${jointStep + 1} before step ${last + 1}, or use drop-in T-nuts.`,
      fix: useDropInTNutsFix(joint.id) ?? moveBeforeFix(model, jointStep, last),
    });
  }
}

function checkCapturedPanels(ctx: AnalysisContext, model: StepModel, out: Finding[]): void {
  for (const info of ctx.panels) {
    if (info.panel.mounting !== 'captured' || info.bounding.length === 0) continue;
    const panelId = info.panel.id;
    const ps = model.stepOf.get(panelId);
    if (ps === undefined) continue;
    // The frame is closed once its profiles and the joints between them are all in place.
    const frame = new Set(info.bounding.map((b) => b.profile.id));
    let closedAt = -1;
    let closer = '';
    let open = false;
    const consider = (id: string, at: number | undefined) => {
      if (at === undefined) open = true;
      else if (at > closedAt) { closedAt = at; closer = id; }
    };
    for (const b of info.bounding) {
      consider(b.profile.id, placedAt(model, b.profile.id, panelId));
      for (const j of b.joints) {
        if (j.members.filter((m) => frame.has(m.profileId)).length < 2) continue;
        consider(j.id, model.stepOf.get(j.id));
      }
    }
    if (open || closedAt >= ps) continue;
    out.push({
      id: findingId(CHECK, 'panel-after-frame', [panelId]),
      check: CHECK,
      severity: 'error',
      partIds: [panelId, closer, ...info.bounding.map((b) => b.profile.id).filter((id) => id !== closer)],
      message: `${capitalise(panelName(info.panel))} is captured in slots but slides in at ${model.title(ps)}, after ${nameOf(ctx, closer)} closes its frame in ${model.title(closedAt)}. Move step ${ps + 1} before step ${closedAt + 1}.`,
      fix: moveBeforeFix(model, ps, closedAt),
      data: { panelStep: ps + 1, closingStep: closedAt + 1 },
    });
  }
}

// ---------- reachability ----------

interface Solid {
  id: string;
  box: Box;
}

const DIRECTIONS: Vec3[] = [
  [0, -1, 0],
  [0, 1, 0],
  [1, 0, 0],
  [-1, 0, 0],
  [0, 0, 1],
  [0, 0, -1],
];

function overlaps(a: Box, b: Box, tolerance: number): boolean {
  return (
    Math.min(a.maxX, b.maxX) - Math.max(a.minX, b.minX) > tolerance &&
    Math.min(a.maxY, b.maxY) - Math.max(a.minY, b.minY) > tolerance &&
    Math.min(a.maxZ, b.maxZ) - Math.max(a.minZ, b.minZ) > tolerance
  );
}

/** The box swept when a part arrives along `d` from outside `bounds` (it starts on the -d side). */
function sweptFrom(box: Box, d: Vec3, bounds: Box): Box {
  const s = { ...box };
  if (d[0] > 0) s.minX = Math.min(s.minX, bounds.minX - 1);
  if (d[0] < 0) s.maxX = Math.max(s.maxX, bounds.maxX + 1);
  if (d[1] > 0) s.minY = Math.min(s.minY, bounds.minY - 1);
  if (d[1] < 0) s.maxY = Math.max(s.maxY, bounds.maxY + 1);
  if (d[2] > 0) s.minZ = Math.min(s.minZ, bounds.minZ - 1);
  if (d[2] < 0) s.maxZ = Math.max(s.maxZ, bounds.maxZ + 1);
  return s;
}

/** Profiles and panels of the design as boxes, with a function listing the solids a box overlaps. */
function solidsOf(ctx: AnalysisContext): { bounds: Box; near: (box: Box, visit: (s: Solid) => void) => void } {
  const bounds: Box = { minX: Infinity, minY: Infinity, minZ: Infinity, maxX: -Infinity, maxY: -Infinity, maxZ: -Infinity };
  const grow = (b: Box) => {
    bounds.minX = Math.min(bounds.minX, b.minX);
    bounds.minY = Math.min(bounds.minY, b.minY);
    bounds.minZ = Math.min(bounds.minZ, b.minZ);
    bounds.maxX = Math.max(bounds.maxX, b.maxX);
    bounds.maxY = Math.max(bounds.maxY, b.maxY);
    bounds.maxZ = Math.max(bounds.maxZ, b.maxZ);
  };
  for (const p of ctx.profiles) grow(p.box);
  for (const p of ctx.panels) grow(p.box);
  const panels: Solid[] = ctx.panels.map((p) => ({ id: p.panel.id, box: p.box }));
  return {
    bounds,
    near(box, visit) {
      ctx.profileGrid.forEachNear(box, (i) => {
        const p = ctx.profiles[i];
        // Read once: a profile's box is a new object on every read.
        const b = p.box;
        if (overlaps(box, b, BLOCK_TOLERANCE_MM)) visit({ id: p.profile.id, box: b });
      });
      for (const p of panels) if (overlaps(box, p.box, BLOCK_TOLERANCE_MM)) visit(p);
    },
  };
}

/**
 * A profile or face-mounted panel is unreachable when every axis direction is blocked by a part
 * placed in an earlier step; the finding names the latest such blocker.
 */
function checkReachability(ctx: AnalysisContext, model: StepModel, out: Finding[]): void {
  if (ctx.profiles.length + ctx.panels.length === 0) return;
  const solids = solidsOf(ctx);
  const check = (id: string, box: Box, directions: Vec3[]) => {
    const mine = placedAt(model, id);
    if (mine === undefined) return;
    let latest = -1;
    let latestId = '';
    for (const d of directions) {
      let blocker = -1;
      let blockerId = '';
      solids.near(sweptFrom(box, d, solids.bounds), (s) => {
        if (s.id === id) return;
        // Parts of the same sub-assembly are built together; compare their own steps.
        const at = placedAt(model, s.id, id);
        if (at !== undefined && at < mine && at > blocker) { blocker = at; blockerId = s.id; }
      });
      if (blocker < 0) return; // this direction is free
      if (latest < 0 || blocker < latest) { latest = blocker; latestId = blockerId; }
    }
    if (latest < 0) return;
    out.push({
      id: findingId(CHECK, 'unreachable', [id]),
      check: CHECK,
      severity: 'error',
      partIds: [id, latestId],
      message: `${capitalise(nameOf(ctx, id))} in ${model.title(mine)} cannot be brought into place from any side: ${nameOf(ctx, latestId)}, placed in ${model.title(latest)}, is in the way. Move step ${mine + 1} before step ${latest + 1}.`,
      fix: moveBeforeFix(model, mine, latest),
    });
  };
  for (const p of ctx.profiles) {
    // A profile whose both ends are held slides in square to its axis; any axis direction counts.
    check(p.profile.id, p.box, DIRECTIONS);
  }
  for (const p of ctx.panels) {
    if (p.panel.mounting === 'captured' && p.bounding.length > 0) continue; // checkCapturedPanels
    const n = { x: 0, y: 1, z: 2 }[p.panel.rect.normal];
    check(p.panel.id, p.box, DIRECTIONS.filter((d) => d[n] !== 0));
  }
}

// ---------- sub-assemblies ----------

function checkSubAssemblies(ctx: AnalysisContext, model: StepModel, out: Finding[]): void {
  const { design } = ctx;
  const solids = ctx.profiles.length > 0 ? solidsOf(ctx) : null;
  for (const sub of design.subAssemblies) {
    const join = model.joinStepOf.get(sub.id);
    const members = new Set([...sub.profileIds, ...sub.panelIds]);
    // Join direction: the sub-assembly arrives along it; nothing outside it may be in the way.
    if (join !== undefined && sub.joinDirection && solids) {
      const d = sub.joinDirection;
      const axis: Vec3 = [0, 0, 0];
      const k = Math.abs(d[0]) >= Math.abs(d[1]) && Math.abs(d[0]) >= Math.abs(d[2]) ? 0 : Math.abs(d[1]) >= Math.abs(d[2]) ? 1 : 2;
      axis[k] = Math.sign(d[k]);
      let blocker = -1;
      let blockerId = '';
      let blockedPart = '';
      for (const id of sub.profileIds) {
        const info = ctx.profileById.get(id);
        if (!info) continue;
        solids.near(sweptFrom(info.box, axis, solids.bounds), (s) => {
          if (members.has(s.id)) return;
          const at = placedAt(model, s.id);
          if (at !== undefined && at < join && at > blocker) { blocker = at; blockerId = s.id; blockedPart = id; }
        });
      }
      if (blocker >= 0) {
        out.push({
          id: findingId(CHECK, 'join-blocked', [sub.id]),
          check: CHECK,
          severity: 'error',
          partIds: [sub.id, blockerId, blockedPart],
          message: `The ${sub.name} cannot be joined along its join direction in ${model.title(join)}: ${nameOf(ctx, blockerId)}, placed in ${model.title(blocker)}, is in the way of ${nameOf(ctx, blockedPart)}. Move step ${join + 1} before step ${blocker + 1}.`,
          fix: moveBeforeFix(model, join, blocker),
        });
      }
    }
    // Orientation: once turned over, nothing more is built in the build orientation.
    if (sub.buildOrientation === 'as-placed') continue;
    const flip = design.steps.findIndex((s) => s.kind === 'flip' && s.subAssemblyId === sub.id);
    if (flip < 0) continue;
    design.steps.forEach((s, i) => {
      if (i <= flip || s.subAssemblyId !== sub.id || s.kind === 'flip') return;
      const orientation = s.orientation ?? sub.buildOrientation;
      if (orientation !== sub.buildOrientation) return;
      out.push({
        id: findingId(CHECK, 'built-after-flip', [s.id]),
        check: CHECK,
        severity: 'error',
        partIds: [sub.id, ...s.partIds.slice(0, 8)],
        message: `${model.title(i)} builds the ${sub.name} ${sub.buildOrientation.replace(/-/g, ' ')}, but ${model.title(flip)} has already turned it over. Move step ${i + 1} before step ${flip + 1}.`,
        fix: moveBeforeFix(model, i, flip),
      });
    });
  }
}

// ---------- references and coverage ----------

function checkCoverage(ctx: AnalysisContext, model: StepModel, out: Finding[]): void {
  const { design } = ctx;
  const seen = new Map<string, number>();
  const twice: string[] = [];
  design.steps.forEach((s, i) => {
    for (const id of s.partIds) {
      if (seen.has(id) && seen.get(id) !== i) twice.push(id);
      else seen.set(id, i);
    }
  });
  if (twice.length > 0) {
    out.push({
      id: findingId(CHECK, 'part-in-two-steps', twice.slice(0, 8)),
      check: CHECK,
      severity: 'warning',
      partIds: twice,
      message: `${twice.length === 1 ? `${capitalise(nameOf(ctx, twice[0]))} is` : `${capitalise(twice.slice(0, 8).map((id) => nameOf(ctx, id)).join(', '))}${twice.length > 8 ? '…' : ''} are`} in more than one step; each part goes in once (the first step counts).`,
    });
  }
  const missing = [...design.profiles, ...design.joints, ...design.panels, ...design.accessories].map((x) => x.id).filter((id) => !model.stepOf.has(id));
  if (missing.length > 0) {
    out.push({
      id: findingId(CHECK, 'part-in-no-step', missing.slice(0, 8)),
      check: CHECK,
      severity: 'warning',
      partIds: missing,
      message: `${missing.length} ${missing.length === 1 ? 'part is' : 'parts are'} in no assembly step (${missing.slice(0, 8).map((id) => nameOf(ctx, id)).join(', ')}${missing.length > 8 ? '…' : ''}). Move ${missing.length === 1 ? 'it' : 'them'} into a step, or regenerate the sequence.`,
      fix: { label: `Add to the last step`, operation: { type: 'movePartsToStep', payload: { partIds: missing, stepId: design.steps[design.steps.length - 1].id } } },
    });
  }
}

function checkReferences(ctx: AnalysisContext, out: Finding[]): void {
  const { design } = ctx;
  if (design.steps.length === 0 && design.subAssemblies.length === 0) return;
  const allIds = allDesignIds(ctx);
  const subIds = new Set(design.subAssemblies.map((s) => s.id));
  for (const step of design.steps) {
    const unknown = step.partIds.filter((id) => !allIds.has(id));
    if (unknown.length > 0) {
      out.push({
        id: findingId(CHECK, 'step-unknown-part', [step.id]),
        check: CHECK,
        severity: 'error',
        partIds: [step.id, ...unknown],
        message: `Assembly step "${step.title}" names ${unknown.join(', ')}, which ${unknown.length === 1 ? 'is' : 'are'} not in the design.`,
      });
    }
    if (step.subAssemblyId && !subIds.has(step.subAssemblyId)) {
      out.push({
        id: findingId(CHECK, 'step-unknown-subassembly', [step.id]),
        check: CHECK,
        severity: 'error',
        partIds: [step.id],
        message: `Assembly step "${step.title}" refers to sub-assembly ${step.subAssemblyId}, which is not in the design.`,
      });
    }
  }
  for (const sub of design.subAssemblies) {
    const unknown = [...sub.profileIds, ...sub.panelIds].filter((id) => !allIds.has(id));
    if (unknown.length > 0) {
      out.push({
        id: findingId(CHECK, 'subassembly-unknown-part', [sub.id]),
        check: CHECK,
        severity: 'error',
        partIds: [sub.id, ...unknown],
        message: `Sub-assembly "${sub.name}" names ${unknown.join(', ')}, which ${unknown.length === 1 ? 'is' : 'are'} not in the design.`,
      });
    }
  }
}

/**
 * Sequence feasibility, from design.steps: steps and sub-assemblies name existing parts; a joint
 * comes no earlier than its profiles; slide-in T-nuts enter a slot from an open end, so they go in
 * before both ends of that profile are closed (common practice); a captured panel goes in before
 * its frame is closed.
 */
import type { Finding } from '../analysisTypes';
import type { Joint, ProfileEnd } from '../design/schema';
import { accessoriesAt, allDesignIds, jointsAt, type AnalysisContext, type ProfileInfo } from './context';
import { capitalise, countOf, findingId, jointName, panelName, profileName } from './describe';
import { useDropInTNutsFix } from './fixes';

const CHECK = 'sequence';
/** Accessories that close a profile end's slots. */
const SLOT_CLOSING_ACCESSORIES = new Set(['end-cap', 'leveling-foot', 'caster']);

export function sequenceFindings(ctx: AnalysisContext): Finding[] {
  const { design } = ctx;
  const out: Finding[] = [];
  checkReferences(ctx, out);
  if (design.steps.length === 0) return out;

  // First step placing each part.
  const stepOf = new Map<string, number>();
  design.steps.forEach((step, index) => {
    for (const id of step.partIds) if (!stepOf.has(id)) stepOf.set(id, index);
    if (step.subAssemblyId) {
      const sub = design.subAssemblies.find((s) => s.id === step.subAssemblyId);
      for (const id of [...(sub?.profileIds ?? []), ...(sub?.panelIds ?? [])]) if (!stepOf.has(id)) stepOf.set(id, index);
    }
  });
  const stepTitle = (i: number) => `step ${i + 1} ("${design.steps[i].title}")`;

  for (const joint of design.joints) {
    const js = stepOf.get(joint.id);
    if (js === undefined) continue;
    for (const m of joint.members) {
      const ps = stepOf.get(m.profileId);
      if (ps !== undefined && ps > js) {
        out.push({
          id: findingId(CHECK, 'joint-before-profile', [joint.id, m.profileId]),
          check: CHECK,
          severity: 'error',
          partIds: [joint.id, m.profileId],
          message: `${capitalise(jointName(ctx, joint))} is made in ${stepTitle(js)}, before ${profileName(ctx.profileById.get(m.profileId))} is placed in ${stepTitle(ps)}.`,
        });
      }
    }
    if (joint.tNut === 'slide-in') checkSlideInTNuts(ctx, joint, js, stepOf, stepTitle, out);
  }

  for (const info of ctx.panels) {
    if (info.panel.mounting !== 'captured' || info.bounding.length === 0) continue;
    const ps = stepOf.get(info.panel.id);
    if (ps === undefined) continue;
    // The frame is closed once its four profiles and the joints between them are all in place.
    const frame = new Set(info.bounding.map((b) => b.profile.id));
    let closedAt = -1;
    let open = false;
    let frameJoints = 0;
    for (const b of info.bounding) {
      const bs = stepOf.get(b.profile.id);
      if (bs === undefined) open = true;
      else closedAt = Math.max(closedAt, bs);
      for (const j of b.joints) {
        if (j.members.filter((m) => frame.has(m.profileId)).length < 2) continue;
        frameJoints += 1;
        const s = stepOf.get(j.id);
        if (s === undefined) open = true;
        else closedAt = Math.max(closedAt, s);
      }
    }
    if (frameJoints === 0) continue;
    if (!open && closedAt < ps) {
      out.push({
        id: findingId(CHECK, 'panel-after-frame', [info.panel.id]),
        check: CHECK,
        severity: 'error',
        partIds: [info.panel.id, ...info.bounding.map((b) => b.profile.id)],
        message: `${capitalise(panelName(info.panel))} is captured in slots but is placed in ${stepTitle(ps)}, after its frame is closed in ${stepTitle(closedAt)}. Place the panel before the last joint of its frame.`,
      });
    }
  }
  return out;
}

/** When (step index) an end of a profile is closed by a joint or an end accessory, other than `except`. */
function endClosedAt(ctx: AnalysisContext, info: ProfileInfo, end: ProfileEnd, except: Joint, stepOf: Map<string, number>): number | null {
  let at: number | null = null;
  for (const j of jointsAt(info, end)) {
    if (j.id === except.id) continue;
    const s = stepOf.get(j.id);
    if (s !== undefined) at = at === null ? s : Math.min(at, s);
  }
  for (const a of accessoriesAt(info, end)) {
    if (!SLOT_CLOSING_ACCESSORIES.has(a.kind)) continue;
    const s = stepOf.get(a.id);
    if (s !== undefined) at = at === null ? s : Math.min(at, s);
  }
  return at;
}

function checkSlideInTNuts(
  ctx: AnalysisContext,
  joint: Joint,
  jointStep: number,
  stepOf: Map<string, number>,
  stepTitle: (i: number) => string,
  out: Finding[],
): void {
  const connector = ctx.catalogue.connectors.get(joint.connectorId);
  if (connector && connector.tNutCount === 0) return;
  for (const m of joint.members) {
    const info = ctx.profileById.get(m.profileId);
    if (!info) continue;
    const startClosed = endClosedAt(ctx, info, 'start', joint, stepOf);
    const endClosed = endClosedAt(ctx, info, 'end', joint, stepOf);
    // Slide-in T-nuts need one open end; the end being joined by this joint is still open.
    const jointEnd = m.at === 'span' ? null : m.at;
    const startBlocked = jointEnd !== 'start' && startClosed !== null && startClosed < jointStep;
    const endBlocked = jointEnd !== 'end' && endClosed !== null && endClosed < jointStep;
    if (!startBlocked || !endBlocked) continue;
    const fix = useDropInTNutsFix(joint.id);
    out.push({
      id: findingId(CHECK, 'slide-in-closed', [joint.id, info.profile.id]),
      check: CHECK,
      severity: 'error',
      partIds: [joint.id, info.profile.id],
      message: `${capitalise(jointName(ctx, joint))} uses slide-in T-nuts in ${profileName(info, info.profile.id)}, but both its ends are closed before ${stepTitle(jointStep)} (in ${stepTitle(startClosed as number)} and ${stepTitle(endClosed as number)}). Use drop-in T-nuts, or slide the T-nuts in before those steps.`,
      ...(fix ? { fix } : {}),
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
        message: `Assembly step "${step.title}" names ${unknown.length === 1 ? 'a part that is' : `${countOf(unknown.length, 'part')} that are`} not in the design.`,
      });
    }
    if (step.subAssemblyId && !subIds.has(step.subAssemblyId)) {
      out.push({
        id: findingId(CHECK, 'step-unknown-subassembly', [step.id]),
        check: CHECK,
        severity: 'error',
        partIds: [step.id],
        message: `Assembly step "${step.title}" refers to a sub-assembly that is not in the design.`,
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
        message: `Sub-assembly "${sub.name}" names ${unknown.length === 1 ? 'a part that is' : `${countOf(unknown.length, 'part')} that are`} not in the design.`,
      });
    }
  }
}

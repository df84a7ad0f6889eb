/**
 * Frame groups: a starter's parts kept together with the parameters that made them (mm).
 * `addFrameGroup` runs a starter and records the group; `regenerateFrameGroup` runs it again with
 * new parameters, swaps the group's parts for the new ones (keeping their ids where the new part
 * has the same label or role), and carries over what people added by hand (joints, panels,
 * accessories, loads) where it still fits. What no longer fits is taken out and listed on the
 * group, so the frame-group check can say so; undo brings it back.
 */
import { defaultCatalogue, getVariant } from '../catalogue';
import type { Catalogue } from '../catalogue/types';
import { distance } from '../geometry/vectors';
import { pointAlongProfile, profileEndPoint } from '../geometry/profileGeometry';
import { getGenerator, tryGenerateDesign } from './generators';
import { createIdAllocator } from './ids';
import { mergeDesignParts, topLevelIds } from './mergeDesign';
import { OperationError, type FrameGroupInput } from './operationTypes';
import { findOpenings, openingBoundedBy, panelRectForOpening } from './openings';
import type { Accessory, DesignDocument, FrameGroup, Joint, Panel, Profile, Vec3 } from './schema';

export type FrameGroupParams = FrameGroup['params'];

export type AddFrameGroupInput = FrameGroupInput;

function generate(generatorId: string, params: FrameGroupParams, catalogue: Catalogue): { design: DesignDocument; params: FrameGroupParams } {
  const generator = getGenerator(generatorId);
  if (!generator) throw new OperationError(`There is no frame starter "${generatorId}"`);
  const result = tryGenerateDesign(generatorId, params, catalogue);
  if (!result.ok) throw new OperationError(result.errors.map((e) => e.message).join('; '));
  // Keep the parsed parameters (defaults filled in) as plain JSON values.
  const parsed = generator.paramsSchema.parse(params) as Record<string, unknown>;
  const clean: FrameGroupParams = {};
  for (const [key, value] of Object.entries(parsed)) {
    if (value === undefined) continue;
    if (typeof value === 'number' || typeof value === 'string' || typeof value === 'boolean' || value === null) clean[key] = value;
  }
  return { design: result.design, params: clean };
}

export function frameGroupsOf(design: DesignDocument): FrameGroup[] {
  return design.frameGroups ?? [];
}

/** The group that made a part, if any. */
export function frameGroupOfPart(design: DesignDocument, partId: string): FrameGroup | undefined {
  return frameGroupsOf(design).find((group) => group.partIds.includes(partId));
}

/** Runs a starter and records its parts as a new frame group. */
export function addFrameGroup(design: DesignDocument, input: AddFrameGroupInput, catalogue: Catalogue = defaultCatalogue): DesignDocument {
  const { design: fresh, params } = generate(input.generatorId, input.params, catalogue);
  const generatorName = getGenerator(input.generatorId)!.name;
  const origin = input.origin ?? [0, 0, 0];
  const base: DesignDocument =
    input.placement === 'replace'
      ? { ...fresh, profiles: [], joints: [], panels: [], accessories: [], subAssemblies: [], steps: [], loadCases: [], name: design.name, units: design.units, metadata: design.metadata, frameGroups: [] }
      : design;
  const { design: merged, renamed } = mergeDesignParts(base, fresh, origin);
  const ids = createIdAllocator(merged);
  const taken = new Set(frameGroupsOf(merged).map((group) => group.id));
  let id = input.id;
  if (id !== undefined && (taken.has(id) || ids.has(id))) throw new OperationError(`The id "${id}" is already used in this design`);
  if (id === undefined) {
    let n = 1;
    while (taken.has(`fg-${n}`) || ids.has(`fg-${n}`)) n++;
    id = `fg-${n}`;
  }
  const count = frameGroupsOf(merged).filter((group) => group.generatorId === input.generatorId).length;
  const group: FrameGroup = {
    id,
    name: input.name ?? (count === 0 ? generatorName : `${generatorName} ${count + 1}`),
    generatorId: input.generatorId,
    params,
    origin,
    partIds: topLevelIds(fresh).map((part) => renamed.get(part) ?? part),
    unfit: [],
  };
  return { ...merged, frameGroups: [...frameGroupsOf(merged), group] };
}

/** Something people added by hand that a regeneration had to take out. */
export interface UnfitPart {
  label: string;
  reason: string;
}

/** Regenerates a frame group from new parameters (mm). Throws OperationError with the starter's messages on bad parameters. */
export function regenerateFrameGroup(design: DesignDocument, groupId: string, params: FrameGroupParams, catalogue: Catalogue = defaultCatalogue): DesignDocument {
  const group = frameGroupsOf(design).find((candidate) => candidate.id === groupId);
  if (!group) throw new OperationError(`There is no frame group "${groupId}" in this design`);
  const { design: fresh, params: parsed } = generate(group.generatorId, { ...group.params, ...params }, catalogue);
  const own = new Set(group.partIds);

  // 1. The design without the group's own parts; parts added by hand stay, for now with their references.
  const stripped: DesignDocument = {
    ...design,
    profiles: design.profiles.filter((p) => !own.has(p.id)),
    joints: design.joints.filter((j) => !own.has(j.id)),
    panels: design.panels.filter((p) => !own.has(p.id)),
    accessories: design.accessories.filter((a) => !own.has(a.id)),
    subAssemblies: design.subAssemblies.filter((s) => !own.has(s.id)),
    steps: design.steps.filter((s) => !own.has(s.id)),
    loadCases: design.loadCases.filter((l) => !own.has(l.id)),
  };

  // 2. The new parts keep the old ids where they play the same part (same label, same joint, same role).
  const preferred = matchIds(design, own, fresh);
  const { design: merged, renamed } = mergeDesignParts(stripped, fresh, group.origin, preferred);
  const newOwn = topLevelIds(fresh).map((part) => renamed.get(part) ?? part);
  const newOwnSet = new Set(newOwn);

  // 3. Carry over the hand-made parts where they still fit.
  const unfit: UnfitPart[] = [];
  const profiles = new Map(merged.profiles.map((p) => [p.id, p]));
  const oldProfiles = new Map(design.profiles.map((p) => [p.id, p]));
  const label = (p: Profile | undefined, id: string) => p?.label ?? oldProfiles.get(id)?.label ?? 'a profile of the frame';

  const joints: Joint[] = [];
  const droppedJoints = new Set<string>();
  for (const joint of merged.joints) {
    if (newOwnSet.has(joint.id)) {
      joints.push(joint);
      continue;
    }
    const missing = joint.members.find((m) => !profiles.has(m.profileId));
    if (missing) {
      droppedJoints.add(joint.id);
      unfit.push({ label: jointLabel(joint, oldProfiles), reason: `${label(undefined, missing.profileId)} is no longer part of the frame` });
    } else if (!membersStillMeet(joint, profiles, catalogue)) {
      droppedJoints.add(joint.id);
      unfit.push({ label: jointLabel(joint, oldProfiles), reason: 'its profiles no longer meet' });
    } else joints.push(joint);
  }

  let openings: ReturnType<typeof findOpenings> | undefined;
  const panels: Panel[] = [];
  const droppedPanels = new Set<string>();
  for (const panel of merged.panels) {
    if (newOwnSet.has(panel.id) || !panel.boundedBy) {
      panels.push(panel);
      continue;
    }
    const missing = panel.boundedBy.find((id) => !profiles.has(id));
    openings ??= findOpenings(merged, catalogue);
    const opening = missing ? undefined : openingBoundedBy(openings, panel.boundedBy);
    if (!opening) {
      droppedPanels.add(panel.id);
      unfit.push({
        label: panelLabel(panel),
        reason: missing ? `${label(undefined, missing)} is no longer part of the frame` : 'its four profiles no longer frame an opening',
      });
      continue;
    }
    const size = getVariant(catalogue, profiles.get(panel.boundedBy[0])!.variantId)?.width ?? 0;
    panels.push({ ...panel, rect: panelRectForOpening(opening, panel.mounting, panel.thickness, size) });
  }
  const panelIds = new Set(panels.map((p) => p.id));

  const accessories: Accessory[] = [];
  for (const accessory of merged.accessories) {
    if (newOwnSet.has(accessory.id)) {
      accessories.push(accessory);
      continue;
    }
    const profile = accessory.profileId !== undefined ? profiles.get(accessory.profileId) : undefined;
    if (accessory.profileId !== undefined && !profile) {
      unfit.push({ label: accessoryLabel(accessory), reason: `${label(undefined, accessory.profileId)} is no longer part of the frame` });
    } else if (profile && accessory.along !== undefined && accessory.along > profile.length) {
      unfit.push({ label: accessoryLabel(accessory), reason: `it sat beyond the end of ${label(profile, profile.id)}` });
    } else if (accessory.panelId !== undefined && !panelIds.has(accessory.panelId)) {
      unfit.push({ label: accessoryLabel(accessory), reason: 'its panel was taken out' });
    } else accessories.push(accessory);
  }

  // Machining a kept hand-made joint had on a regenerated profile moves to the new profile.
  const keptJointIds = new Set(joints.map((j) => j.id));
  const handMachining = new Map<string, Profile['machining']>();
  for (const p of design.profiles) {
    if (!own.has(p.id)) continue;
    const kept = p.machining.filter((m) => m.jointId !== undefined && !own.has(m.jointId) && keptJointIds.has(m.jointId));
    if (kept.length) handMachining.set(p.id, kept);
  }
  const profilesOut = merged.profiles.map((p) => {
    const machining = p.machining.filter((m) => m.jointId === undefined || !droppedJoints.has(m.jointId));
    const extra = (handMachining.get(p.id) ?? []).filter((m) => m.offset <= p.length);
    return machining.length === p.machining.length && !extra.length ? p : { ...p, machining: [...machining, ...extra] };
  });

  const present = new Set([...profiles.keys(), ...joints.map((j) => j.id), ...panelIds, ...accessories.map((a) => a.id)]);
  const loadCases = merged.loadCases.map((loadCase) => {
    if (newOwnSet.has(loadCase.id)) return loadCase;
    const loads = loadCase.loads.filter((load) => {
      const target = load.profileId ?? (load.kind === 'uniform' ? load.panelId : undefined);
      if (target === undefined || present.has(target)) return true;
      unfit.push({ label: `A load in "${loadCase.name}"`, reason: 'the part it pushed on was taken out' });
      return false;
    });
    return loads.length === loadCase.loads.length ? loadCase : { ...loadCase, loads };
  });
  const steps = merged.steps.map((step) => (newOwnSet.has(step.id) ? step : { ...step, partIds: step.partIds.filter((id) => present.has(id)) }));
  const subAssemblies = merged.subAssemblies.map((sub) =>
    newOwnSet.has(sub.id) ? sub : { ...sub, profileIds: sub.profileIds.filter((id) => present.has(id)), panelIds: sub.panelIds.filter((id) => present.has(id)) },
  );

  const nextGroup: FrameGroup = { ...group, params: parsed, partIds: newOwn, unfit };
  return {
    ...merged,
    profiles: profilesOut,
    joints,
    panels,
    accessories,
    loadCases,
    steps,
    subAssemblies,
    frameGroups: frameGroupsOf(design).map((candidate) => (candidate.id === group.id ? nextGroup : candidate)),
  };
}

/** Renames a frame group. */
export function renameFrameGroup(design: DesignDocument, groupId: string, name: string): DesignDocument {
  const trimmed = name.trim();
  if (!trimmed) throw new OperationError('A frame group needs a name');
  if (!frameGroupsOf(design).some((group) => group.id === groupId)) throw new OperationError(`There is no frame group "${groupId}" in this design`);
  return { ...design, frameGroups: frameGroupsOf(design).map((group) => (group.id === groupId ? { ...group, name: trimmed.slice(0, 80) } : group)) };
}

export { pruneFrameGroups } from './frameGroupMembers';

// ---------- matching old and new parts ----------

function matchIds(design: DesignDocument, own: Set<string>, fresh: DesignDocument): Map<string, string> {
  const wish = new Map<string, string>();
  const used = new Set<string>();
  const claim = (freshId: string, oldId: string | undefined) => {
    if (oldId === undefined || used.has(oldId)) return;
    used.add(oldId);
    wish.set(freshId, oldId);
  };
  const byKey = <T>(old: T[], key: (part: T) => string) => {
    const map = new Map<string, T[]>();
    for (const part of old) map.set(key(part), [...(map.get(key(part)) ?? []), part]);
    return (k: string) => map.get(k)?.find((part) => !used.has((part as { id: string }).id)) as (T & { id: string }) | undefined;
  };
  const oldOf = <T extends { id: string }>(list: T[]) => list.filter((part) => own.has(part.id));

  const profileByLabel = byKey(oldOf(design.profiles), (p) => p.label ?? '');
  for (const p of fresh.profiles) claim(p.id, profileByLabel(p.label ?? '')?.id);
  const mapped = (id: string) => wish.get(id) ?? `new:${id}`;
  const jointKey = (j: Joint, map: (id: string) => string) => `${j.kind}|${j.members.map((m) => `${map(m.profileId)}@${m.at}`).join('|')}`;
  const jointByKey = byKey(oldOf(design.joints), (j) => jointKey(j, (id) => id));
  for (const j of fresh.joints) claim(j.id, jointByKey(jointKey(j, mapped))?.id);
  const panelByKey = byKey(oldOf(design.panels), (p) => `${p.role}|${p.rect.normal}|${p.label ?? ''}`);
  for (const p of fresh.panels) claim(p.id, panelByKey(`${p.role}|${p.rect.normal}|${p.label ?? ''}`)?.id);
  const accessoryKey = (a: Accessory, map: (id: string) => string) =>
    `${a.kind}|${a.profileId !== undefined ? map(a.profileId) : ''}|${a.end ?? ''}|${a.panelId !== undefined ? map(a.panelId) : ''}`;
  const accessoryByKey = byKey(oldOf(design.accessories), (a) => accessoryKey(a, (id) => id));
  for (const a of fresh.accessories) claim(a.id, accessoryByKey(accessoryKey(a, mapped))?.id);
  const byName = <T extends { id: string }>(old: T[], fresh: T[], name: (part: T) => string) => {
    const find = byKey(oldOf(old), name);
    for (const part of fresh) claim(part.id, find(name(part))?.id);
  };
  byName(design.subAssemblies, fresh.subAssemblies, (s) => s.name);
  byName(design.steps, fresh.steps, (s) => s.title);
  byName(design.loadCases, fresh.loadCases, (l) => l.name);
  return wish;
}

// ---------- fit and words ----------

/** Extra reach allowed when deciding whether a hand-made joint's profiles still meet, mm (common practice, no source). */
const MEET_TOLERANCE_MM = 1;

function membersStillMeet(joint: Joint, profiles: Map<string, Profile>, catalogue: Catalogue): boolean {
  const [first, ...others] = joint.members;
  const a = profiles.get(first.profileId)!;
  if (first.at === 'span' && (first.along ?? 0) > a.length) return false;
  const point = first.at === 'span' ? pointAlongProfile(a, first.along ?? 0) : profileEndPoint(a, first.at);
  const half = (p: Profile) => {
    const v = getVariant(catalogue, p.variantId);
    return v ? Math.hypot(v.width, v.height) / 2 : 0;
  };
  return others.every((member) => {
    const b = profiles.get(member.profileId)!;
    if (member.at === 'span' && (member.along ?? 0) > b.length) return false;
    return distanceToSegment(point, b) <= half(b) + half(a) + MEET_TOLERANCE_MM;
  });
}

function distanceToSegment(point: Vec3, p: Profile): number {
  const rel = [point[0] - p.start[0], point[1] - p.start[1], point[2] - p.start[2]];
  const t = Math.min(p.length, Math.max(0, rel[0] * p.direction[0] + rel[1] * p.direction[1] + rel[2] * p.direction[2]));
  return distance(point, pointAlongProfile(p, t));
}

function jointLabel(joint: Joint, profiles: Map<string, Profile>): string {
  const names = joint.members.map((m) => profiles.get(m.profileId)?.label).filter((name): name is string => !!name);
  const kind = joint.kind.replace(/-/g, ' ');
  return names.length >= 2 ? `The ${kind} joining ${names[0]} and ${names[1]}` : `A ${kind} added by hand`;
}

function panelLabel(panel: Panel): string {
  return panel.label ? `Panel "${panel.label}"` : `The ${panel.role === 'panel' ? 'panel' : panel.role} added by hand (${Math.round(panel.rect.width)} × ${Math.round(panel.rect.height)} mm)`;
}

function accessoryLabel(accessory: Accessory): string {
  return `A ${accessory.kind.replace(/-/g, ' ')} added by hand`;
}

/**
 * Edits of the design document as pure functions: each returns a new document and never changes
 * its input. `DesignOperation` is the serialisable form (type + payload) that findings carry as
 * fixes and the editor replays; `applyOperation` runs one. Lengths mm.
 * Bad input (unknown ids, a length of 0) throws an OperationError whose message a person can read.
 */
import { connectorFor, defaultCatalogue, getConnector, getSystem } from '../catalogue';
import type { Catalogue } from '../catalogue/types';
import { normalize } from '../geometry/vectors';
import { addHingedDoor, addSlidingDoors } from './doorOperations';
import { addLoadCase, insertDesign, removeLoadCase, replaceDesign, setUnits, updateJoint, updateSettings } from './documentOperations';
import { addFeetToFreeBottomEnds, autoEndCaps } from './endTreatments';
import { pruneFrameGroups } from './frameGroupMembers';
import { createIdAllocator, type IdAllocator } from './ids';
import { withJointMachining } from './jointMachining';
import { arrayParts, duplicateParts, mirrorParts, refreshJointPositions, rotateParts90, translateParts } from './moveOperations';
import { followPartChanges, mergeSteps, moveStep, moveStepAfter, moveStepBefore, movePartsToStep, regenerateSequence, splitStep, updateStep } from '../assembly/sequenceOperations';
import {
  OperationError,
  DISPLAY_OPERATION_TYPES,
  SEQUENCE_OPERATION_TYPES,
  type AccessoryInput,
  type DesignOperation,
  type JointInput,
  type PanelChanges,
  type PanelInput,
  type ProfileChanges,
  type ProfileInput,
} from './operationTypes';
import type {
  Accessory,
  Cutout,
  DesignDocument,
  Joint,
  JointKind,
  JointMember,
  Panel,
  Profile,
  Vec3,
} from './schema';

export { newId, createIdAllocator } from './ids';
export { addHingedDoor, addSlidingDoors, SLIDING_LEAF_OVERLAP_MM, MIN_SLIDING_OPENING_WIDTH_MM, MIN_DOOR_OPENING_MM } from './doorOperations';
export { autoEndCaps, addFeetToFreeBottomEnds, freeEnds, bottomEnds } from './endTreatments';
export * from './operationTypes';
export { arrayParts, copyParts, duplicateParts, mirrorParts, refreshJointPositions, rotateParts90, translateParts } from './moveOperations';


// ---------- profiles ----------

function checkLength(length: number): void {
  if (!Number.isFinite(length) || length <= 0) throw new OperationError('A profile length must be greater than 0 mm');
}

function unitDirection(direction: readonly number[]): Vec3 {
  const d = normalize([direction[0], direction[1], direction[2]]);
  if (d[0] === 0 && d[1] === 0 && d[2] === 0) throw new OperationError('A profile direction cannot be the zero vector');
  return d;
}

function findProfile(design: DesignDocument, id: string): Profile {
  const p = design.profiles.find((x) => x.id === id);
  if (!p) throw new OperationError(`There is no profile "${id}" in this design`);
  return p;
}

function checkVariant(catalogue: Catalogue, variantId: string): void {
  if (!catalogue.variants.some((v) => v.id === variantId)) throw new OperationError(`Unknown profile variant "${variantId}"`);
}

function claimId(ids: IdAllocator, wanted: string | undefined, prefix: string): string {
  if (wanted === undefined) return ids.next(prefix);
  if (ids.has(wanted)) throw new OperationError(`The id "${wanted}" is already used in this design`);
  return wanted;
}

export function addProfile(design: DesignDocument, input: ProfileInput, catalogue: Catalogue = defaultCatalogue): DesignDocument {
  checkLength(input.length);
  const variantId = input.variantId ?? getSystem(catalogue, design.systemId)?.defaultVariantId;
  if (!variantId) throw new OperationError(`The design's system "${design.systemId}" has no default profile variant`);
  checkVariant(catalogue, variantId);
  const ids = createIdAllocator(design);
  const profile: Profile = {
    id: claimId(ids, input.id, 'p'),
    variantId,
    length: input.length,
    start: [...input.start] as Vec3,
    direction: unitDirection(input.direction),
    rollDeg: input.rollDeg ?? 0,
    machining: [],
    ...(input.label !== undefined ? { label: input.label } : {}),
  };
  return { ...design, profiles: [...design.profiles, profile] };
}

export function updateProfile(
  design: DesignDocument,
  profileId: string,
  changes: ProfileChanges,
  catalogue: Catalogue = defaultCatalogue,
): DesignDocument {
  findProfile(design, profileId);
  if (changes.length !== undefined) checkLength(changes.length);
  if (changes.variantId !== undefined) checkVariant(catalogue, changes.variantId);
  const updated: DesignDocument = {
    ...design,
    profiles: design.profiles.map((p) => {
      if (p.id !== profileId) return p;
      const next: Profile = { ...p };
      if (changes.length !== undefined) next.length = changes.length;
      if (changes.start !== undefined) next.start = [...changes.start] as Vec3;
      if (changes.direction !== undefined) next.direction = unitDirection(changes.direction);
      if (changes.rollDeg !== undefined) next.rollDeg = changes.rollDeg;
      if (changes.variantId !== undefined) next.variantId = changes.variantId;
      if (changes.label !== undefined) next.label = changes.label;
      return next;
    }),
  };
  return refreshJointPositions(updated, [profileId], catalogue);
}

// ---------- removal with cascade ----------

/**
 * Removes profiles, joints, panels, accessories, sub-assemblies, steps or load cases by id, and
 * everything that refers to a removed part: joints on a removed profile (with their machining),
 * panels held by a removed profile, accessories on removed parts, loads on removed parts;
 * steps and sub-assemblies drop the removed ids.
 */
export function removeParts(design: DesignDocument, ids: string[]): DesignDocument {
  const gone = new Set(ids);
  const profilesGone = new Set(design.profiles.filter((p) => gone.has(p.id)).map((p) => p.id));
  const jointsGone = new Set(
    design.joints.filter((j) => gone.has(j.id) || j.members.some((m) => profilesGone.has(m.profileId))).map((j) => j.id),
  );
  const panelsGone = new Set(
    design.panels.filter((p) => gone.has(p.id) || (p.boundedBy ?? []).some((id) => profilesGone.has(id))).map((p) => p.id),
  );
  const accessoriesGone = design.accessories.filter(
    (a) => gone.has(a.id) || (a.profileId !== undefined && profilesGone.has(a.profileId)) || (a.panelId !== undefined && panelsGone.has(a.panelId)),
  );
  const accessoriesGoneIds = new Set(accessoriesGone.map((a) => a.id));
  // A removed foot or caster no longer needs its end tap (unless a joint placed it).
  const untap = new Set(
    accessoriesGone.filter((a) => (a.kind === 'leveling-foot' || a.kind === 'caster') && a.profileId && a.end).map((a) => `${a.profileId}@${a.end}`),
  );
  const removedAll = new Set([...profilesGone, ...jointsGone, ...panelsGone, ...accessoriesGoneIds]);
  const keepId = (id: string) => !removedAll.has(id);

  const profiles = design.profiles
    .filter((p) => !profilesGone.has(p.id))
    .map((p) => {
      const machining = p.machining.filter(
        (m) =>
          !gone.has(m.id) &&
          !(m.jointId !== undefined && jointsGone.has(m.jointId)) &&
          !(m.kind === 'end-tap' && m.jointId === undefined && untap.has(`${p.id}@${m.fromEnd}`)),
      );
      return machining.length === p.machining.length ? p : { ...p, machining };
    });
  const panels = design.panels
    .filter((p) => !panelsGone.has(p.id))
    .map((p) => (p.cutouts.some((c) => gone.has(c.id)) ? { ...p, cutouts: p.cutouts.filter((c) => !gone.has(c.id)) } : p));
  const subAssemblies = design.subAssemblies
    .filter((s) => !gone.has(s.id))
    .map((s) => ({ ...s, profileIds: s.profileIds.filter(keepId), panelIds: s.panelIds.filter(keepId) }));
  const subIds = new Set(subAssemblies.map((s) => s.id));
  const steps = design.steps
    .filter((s) => !gone.has(s.id))
    .map((s) => {
      const next = { ...s, partIds: s.partIds.filter(keepId) };
      if (next.subAssemblyId !== undefined && !subIds.has(next.subAssemblyId)) delete next.subAssemblyId;
      return next;
    });
  const loadCases = design.loadCases
    .filter((lc) => !gone.has(lc.id))
    .map((lc) => ({
      ...lc,
      loads: lc.loads.filter(
        (l) =>
          !(l.profileId !== undefined && profilesGone.has(l.profileId)) &&
          !(l.kind === 'uniform' && l.panelId !== undefined && panelsGone.has(l.panelId)),
      ),
    }));
  return pruneFrameGroups({
    ...design,
    profiles,
    joints: design.joints.filter((j) => !jointsGone.has(j.id)),
    panels,
    accessories: design.accessories.filter((a) => !accessoriesGoneIds.has(a.id)),
    subAssemblies,
    steps,
    loadCases,
  });
}


// ---------- joints ----------

function systemOfProfile(design: DesignDocument, profileId: string, catalogue: Catalogue): string {
  const p = design.profiles.find((x) => x.id === profileId);
  return catalogue.variants.find((v) => v.id === p?.variantId)?.systemId ?? design.systemId;
}

function resolveConnectorId(design: DesignDocument, members: JointMember[], kind: JointKind, connectorId: string | undefined, catalogue: Catalogue): string {
  if (connectorId !== undefined) {
    const c = getConnector(catalogue, connectorId);
    if (!c) throw new OperationError(`Unknown connector "${connectorId}"`);
    if (c.kind !== kind) throw new OperationError(`Connector ${c.name} is a ${c.kind}, not a ${kind}`);
    return c.id;
  }
  const systemId = systemOfProfile(design, members[0].profileId, catalogue);
  const c = connectorFor(catalogue, systemId, kind);
  if (!c) throw new OperationError(`The ${systemId} system has no ${kind} connector`);
  return c.id;
}

/** Changes a joint's connector, replacing the old connector's machining with the new one's. */
export function setJointConnector(
  design: DesignDocument,
  jointId: string,
  kind: JointKind,
  connectorId?: string,
  catalogue: Catalogue = defaultCatalogue,
): DesignDocument {
  const joint = design.joints.find((j) => j.id === jointId);
  if (!joint) throw new OperationError(`There is no joint "${jointId}" in this design`);
  const updated: Joint = { ...joint, kind, connectorId: resolveConnectorId(design, joint.members, kind, connectorId, catalogue) };
  const profiles = withJointMachining(design, updated, catalogue, createIdAllocator(design));
  return { ...design, profiles, joints: design.joints.map((j) => (j.id === jointId ? updated : j)) };
}

function buildJoint(design: DesignDocument, input: JointInput, ids: IdAllocator, catalogue: Catalogue): Joint {
  if (input.members.length < 2 || input.members.length > 3) throw new OperationError('A joint joins two or three profiles');
  for (const m of input.members) findProfile(design, m.profileId);
  return {
    id: claimId(ids, input.id, 'j'),
    kind: input.kind,
    connectorId: resolveConnectorId(design, input.members, input.kind, input.connectorId, catalogue),
    members: input.members.map((m) => ({ ...m })),
    fastenerHead: input.fastenerHead ?? 'button',
    tNut: input.tNut ?? 'drop-in',
    quantity: input.quantity ?? 1,
  };
}

/** Adds a joint with its connector's machining. */
export function addJoint(design: DesignDocument, input: JointInput, catalogue: Catalogue = defaultCatalogue): DesignDocument {
  return addJoints(design, [input], catalogue);
}

/** Adds many joints in one pass (machining included); fast for generated frames. */
export function addJoints(design: DesignDocument, inputs: JointInput[], catalogue: Catalogue = defaultCatalogue): DesignDocument {
  const ids = createIdAllocator(design);
  const joints = inputs.map((input) => buildJoint(design, input, ids, catalogue));
  let profiles = design.profiles;
  const needsMachining = joints.filter((j) => (getConnector(catalogue, j.connectorId)?.machining.length ?? 0) > 0);
  if (needsMachining.length > 0) {
    const index = new Map(profiles.map((p, i) => [p.id, i]));
    const next = [...profiles];
    for (const j of needsMachining) {
      const members = j.members.map((m) => next[index.get(m.profileId)!]);
      const local = withJointMachining({ ...design, profiles: members, joints: [] }, j, catalogue, ids);
      for (const p of local) next[index.get(p.id)!] = p;
    }
    profiles = next;
  }
  return { ...design, profiles, joints: [...design.joints, ...joints] };
}

export function removeJoint(design: DesignDocument, jointId: string): DesignDocument {
  if (!design.joints.some((j) => j.id === jointId)) throw new OperationError(`There is no joint "${jointId}" in this design`);
  return removeParts(design, [jointId]);
}

// ---------- panels and accessories ----------

function checkPanelNumbers(thickness: number | undefined, rect: Panel['rect'] | undefined): void {
  if (thickness !== undefined && !(thickness > 0)) throw new OperationError('A panel thickness must be greater than 0 mm');
  if (rect && !(rect.width > 0 && rect.height > 0)) throw new OperationError('A panel needs a width and a height greater than 0 mm');
}

export function addPanel(design: DesignDocument, input: PanelInput, catalogue: Catalogue = defaultCatalogue): DesignDocument {
  if (!catalogue.panelMaterials.some((m) => m.id === input.materialId)) throw new OperationError(`Unknown panel material "${input.materialId}"`);
  checkPanelNumbers(input.thickness, input.rect);
  if (input.mounting === 'captured' && (!input.boundedBy || input.boundedBy.length !== 4)) {
    throw new OperationError('A captured panel needs the four profiles that hold it');
  }
  for (const id of input.boundedBy ?? []) findProfile(design, id);
  const ids = createIdAllocator(design);
  const panel: Panel = {
    id: claimId(ids, input.id, 'panel'),
    materialId: input.materialId,
    thickness: input.thickness,
    mounting: input.mounting,
    role: input.role ?? 'panel',
    ...(input.boundedBy ? { boundedBy: [...input.boundedBy] } : {}),
    rect: { ...input.rect, center: [...input.rect.center] as Vec3 },
    cutouts: (input.cutouts ?? []).map((c) => ({ ...c, id: ids.next('cut') })),
    ...(input.label !== undefined ? { label: input.label } : {}),
  };
  return { ...design, panels: [...design.panels, panel] };
}

export function updatePanel(design: DesignDocument, panelId: string, changes: PanelChanges, catalogue: Catalogue = defaultCatalogue): DesignDocument {
  if (!design.panels.some((p) => p.id === panelId)) throw new OperationError(`There is no panel "${panelId}" in this design`);
  if (changes.materialId !== undefined && !catalogue.panelMaterials.some((m) => m.id === changes.materialId)) {
    throw new OperationError(`Unknown panel material "${changes.materialId}"`);
  }
  checkPanelNumbers(changes.thickness, changes.rect);
  return { ...design, panels: design.panels.map((p) => (p.id === panelId ? { ...p, ...changes } : p)) };
}

export function addCutout(design: DesignDocument, panelId: string, cutout: Omit<Cutout, 'id' | 'kind'> & { id?: string }): DesignDocument {
  const panel = design.panels.find((p) => p.id === panelId);
  if (!panel) throw new OperationError(`There is no panel "${panelId}" in this design`);
  if (!(cutout.diameter > 0)) throw new OperationError('A cut-out diameter must be greater than 0 mm');
  if (Math.abs(cutout.u) + cutout.diameter / 2 > panel.rect.width / 2 || Math.abs(cutout.v) + cutout.diameter / 2 > panel.rect.height / 2) {
    throw new OperationError('The cut-out reaches past the edge of the panel');
  }
  const id = claimId(createIdAllocator(design), cutout.id, 'cut');
  const added: Cutout = { id, kind: 'round', u: cutout.u, v: cutout.v, diameter: cutout.diameter };
  return { ...design, panels: design.panels.map((p) => (p.id === panelId ? { ...p, cutouts: [...p.cutouts, added] } : p)) };
}

export function addAccessory(design: DesignDocument, input: AccessoryInput, catalogue: Catalogue = defaultCatalogue): DesignDocument {
  const part = catalogue.accessories.find((a) => a.id === input.partId);
  if (!part) throw new OperationError(`Unknown accessory part "${input.partId}"`);
  if (part.kind !== input.kind) throw new OperationError(`Part ${part.name} is a ${part.kind}, not a ${input.kind}`);
  if (input.profileId !== undefined) findProfile(design, input.profileId);
  if (input.panelId !== undefined && !design.panels.some((p) => p.id === input.panelId)) {
    throw new OperationError(`There is no panel "${input.panelId}" in this design`);
  }
  const ids = createIdAllocator(design);
  const accessory: Accessory = {
    id: claimId(ids, input.id, input.kind === 'end-cap' ? 'cap' : 'acc'),
    kind: input.kind,
    partId: input.partId,
    quantity: input.quantity ?? 1,
    ...(input.profileId !== undefined ? { profileId: input.profileId } : {}),
    ...(input.panelId !== undefined ? { panelId: input.panelId } : {}),
    ...(input.end !== undefined ? { end: input.end } : {}),
    ...(input.along !== undefined ? { along: input.along } : {}),
    ...(input.length !== undefined ? { length: input.length } : {}),
  };
  return { ...design, accessories: [...design.accessories, accessory] };
}

// ---------- replay ----------

/**
 * Applies one serialisable operation. After a change to the parts, an assembly order the designer
 * never edited is generated again so it keeps up with the design (not after a display-only change
 * such as the units).
 */
export function applyOperation(design: DesignDocument, op: DesignOperation, catalogue: Catalogue = defaultCatalogue): DesignDocument {
  const next = applyOperationOnly(design, op, catalogue);
  return SEQUENCE_OPERATION_TYPES.has(op.type) || DISPLAY_OPERATION_TYPES.has(op.type) ? next : followPartChanges(design, next);
}

function applyOperationOnly(design: DesignDocument, op: DesignOperation, catalogue: Catalogue): DesignDocument {
  switch (op.type) {
    case 'addProfile':
      return addProfile(design, op.payload.profile, catalogue);
    case 'updateProfile':
      return updateProfile(design, op.payload.profileId, op.payload.changes, catalogue);
    case 'removeParts':
      return removeParts(design, op.payload.ids);
    case 'translateParts':
      return translateParts(design, op.payload.ids, op.payload.offset);
    case 'duplicateParts':
      return duplicateParts(design, op.payload.ids, op.payload.offset);
    case 'mirrorParts':
      return mirrorParts(design, op.payload.ids, op.payload.axis, op.payload.point, op.payload.keepOriginal ?? true);
    case 'arrayParts':
      return arrayParts(design, op.payload.ids, op.payload.count, op.payload.spacing);
    case 'rotateParts90':
      return rotateParts90(design, op.payload.ids, op.payload.axis, op.payload.point, op.payload.quarterTurns ?? 1);
    case 'setJointConnector':
      return setJointConnector(design, op.payload.jointId, op.payload.kind, op.payload.connectorId, catalogue);
    case 'addJoint':
      return addJoint(design, op.payload.joint, catalogue);
    case 'removeJoint':
      return removeJoint(design, op.payload.jointId);
    case 'addPanel':
      return addPanel(design, op.payload.panel, catalogue);
    case 'updatePanel':
      return updatePanel(design, op.payload.panelId, op.payload.changes, catalogue);
    case 'addCutout':
      return addCutout(design, op.payload.panelId, op.payload.cutout);
    case 'addAccessory':
      return addAccessory(design, op.payload.accessory, catalogue);
    case 'addSlidingDoors':
      return addSlidingDoors(design, op.payload.doors, catalogue);
    case 'addHingedDoor':
      return addHingedDoor(design, op.payload.door, catalogue);
    case 'autoEndCaps':
      return autoEndCaps(design, catalogue);
    case 'addFeetToFreeBottomEnds':
      return addFeetToFreeBottomEnds(design, op.payload?.kind ?? 'leveling-foot', catalogue);
    case 'updateSettings':
      return updateSettings(design, op.payload.changes);
    case 'setUnits':
      return setUnits(design, op.payload.units);
    case 'addLoadCase':
      return addLoadCase(design, op.payload.loadCase);
    case 'removeLoadCase':
      return removeLoadCase(design, op.payload.loadCaseId);
    case 'updateJoint':
      return updateJoint(design, op.payload.jointId, op.payload.changes);
    case 'insertDesign':
      return insertDesign(design, op.payload.design, op.payload.offset);
    case 'replaceDesign':
      return replaceDesign(design, op.payload.design);
    case 'moveStep':
      return moveStep(design, op.payload.stepId, op.payload.toIndex);
    case 'moveStepBefore':
      return moveStepBefore(design, op.payload.stepId, op.payload.beforeStepId);
    case 'moveStepAfter':
      return moveStepAfter(design, op.payload.stepId, op.payload.afterStepId);
    case 'mergeSteps':
      return mergeSteps(design, op.payload.stepIds);
    case 'splitStep':
      return splitStep(design, op.payload.stepId, op.payload.partIds, op.payload.newStepId);
    case 'movePartsToStep':
      return movePartsToStep(design, op.payload.partIds, op.payload.stepId);
    case 'updateStep':
      return updateStep(design, op.payload.stepId, op.payload.changes);
    case 'regenerateSequence':
      return regenerateSequence(design);
    case 'addFrameGroup':
    case 'regenerateFrameGroup':
    case 'renameFrameGroup':
      // Frame groups run the starters, which are built from these operations: applyDesignOperation
      // (applyDesignOperation.ts) handles them, so this module need not import the starters.
      throw new OperationError(`${op.type} is applied by applyDesignOperation`);
    default: {
      const never: never = op;
      throw new OperationError(`Unknown operation ${(never as { type: string }).type}`);
    }
  }
}

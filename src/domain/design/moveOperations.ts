/**
 * Moving and copying parts (translate, duplicate, mirror, array, quarter turns), keeping joints
 * measured correctly along the profiles they meet. Pure: each returns a new document. mm.
 */
import { defaultCatalogue, getConnector } from '../catalogue';
import type { Catalogue } from '../catalogue/types';
import { profileEndPoint } from '../geometry/profileGeometry';
import { dot, sub } from '../geometry/vectors';
import { createIdAllocator, type IdAllocator } from './ids';
import { withJointMachining } from './jointMachining';
import { OperationError } from './operationTypes';
import { mirror, quarterTurns, transformPanel, transformProfile, translation, type RigidTransform } from './partTransforms';
import type { Axis, DesignDocument, Joint, Vec3 } from './schema';

/**
 * After profiles move or change, re-measure where each affected joint sits along the profiles it
 * meets mid-span, and re-place machining that depends on that position (end-screw access holes).
 */
export function refreshJointPositions(design: DesignDocument, changedProfileIds: Iterable<string>, catalogue: Catalogue = defaultCatalogue): DesignDocument {
  const changed = new Set(changedProfileIds);
  if (changed.size === 0) return design;
  const byId = new Map(design.profiles.map((p) => [p.id, p]));
  let touched = false;
  const repositioned: Joint[] = [];
  const joints = design.joints.map((j) => {
    if (!j.members.some((m) => changed.has(m.profileId))) return j;
    const joined = j.members[0];
    const joinedProfile = byId.get(joined.profileId);
    if (!joinedProfile || joined.at === 'span') return j;
    const endPoint = profileEndPoint(joinedProfile, joined.at);
    let moved = false;
    const members = j.members.map((m) => {
      if (m.at !== 'span') return m;
      const other = byId.get(m.profileId);
      if (!other) return m;
      const along = Math.round(Math.max(0, Math.min(other.length, dot(sub(endPoint, other.start), other.direction))) * 1000) / 1000;
      if (along === m.along) return m;
      moved = true;
      return { ...m, along };
    });
    if (!moved) return j;
    touched = true;
    const next = { ...j, members };
    if (getConnector(catalogue, j.connectorId)?.machining.some((spec) => spec.on === 'met')) repositioned.push(next);
    return next;
  });
  if (!touched) return design;
  let out: DesignDocument = { ...design, joints };
  if (repositioned.length) {
    const ids = createIdAllocator(out);
    for (const j of repositioned) out = { ...out, profiles: withJointMachining(out, j, catalogue, ids) };
  }
  return out;
}

// ---------- moving and copying ----------

/** Panels that move with a set of profiles: named ones plus those whose four bounding profiles all move. */
function panelsMovingWith(design: DesignDocument, ids: Set<string>, profileIds: Set<string>): Set<string> {
  return new Set(
    design.panels
      .filter((p) => ids.has(p.id) || (p.boundedBy !== undefined && p.boundedBy.every((b) => profileIds.has(b))))
      .map((p) => p.id),
  );
}

function transformInPlace(design: DesignDocument, ids: string[], t: RigidTransform): DesignDocument {
  const set = new Set(ids);
  const profileIds = new Set(design.profiles.filter((p) => set.has(p.id)).map((p) => p.id));
  const panelIds = panelsMovingWith(design, set, profileIds);
  const moved: DesignDocument = {
    ...design,
    profiles: design.profiles.map((p) => (profileIds.has(p.id) ? transformProfile(p, t) : p)),
    panels: design.panels.map((p) => (panelIds.has(p.id) ? transformPanel(p, t) : p)),
  };
  return refreshJointPositions(moved, profileIds);
}

export function translateParts(design: DesignDocument, ids: string[], offset: Vec3): DesignDocument {
  return transformInPlace(design, ids, translation(offset));
}

/**
 * Copies the named profiles and panels through a transform, with new ids. Joints whose members
 * are all copied, panels bounded only by copied profiles and accessories on copied parts come along.
 */
export function copyParts(
  design: DesignDocument,
  ids: string[],
  t: RigidTransform,
  ids_?: IdAllocator,
): { design: DesignDocument; idMap: Map<string, string> } {
  const alloc = ids_ ?? createIdAllocator(design);
  const set = new Set(ids);
  const sourceProfiles = design.profiles.filter((p) => set.has(p.id));
  const profileIds = new Set(sourceProfiles.map((p) => p.id));
  const panelIds = panelsMovingWith(design, set, profileIds);
  const idMap = new Map<string, string>();
  for (const p of sourceProfiles) idMap.set(p.id, alloc.next('p'));
  const joints = design.joints.filter((j) => j.members.every((m) => profileIds.has(m.profileId)));
  for (const j of joints) idMap.set(j.id, alloc.next('j'));
  const panels = design.panels.filter((p) => panelIds.has(p.id));
  for (const p of panels) idMap.set(p.id, alloc.next('panel'));
  const accessories = design.accessories.filter(
    (a) => set.has(a.id) || (a.profileId !== undefined && profileIds.has(a.profileId)) || (a.panelId !== undefined && panelIds.has(a.panelId)),
  );
  for (const a of accessories) idMap.set(a.id, alloc.next(a.kind === 'end-cap' ? 'cap' : 'acc'));
  const mapId = (id: string) => idMap.get(id) ?? id;

  const newProfiles = sourceProfiles.map((p) => {
    const moved = transformProfile(p, t);
    return {
      ...moved,
      id: idMap.get(p.id)!,
      machining: moved.machining
        .filter((m) => m.jointId === undefined || idMap.has(m.jointId))
        .map((m) => ({ ...m, id: alloc.next('mc'), ...(m.jointId !== undefined ? { jointId: idMap.get(m.jointId)! } : {}) })),
    };
  });
  const newJoints = joints.map((j) => ({ ...j, id: idMap.get(j.id)!, members: j.members.map((m) => ({ ...m, profileId: mapId(m.profileId) })) }));
  const newPanels = panels.map((p) => {
    const moved = transformPanel(p, t);
    return {
      ...moved,
      id: idMap.get(p.id)!,
      ...(p.boundedBy ? { boundedBy: p.boundedBy.map(mapId) } : {}),
      cutouts: moved.cutouts.map((c) => ({ ...c, id: alloc.next('cut') })),
    };
  });
  const newAccessories = accessories.map((a) => ({
    ...a,
    id: idMap.get(a.id)!,
    ...(a.profileId !== undefined ? { profileId: mapId(a.profileId) } : {}),
    ...(a.panelId !== undefined ? { panelId: mapId(a.panelId) } : {}),
  }));
  const copied: DesignDocument = {
    ...design,
    profiles: [...design.profiles, ...newProfiles],
    joints: [...design.joints, ...newJoints],
    panels: [...design.panels, ...newPanels],
    accessories: [...design.accessories, ...newAccessories],
  };
  // A mirror or turn can flip a profile end for end, so re-measure the copied joints.
  return { design: refreshJointPositions(copied, newProfiles.map((p) => p.id)), idMap };
}

export function duplicateParts(design: DesignDocument, ids: string[], offset: Vec3 = [0, 0, 0]): DesignDocument {
  return copyParts(design, ids, translation(offset)).design;
}

/** Mirrors about the plane through `point` normal to `axis`: a mirrored copy, or the parts themselves. */
export function mirrorParts(design: DesignDocument, ids: string[], axis: Axis, point: Vec3, keepOriginal = true): DesignDocument {
  const t = mirror(axis, point);
  return keepOriginal ? copyParts(design, ids, t).design : transformInPlace(design, ids, t);
}

/** `count` instances in all (the originals are the first), each `spacing` mm from the previous. */
export function arrayParts(design: DesignDocument, ids: string[], count: number, spacing: Vec3): DesignDocument {
  if (!Number.isInteger(count) || count < 1) throw new OperationError('An array needs a whole number of copies, at least 1');
  if (count > 500) throw new OperationError('An array is limited to 500 copies');
  let out = design;
  const alloc = createIdAllocator(design);
  for (let i = 1; i < count; i++) {
    out = copyParts(out, ids, translation([spacing[0] * i, spacing[1] * i, spacing[2] * i]), alloc).design;
  }
  return out;
}

export function rotateParts90(design: DesignDocument, ids: string[], axis: Axis, point: Vec3, turns = 1): DesignDocument {
  return transformInPlace(design, ids, quarterTurns(axis, point, turns));
}

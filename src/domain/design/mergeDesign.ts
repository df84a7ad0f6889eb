/**
 * Inserting one design into another: every id of the inserted design renamed so nothing clashes,
 * and the whole piece moved by an offset (mm), by default beside the current frame along +X.
 */
import { createIdAllocator, type IdAllocator } from './ids';
import { partBounds } from './partBounds';
import type { DesignDocument, Vec3 } from './schema';

/** Gap left between the current frame and an inserted one, mm. */
export const INSERT_GAP_MM = 200;

/** Offset (mm) that puts `inserted` beside `current` along +X, INSERT_GAP_MM apart. */
export function besideOffset(current: DesignDocument, inserted: DesignDocument): Vec3 {
  const here = partBounds(current, 'all');
  const there = partBounds(inserted, 'all');
  if (!here || !there) return [0, 0, 0];
  return [Math.round(here.max[0] + INSERT_GAP_MM - there.min[0]), 0, 0];
}

const move = (point: Vec3, offset: Vec3): Vec3 => [point[0] + offset[0], point[1] + offset[1], point[2] + offset[2]];

/** The current design plus `inserted`'s parts, renamed and moved. Settings, name and units stay the current design's. */
export function mergeDesign(current: DesignDocument, inserted: DesignDocument, offset: Vec3): DesignDocument {
  const taken = createIdAllocator(current);
  // New names come from an allocator that knows both designs' ids, so a kept id is never handed out again.
  const ids: IdAllocator = createIdAllocator(unionOfParts(current, inserted));
  const renamed = new Map<string, string>();
  const rename = (id: string) => {
    let next = renamed.get(id);
    if (!next) {
      next = taken.has(id) ? ids.next(id.replace(/-\d+$/, '') || 'part') : id;
      renamed.set(id, next);
    }
    return next;
  };
  // Claim every id first, so references below resolve to the same new name.
  for (const list of [inserted.profiles, inserted.joints, inserted.panels, inserted.accessories, inserted.subAssemblies, inserted.steps, inserted.loadCases]) {
    for (const part of list) rename(part.id);
  }
  const map = (id: string) => renamed.get(id) ?? id;

  return {
    ...current,
    profiles: [
      ...current.profiles,
      ...inserted.profiles.map((profile) => ({
        ...profile,
        id: map(profile.id),
        start: move(profile.start, offset),
        machining: profile.machining.map((operation) => ({
          ...operation,
          id: rename(operation.id),
          ...(operation.jointId !== undefined ? { jointId: map(operation.jointId) } : {}),
        })),
      })),
    ],
    joints: [
      ...current.joints,
      ...inserted.joints.map((joint) => ({ ...joint, id: map(joint.id), members: joint.members.map((member) => ({ ...member, profileId: map(member.profileId) })) })),
    ],
    panels: [
      ...current.panels,
      ...inserted.panels.map((panel) => ({
        ...panel,
        id: map(panel.id),
        ...(panel.boundedBy ? { boundedBy: panel.boundedBy.map(map) } : {}),
        rect: { ...panel.rect, center: move(panel.rect.center, offset) },
        cutouts: panel.cutouts.map((cutout) => ({ ...cutout, id: rename(cutout.id) })),
      })),
    ],
    accessories: [
      ...current.accessories,
      ...inserted.accessories.map((accessory) => ({
        ...accessory,
        id: map(accessory.id),
        ...(accessory.profileId !== undefined ? { profileId: map(accessory.profileId) } : {}),
        ...(accessory.panelId !== undefined ? { panelId: map(accessory.panelId) } : {}),
      })),
    ],
    subAssemblies: [
      ...current.subAssemblies,
      ...inserted.subAssemblies.map((sub) => ({ ...sub, id: map(sub.id), profileIds: sub.profileIds.map(map), panelIds: sub.panelIds.map(map) })),
    ],
    steps: [
      ...current.steps,
      ...inserted.steps.map((step) => ({
        ...step,
        id: map(step.id),
        partIds: step.partIds.map(map),
        ...(step.subAssemblyId !== undefined ? { subAssemblyId: map(step.subAssemblyId) } : {}),
      })),
    ],
    loadCases: [
      ...current.loadCases,
      ...inserted.loadCases.map((loadCase) => ({
        ...loadCase,
        id: map(loadCase.id),
        loads: loadCase.loads.map((load) =>
          load.kind === 'point'
            ? { ...load, profileId: map(load.profileId) }
            : { ...load, ...(load.profileId !== undefined ? { profileId: map(load.profileId) } : {}), ...(load.panelId !== undefined ? { panelId: map(load.panelId) } : {}) },
        ),
      })),
    ],
  };
}

function unionOfParts(a: DesignDocument, b: DesignDocument): DesignDocument {
  return {
    ...a,
    profiles: [...a.profiles, ...b.profiles],
    joints: [...a.joints, ...b.joints],
    panels: [...a.panels, ...b.panels],
    accessories: [...a.accessories, ...b.accessories],
    subAssemblies: [...a.subAssemblies, ...b.subAssemblies],
    steps: [...a.steps, ...b.steps],
    loadCases: [...a.loadCases, ...b.loadCases],
  };
}

/**
 * Adds another design's parts to a design: every id that would clash is renamed, references
 * follow the new names, and every position moves by `offset` (mm). Frame starters and the
 * frame-group regeneration use it; the editor's "add beside" command wraps it.
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

export interface MergeResult {
  design: DesignDocument;
  /** Inserted id → the id it has in the merged design. */
  renamed: Map<string, string>;
}

/**
 * The current design plus `inserted`'s parts, renamed and moved by `offset` (mm). Settings, name
 * and units stay the current design's. `preferred` names the id an inserted part should get when
 * that id is free (regeneration keeps the ids people selected and referred to).
 */
export function mergeDesignParts(current: DesignDocument, inserted: DesignDocument, offset: Vec3, preferred?: ReadonlyMap<string, string>): MergeResult {
  const taken = createIdAllocator(current);
  // New names come from an allocator that knows both designs' ids, so a kept id is never handed out again.
  const ids: IdAllocator = createIdAllocator(unionOfParts(current, inserted));
  const claimed = new Set<string>();
  const renamed = new Map<string, string>();
  const rename = (id: string) => {
    let next = renamed.get(id);
    if (!next) {
      const wish = preferred?.get(id);
      if (wish !== undefined && !taken.has(wish) && !claimed.has(wish)) next = wish;
      else if (taken.has(id) || claimed.has(id)) {
        const prefix = id.replace(/-\d+$/, '') || 'part';
        do next = ids.next(prefix);
        while (claimed.has(next));
      } else next = id;
      claimed.add(next);
      renamed.set(id, next);
    }
    return next;
  };
  // Claim wished ids first, so a plain id of the inserted design cannot take one before its owner.
  const tops = [inserted.profiles, inserted.joints, inserted.panels, inserted.accessories, inserted.subAssemblies, inserted.steps, inserted.loadCases];
  for (const list of tops) for (const part of list) if (preferred?.has(part.id)) rename(part.id);
  for (const list of tops) for (const part of list) rename(part.id);
  const map = (id: string) => renamed.get(id) ?? id;

  const design: DesignDocument = {
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
  return { design, renamed };
}

/** `mergeDesignParts` without the rename map. */
export function mergeDesign(current: DesignDocument, inserted: DesignDocument, offset: Vec3): DesignDocument {
  return mergeDesignParts(current, inserted, offset).design;
}

/** Every top-level id of a design's parts, steps and load cases (what a frame group owns). */
export function topLevelIds(design: DesignDocument): string[] {
  return [design.profiles, design.joints, design.panels, design.accessories, design.subAssemblies, design.steps, design.loadCases].flatMap((list) => list.map((part) => part.id));
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

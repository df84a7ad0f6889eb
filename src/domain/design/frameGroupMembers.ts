/** Keeping frame groups' member lists in step with the parts that still exist. */
import { topLevelIds } from './mergeDesign';
import type { DesignDocument } from './schema';

/** Drops removed ids from the groups, and groups that lost every part. */
export function pruneFrameGroups(design: DesignDocument): DesignDocument {
  if (!design.frameGroups?.length) return design;
  const present = new Set(topLevelIds(design));
  const frameGroups = design.frameGroups
    .map((group) => (group.partIds.every((id) => present.has(id)) ? group : { ...group, partIds: group.partIds.filter((id) => present.has(id)) }))
    .filter((group) => group.partIds.length > 0);
  return { ...design, frameGroups };
}

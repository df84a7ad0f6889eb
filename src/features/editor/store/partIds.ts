import type { DesignDocument } from '@/domain/design/schema';

/** Ids that can be selected: profiles, joints, panels and accessories. */
export function selectablePartIds(design: DesignDocument): Set<string> {
  const ids = new Set<string>();
  for (const profile of design.profiles) ids.add(profile.id);
  for (const joint of design.joints) ids.add(joint.id);
  for (const panel of design.panels) ids.add(panel.id);
  for (const accessory of design.accessories) ids.add(accessory.id);
  return ids;
}

/** Keeps the selection to parts that still exist, returning the same array when nothing was dropped. */
export function pruneSelection(selection: string[], design: DesignDocument): string[] {
  if (selection.length === 0) return selection;
  const ids = selectablePartIds(design);
  const kept = selection.filter((id) => ids.has(id));
  return kept.length === selection.length ? selection : kept;
}

/** The corner notches of each panel in an analysis, worked out once per analysis (mm). */
import { NOTCHING_CONNECTOR_KINDS, cornerNotches, type CornerJoint, type CornerNotches } from '../geometry/cornerNotches';
import type { AnalysisContext, PanelInfo } from './context';

/** Corners of a captured panel where a connector sits in the slot, and the notch that clears it, mm. */
export function panelCornerNotches(ctx: AnalysisContext, info: PanelInfo): CornerNotches {
  // One memo entry holds every panel's result, by panel id (no key string per panel).
  let byPanel = ctx.memo.get('cornerNotches') as Map<string, CornerNotches> | undefined;
  if (!byPanel) ctx.memo.set('cornerNotches', (byPanel = new Map()));
  const cached = byPanel.get(info.panel.id);
  if (cached) return cached;
  const result = computePanelCornerNotches(ctx, info);
  byPanel.set(info.panel.id, result);
  return result;
}

function computePanelCornerNotches(ctx: AnalysisContext, info: PanelInfo): CornerNotches {
  // Only a captured panel in a four-sided frame has frame corners to notch.
  if (info.panel.mounting !== 'captured' || info.bounding.length !== 4) return { size: 0, corners: 0, jointIds: [] };
  const frame = new Set(info.bounding.map((b) => b.profile.id));
  const joints: CornerJoint[] = [];
  for (const b of info.bounding) {
    for (const joint of b.joints) {
      // Joints the rule would pass over anyway (not in a slot, or not between two frame profiles) are left out here.
      if (!NOTCHING_CONNECTOR_KINDS.has(joint.kind) || joint.members.length < 2) continue;
      if (!frame.has(joint.members[0].profileId) || !frame.has(joint.members[1].profileId)) continue;
      joints.push({
        id: joint.id,
        kind: joint.kind,
        memberIds: joint.members.map((m) => m.profileId),
        occupiedSlotLength: ctx.catalogue.connectors.get(joint.connectorId)?.occupiedSlotLength,
      });
    }
  }
  return cornerNotches(frame, joints);
}

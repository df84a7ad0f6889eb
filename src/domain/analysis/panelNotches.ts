/** The corner notches of each panel in an analysis, worked out once per analysis (mm). */
import { cornerNotches, type CornerJoint, type CornerNotches } from '../geometry/cornerNotches';
import type { AnalysisContext, PanelInfo } from './context';

/** Corners of a captured panel where a connector sits in the slot, and the notch that clears it, mm. */
export function panelCornerNotches(ctx: AnalysisContext, info: PanelInfo): CornerNotches {
  const key = `cornerNotches|${info.panel.id}`;
  const cached = ctx.memo.get(key) as CornerNotches | undefined;
  if (cached) return cached;
  const result = computePanelCornerNotches(ctx, info);
  ctx.memo.set(key, result);
  return result;
}

function computePanelCornerNotches(ctx: AnalysisContext, info: PanelInfo): CornerNotches {
  // Only a captured panel in a four-sided frame has frame corners to notch.
  if (info.panel.mounting !== 'captured' || info.bounding.length !== 4) return { size: 0, corners: 0, jointIds: [] };
  const frame = new Set(info.bounding.map((b) => b.profile.id));
  const joints: CornerJoint[] = [];
  for (const b of info.bounding) {
    for (const joint of b.joints) {
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

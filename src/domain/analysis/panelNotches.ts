/** The corner notches of each panel in an analysis, worked out once per analysis (mm). */
import { NOTCHING_CONNECTOR_KINDS, cornerNotchTally, cornerNotchesOf, tallyCornerJoint, type CornerNotches } from '../geometry/cornerNotches';
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
  // The rule joint by joint, from the context's joint indices: members are compared by profile
  // index (resolved once), with no id set or joint record per panel.
  const [a, b, c, d] = info.bounding;
  const inFrame = (i: number) => i >= 0 && (i === a.index || i === b.index || i === c.index || i === d.index);
  const joints = ctx.design.joints;
  const tally = cornerNotchTally();
  for (const bound of info.bounding) {
    for (let k = ctx.profileJointStart[bound.index]; k < ctx.profileJointStart[bound.index + 1]; k++) {
      const j = ctx.profileJointIndex[k];
      const joint = joints[j];
      if (!NOTCHING_CONNECTOR_KINDS.has(joint.kind) || joint.members.length < 2) continue;
      const first = ctx.jointMemberStart[j];
      if (!inFrame(ctx.jointMemberProfile[first]) || !inFrame(ctx.jointMemberProfile[first + 1])) continue;
      tallyCornerJoint(tally, joint.id, ctx.catalogue.connectors.get(joint.connectorId)?.occupiedSlotLength);
    }
  }
  return cornerNotchesOf(tally);
}

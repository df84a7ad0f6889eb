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

/**
 * Per joint (`design.joints[j]`), what the notch rule needs, worked out once per analysis in one
 * pass over the joints: 0 when its kind does not sit in the slot or it has fewer than two members,
 * 1 when it does but its connector is unknown, 2 when `slotLength[j]` holds the connector's
 * occupied slot length (mm).
 */
interface NotchingJoints {
  state: Uint8Array;
  slotLength: Float64Array;
}

function notchingJoints(ctx: AnalysisContext): NotchingJoints {
  let found = ctx.memo.get('notchingJoints') as NotchingJoints | undefined;
  if (found) return found;
  const joints = ctx.design.joints;
  found = { state: new Uint8Array(joints.length), slotLength: new Float64Array(joints.length) };
  for (let j = 0; j < joints.length; j++) {
    const joint = joints[j];
    if (!NOTCHING_CONNECTOR_KINDS.has(joint.kind) || joint.members.length < 2) continue;
    const length = ctx.catalogue.connectors.get(joint.connectorId)?.occupiedSlotLength;
    if (length === undefined) found.state[j] = 1;
    else {
      found.state[j] = 2;
      found.slotLength[j] = length;
    }
  }
  ctx.memo.set('notchingJoints', found);
  return found;
}

function computePanelCornerNotches(ctx: AnalysisContext, info: PanelInfo): CornerNotches {
  // Only a captured panel in a four-sided frame has frame corners to notch.
  if (info.panel.mounting !== 'captured' || info.bounding.length !== 4) return { size: 0, corners: 0, jointIds: [] };
  // The rule joint by joint, from the context's joint indices: members are compared by profile
  // index (resolved once), with no id set or joint record per panel.
  const [a, b, c, d] = info.bounding;
  const inFrame = (i: number) => i >= 0 && (i === a.index || i === b.index || i === c.index || i === d.index);
  const notching = notchingJoints(ctx);
  const tally = cornerNotchTally();
  // A joint between two frame profiles is listed by both: the second listing is passed over by
  // index (the rule would pass over it by id).
  const seen: number[] = [];
  for (const bound of info.bounding) {
    for (let k = ctx.profileJointStart[bound.index]; k < ctx.profileJointStart[bound.index + 1]; k++) {
      const j = ctx.profileJointIndex[k];
      const state = notching.state[j];
      if (state === 0) continue;
      const first = ctx.jointMemberStart[j];
      if (!inFrame(ctx.jointMemberProfile[first]) || !inFrame(ctx.jointMemberProfile[first + 1]) || seen.includes(j)) continue;
      seen.push(j);
      tallyCornerJoint(tally, ctx.design.joints[j].id, state === 2 ? notching.slotLength[j] : undefined);
    }
  }
  return cornerNotchesOf(tally);
}

/** The corner notches of each panel in an analysis, worked out once per analysis (mm). */
import { NOTCHING_CONNECTOR_KINDS, cornerNotchTally, cornerNotchesOf, tallyCornerJoint, type CornerNotchTally, type CornerNotches } from '../geometry/cornerNotches';
import type { AnalysisContext, PanelInfo } from './context';

/** Corners of a captured panel where a connector sits in the slot, and the notch that clears it, mm. */
export function panelCornerNotches(ctx: AnalysisContext, info: PanelInfo): CornerNotches {
  // One memo entry holds every panel's result, by panel index (`ctx.panels[i]`): a list made at
  // its full length once, not a map by id that grows and rehashes as panels are added.
  let byPanel = ctx.memo.get('cornerNotches') as (CornerNotches | undefined)[] | undefined;
  if (!byPanel) ctx.memo.set('cornerNotches', (byPanel = new Array<CornerNotches | undefined>(ctx.panels.length).fill(undefined)));
  // A panel record from elsewhere (not this context's) is worked out without the memo.
  if (ctx.panels[info.index] !== info) return computePanelCornerNotches(ctx, info);
  const cached = byPanel[info.index];
  if (cached) return cached;
  const result = computePanelCornerNotches(ctx, info);
  byPanel[info.index] = result;
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
  /** A tally reused panel after panel; each result gets its own list of exactly its joint ids. */
  scratch: CornerNotchTally;
}

function notchingJoints(ctx: AnalysisContext): NotchingJoints {
  let found = ctx.memo.get('notchingJoints') as NotchingJoints | undefined;
  if (found) return found;
  const joints = ctx.design.joints;
  found = { state: new Uint8Array(joints.length), slotLength: new Float64Array(joints.length), scratch: cornerNotchTally() };
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
  const bounding = info.bounding;
  if (info.panel.mounting !== 'captured' || bounding.length !== 4) return { size: 0, corners: 0, jointIds: [] };
  // The rule joint by joint, from the context's joint indices: members are compared by profile
  // index (resolved once), with no id set, joint record, closure or list per panel.
  const a = bounding[0].index;
  const b = bounding[1].index;
  const c = bounding[2].index;
  const d = bounding[3].index;
  const notching = notchingJoints(ctx);
  const tally = notching.scratch;
  tally.size = 0;
  // Emptied by pop(): setting `length` takes a slow path in the engine.
  while (tally.jointIds.length > 0) tally.jointIds.pop();
  for (let t = 0; t < 4; t++) {
    const bound = bounding[t].index;
    for (let k = ctx.profileJointStart[bound]; k < ctx.profileJointStart[bound + 1]; k++) {
      const j = ctx.profileJointIndex[k];
      const state = notching.state[j];
      if (state === 0) continue;
      const first = ctx.jointMemberStart[j];
      if (!inFrame(ctx.jointMemberProfile[first], a, b, c, d) || !inFrame(ctx.jointMemberProfile[first + 1], a, b, c, d)) continue;
      // A joint between two frame profiles is listed by both: the second listing is passed over
      // (the rule would pass over it by id). It was listed before when one of its members is on
      // an earlier frame profile (profile joint lists hold every joint with a member there).
      if (t > 0 && hasMemberOnBefore(ctx, j, bounding, t)) continue;
      tallyCornerJoint(tally, ctx.design.joints[j].id, state === 2 ? notching.slotLength[j] : undefined);
    }
  }
  // The list grown by push has room to spare (more than the few ids of a frame): the result keeps
  // a copy of exactly its length.
  const ids = tally.jointIds;
  const jointIds = new Array<string>(ids.length);
  for (let k = 0; k < ids.length; k++) jointIds[k] = ids[k];
  return cornerNotchesOf({ size: tally.size, jointIds });
}

/** Whether profile index `i` is one of the frame's four (−1, a profile not in the design, is not). */
function inFrame(i: number, a: number, b: number, c: number, d: number): boolean {
  return i >= 0 && (i === a || i === b || i === c || i === d);
}

/** Whether joint `j` has a member on one of the frame profiles `bounding[0]` up to `bounding[t − 1]`. */
function hasMemberOnBefore(ctx: AnalysisContext, j: number, bounding: readonly { index: number }[], t: number): boolean {
  const to = ctx.jointMemberStart[j + 1];
  for (let m = ctx.jointMemberStart[j]; m < to; m++) {
    const p = ctx.jointMemberProfile[m];
    for (let e = 0; e < t; e++) if (bounding[e].index === p) return true;
  }
  return false;
}

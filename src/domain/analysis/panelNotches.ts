/** The corner notches of each panel in an analysis, worked out once per analysis (mm). */
import { NOTCHING_CONNECTOR_KINDS, cornerNotchTally, cornerNotchesOf, tallyCornerJoint, type CornerNotchTally, type CornerNotches } from '../geometry/cornerNotches';
import type { Joint } from '../design/schema';
import type { AnalysisContext, PanelInfo } from './context';

/** Corners of a captured panel where a connector sits in the slot, and the notch that clears it, mm. */
export function panelCornerNotches(ctx: AnalysisContext, info: PanelInfo): CornerNotches {
  // A panel record from elsewhere (not this context's) is worked out on its own.
  if (ctx.panels[info.index] !== info) return computePanelCornerNotches(notchTables(ctx), info);
  return allPanelCornerNotches(ctx)[info.index];
}

/**
 * Every panel's corner notches, by panel index (`ctx.panels[i]`), worked out together on first
 * use and kept in one memo entry: the context's tables are read once for all panels, and the
 * results sit in a list made at its full length, not a map by id that grows and rehashes.
 */
export function allPanelCornerNotches(ctx: AnalysisContext): readonly CornerNotches[] {
  let all = ctx.memo.get('cornerNotches') as CornerNotches[] | undefined;
  if (all) return all;
  const panels = ctx.panels;
  const tables = notchTables(ctx);
  all = new Array<CornerNotches>(panels.length);
  for (let i = 0; i < panels.length; i++) all[i] = computePanelCornerNotches(tables, panels[i]);
  ctx.memo.set('cornerNotches', all);
  return all;
}

/**
 * What the notch rule reads, from the context once per analysis. Per joint (`design.joints[j]`):
 * `state` 0 when its kind does not sit in the slot or it has fewer than two members, 1 when it does
 * but its connector is unknown, 2 when `slotLength[j]` holds the connector's occupied slot length
 * (mm). The context's joint tables (see `AnalysisContext`) are copied into fixed slots.
 */
interface NotchTables {
  joints: readonly Joint[];
  state: Uint8Array;
  slotLength: Float64Array;
  profileJointStart: Int32Array;
  profileJointIndex: Int32Array;
  jointMemberStart: Int32Array;
  jointMemberProfile: Int32Array;
  /** A tally reused panel after panel; each result gets its own list of exactly its joint ids. */
  scratch: CornerNotchTally;
}

function notchTables(ctx: AnalysisContext): NotchTables {
  let found = ctx.memo.get('notchingJoints') as NotchTables | undefined;
  if (found) return found;
  const joints = ctx.design.joints;
  const connectors = ctx.catalogue.connectors;
  found = {
    joints,
    state: new Uint8Array(joints.length),
    slotLength: new Float64Array(joints.length),
    profileJointStart: ctx.profileJointStart,
    profileJointIndex: ctx.profileJointIndex,
    jointMemberStart: ctx.jointMemberStart,
    jointMemberProfile: ctx.jointMemberProfile,
    scratch: cornerNotchTally(),
  };
  // Joints come in runs with one connector: the last one looked up is kept.
  let lastId: string | undefined;
  let lastLength: number | undefined;
  for (let j = 0; j < joints.length; j++) {
    const joint = joints[j];
    if (!NOTCHING_CONNECTOR_KINDS.has(joint.kind) || joint.members.length < 2) continue;
    if (joint.connectorId !== lastId) {
      lastId = joint.connectorId;
      lastLength = connectors.get(joint.connectorId)?.occupiedSlotLength;
    }
    if (lastLength === undefined) found.state[j] = 1;
    else {
      found.state[j] = 2;
      found.slotLength[j] = lastLength;
    }
  }
  ctx.memo.set('notchingJoints', found);
  return found;
}

function computePanelCornerNotches(t: NotchTables, info: PanelInfo): CornerNotches {
  // Only a captured panel in a four-sided frame has frame corners to notch.
  const bounding = info.bounding;
  if (info.panel.mounting !== 'captured' || bounding.length !== 4) return { size: 0, corners: 0, jointIds: [] };
  // The rule joint by joint, from the context's joint indices: members are compared by profile
  // index (resolved once), with no id set, joint record, closure or list per panel.
  const a = bounding[0].index;
  const b = bounding[1].index;
  const c = bounding[2].index;
  const d = bounding[3].index;
  const { state, profileJointStart, profileJointIndex, jointMemberStart, jointMemberProfile } = t;
  const tally = t.scratch;
  tally.size = 0;
  // Emptied by pop(): setting `length` takes a slow path in the engine.
  while (tally.jointIds.length > 0) tally.jointIds.pop();
  for (let f = 0; f < 4; f++) {
    const bound = bounding[f].index;
    const to = profileJointStart[bound + 1];
    for (let k = profileJointStart[bound]; k < to; k++) {
      const j = profileJointIndex[k];
      const s = state[j];
      if (s === 0) continue;
      const first = jointMemberStart[j];
      if (!inFrame(jointMemberProfile[first], a, b, c, d) || !inFrame(jointMemberProfile[first + 1], a, b, c, d)) continue;
      // A joint between two frame profiles is listed by both: the second listing is passed over
      // (the rule would pass over it by id). It was listed before when one of its members is on
      // an earlier frame profile (profile joint lists hold every joint with a member there).
      if (f > 0 && hasMemberOnBefore(jointMemberStart, jointMemberProfile, j, bounding, f)) continue;
      tallyCornerJoint(tally, t.joints[j].id, s === 2 ? t.slotLength[j] : undefined);
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

/** Whether joint `j` has a member on one of the frame profiles `bounding[0]` up to `bounding[f − 1]`. */
function hasMemberOnBefore(memberStart: Int32Array, memberProfile: Int32Array, j: number, bounding: readonly { index: number }[], f: number): boolean {
  const to = memberStart[j + 1];
  for (let m = memberStart[j]; m < to; m++) {
    const p = memberProfile[m];
    for (let e = 0; e < f; e++) if (bounding[e].index === p) return true;
  }
  return false;
}

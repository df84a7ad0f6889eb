/**
 * Which joints and end accessories hold each profile, as typed index tables built once per
 * analysis (see `ProfileJointTables`), and where a joint member sits on its profile.
 */
import type { Accessory, Joint, JointMember, ProfileEnd } from '../design/schema';
import { pointAlongProfile } from '../geometry/profileGeometry';
import type { Vec3 } from '../geometry/vectors';
import type { ProfileInfo } from './context';

/** Shared empty list: most ends have no accessories, so do not allocate one per end. */
export const NONE: never[] = [];

/**
 * Each profile's joints as joint indices (into `joints`), in joint order, with any member on the
 * profile, a member at its start and a member at its end: profile i's are entries `xStart[i]` up to
 * `xStart[i + 1]` of `xIndex`. Shared by every `ProfileRecord` of one context.
 */
export interface ProfileJointTables {
  joints: readonly Joint[];
  anyStart: Int32Array;
  anyIndex: Int32Array;
  startStart: Int32Array;
  startIndex: Int32Array;
  endStart: Int32Array;
  endIndex: Int32Array;
}

/** Joints `start[i]` up to `start[i + 1]` of a joint table as a new list (the shared empty one when there are none). */
export function jointList(joints: readonly Joint[], start: Int32Array, index: Int32Array, i: number): Joint[] {
  const from = start[i];
  const to = start[i + 1];
  if (from === to) return NONE;
  const list = new Array<Joint>(to - from);
  for (let k = from; k < to; k++) list[k - from] = joints[index[k]];
  return list;
}

/**
 * Fills the profiles' joint tables (any member, start, end; see `ProfileJointTables`) in joint
 * order. Two passes: the first resolves each member's profile once and counts, the second fills
 * typed arrays of exactly that length (no list per profile). Returns the resolved members (see
 * `AnalysisContext.jointMemberProfile`).
 */
export function attachJoints(
  joints: readonly Joint[],
  n: number,
  profileById: Map<string, ProfileInfo>,
  tables: ProfileJointTables,
): { start: Int32Array; profile: Int32Array; profileJointStart: Int32Array; profileJointIndex: Int32Array } {
  const anyCount = new Int32Array(n);
  const startCount = new Int32Array(n);
  const endCount = new Int32Array(n);
  const lastJoint = new Int32Array(n).fill(-1);
  // Per member in order: its profile's index, or -1; its end: 0 none, 1 start, 2 end.
  const memberStart = new Int32Array(joints.length + 1);
  let members = 0;
  for (let j = 0; j < joints.length; j++) {
    memberStart[j] = members;
    members += joints[j].members.length;
  }
  memberStart[joints.length] = members;
  const memberProfile = new Int32Array(members);
  const memberEndCode = new Uint8Array(members);
  let m = 0;
  for (let j = 0; j < joints.length; j++) {
    const list = joints[j].members;
    for (let k = 0; k < list.length; k++, m++) {
      const info = profileById.get(list[k].profileId);
      if (!info) {
        memberProfile[m] = -1;
        continue;
      }
      const i = info.index;
      memberProfile[m] = i;
      const end = memberEnd(list[k], info);
      if (end === 'start') {
        memberEndCode[m] = 1;
        startCount[i]++;
      } else if (end === 'end') {
        memberEndCode[m] = 2;
        endCount[i]++;
      }
      if (lastJoint[i] !== j) {
        lastJoint[i] = j;
        anyCount[i]++;
      }
    }
  }
  const anyStart = new Int32Array(n + 1);
  const startStart = new Int32Array(n + 1);
  const endStart = new Int32Array(n + 1);
  for (let i = 0; i < n; i++) {
    anyStart[i + 1] = anyStart[i] + anyCount[i];
    startStart[i + 1] = startStart[i] + startCount[i];
    endStart[i + 1] = endStart[i] + endCount[i];
  }
  const anyIndex = new Int32Array(anyStart[n]);
  const startIndex = new Int32Array(startStart[n]);
  const endIndex = new Int32Array(endStart[n]);
  // Reuse the counters as fill positions.
  anyCount.fill(0);
  startCount.fill(0);
  endCount.fill(0);
  lastJoint.fill(-1);
  m = 0;
  for (let j = 0; j < joints.length; j++) {
    const count = joints[j].members.length;
    for (let k = 0; k < count; k++, m++) {
      const i = memberProfile[m];
      if (i < 0) continue;
      if (memberEndCode[m] === 1) startIndex[startStart[i] + startCount[i]++] = j;
      else if (memberEndCode[m] === 2) endIndex[endStart[i] + endCount[i]++] = j;
      if (lastJoint[i] !== j) {
        lastJoint[i] = j;
        anyIndex[anyStart[i] + anyCount[i]++] = j;
      }
    }
  }
  tables.anyStart = anyStart;
  tables.anyIndex = anyIndex;
  tables.startStart = startStart;
  tables.startIndex = startIndex;
  tables.endStart = endStart;
  tables.endIndex = endIndex;
  return { start: memberStart, profile: memberProfile, profileJointStart: anyStart, profileJointIndex: anyIndex };
}

/**
 * Fills each profile's end accessory lists in document order, at their exact length (as
 * `attachJoints`). Returns each accessory's profile index (see `AnalysisContext.accessoryProfile`).
 */
export function attachAccessories(accessories: readonly Accessory[], profiles: ProfileInfo[], profileById: Map<string, ProfileInfo>): Int32Array {
  const n = profiles.length;
  const startCount = new Int32Array(n);
  const endCount = new Int32Array(n);
  const accessoryProfile = new Int32Array(accessories.length).fill(-1);
  // Per accessory: its profile's index and end (0 start, 1 end), or -1.
  const target = new Int32Array(accessories.length).fill(-1);
  for (let a = 0; a < accessories.length; a++) {
    const acc = accessories[a];
    if (!acc.profileId) continue;
    const info = profileById.get(acc.profileId);
    if (!info) continue;
    accessoryProfile[a] = info.index;
    if (!acc.end) continue;
    const atStart = acc.end === 'start';
    target[a] = info.index * 2 + (atStart ? 0 : 1);
    if (atStart) startCount[info.index]++;
    else endCount[info.index]++;
  }
  for (let i = 0; i < n; i++) {
    if (startCount[i] > 0) profiles[i].startAccessories = new Array<Accessory>(startCount[i]);
    if (endCount[i] > 0) profiles[i].endAccessories = new Array<Accessory>(endCount[i]);
  }
  startCount.fill(0);
  endCount.fill(0);
  for (let a = 0; a < accessories.length; a++) {
    const t = target[a];
    if (t < 0) continue;
    const i = t >> 1;
    if ((t & 1) === 0) profiles[i].startAccessories[startCount[i]++] = accessories[a];
    else profiles[i].endAccessories[endCount[i]++] = accessories[a];
  }
  return accessoryProfile;
}

/** Tolerance (mm) for a "span" member that is really at a profile end. */
const END_MATCH_MM = 1;

/** The profile end a member sits at, counting a span position within 1 mm of an end. */
export function memberEnd(member: JointMember, info: ProfileInfo | undefined): ProfileEnd | null {
  if (member.at !== 'span') return member.at;
  if (!info) return null;
  const along = member.along ?? 0;
  if (along <= END_MATCH_MM) return 'start';
  if (along >= info.profile.length - END_MATCH_MM) return 'end';
  return null;
}

/** World position of a joint member: the profile end, or the point `along` from its start. */
export function memberPoint(info: ProfileInfo, member: JointMember): Vec3 {
  if (member.at === 'start') return info.startPoint;
  if (member.at === 'end') return info.endPoint;
  return pointAlongProfile(info.profile, member.along ?? 0);
}

/** Distance from the profile's start to a joint member, mm. */
export function memberAlong(info: ProfileInfo, member: JointMember): number {
  if (member.at === 'start') return 0;
  if (member.at === 'end') return info.profile.length;
  return member.along ?? 0;
}

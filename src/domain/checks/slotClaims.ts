/**
 * Slot claims: no two connectors need the same stretch of one slot face. Each bracket, gusset or
 * concealed connector claims the slot of the profile it meets around the joined profile's end
 * (its footprint plus the connector's occupied slot length; a concealed connector only its own
 * body), on the face the joined profile leaves from. Part of the joint check (`jointFindings`).
 */
import type { Finding } from '../analysis/types';
import type { Connector } from '../catalogue/types';
import type { SectionAxes } from '../geometry/profileGeometry';
import { dot, type ReadonlyVec3 } from '../geometry/vectors';
import { memberEnd, memberInfo, memberPoint, type AnalysisContext } from '../analysis/context';
import { capitalise, findingId, jointName, mm, profileName } from '../analysis/describe';

const CHECK = 'joints';
/** Orientation pairs the check keeps answers for (a frame has a few). */
const PAIRS_KEPT = 8;
const SLOT_CONNECTOR_KINDS = new Set(['corner-bracket', 'gusset-plate', 'concealed-connector']);

/**
 * Slot claims of one analysis, in parallel typed arrays (claim k = the k-th slot connector met):
 * no object, list or map entry per joint. Claims on one slot face (met profile index × 4 + face)
 * are chained from the face's first claim in the order they were made.
 */
interface SlotClaims {
  joint: Int32Array;
  lo: Float64Array;
  hi: Float64Array;
  /** 1 for the connector's own body (concealed connectors) rather than a bracket's possible legs. */
  exact: Uint8Array;
  /** Next claim on the same slot face, or −1. */
  next: Int32Array;
  count: number;
}

/**
 * Appends a finding for each pair of slot connectors that claim overlapping stretches of one slot
 * face (an error when both are concealed connectors, whose bodies sit in the slot; otherwise a
 * warning, as a bracket's legs may miss each other).
 */
export function slotClaimFindings(ctx: AnalysisContext, out: Finding[]): void {
  const joints = ctx.design.joints;
  const profiles = ctx.profiles;
  const connectors = ctx.catalogue.connectors;
  const claims: SlotClaims = {
    joint: new Int32Array(joints.length),
    lo: new Float64Array(joints.length),
    hi: new Float64Array(joints.length),
    exact: new Uint8Array(joints.length),
    next: new Int32Array(joints.length),
    count: 0,
  };
  // Per slot face: its first and last claim (−1: none), and the faces in the order first claimed.
  const faceCount = profiles.length * 4;
  const firstClaim = new Int32Array(faceCount).fill(-1);
  const lastClaim = new Int32Array(faceCount);
  // At most one face per claim: a typed list of that length rather than a list grown by push.
  const facesInOrder = new Int32Array(joints.length);
  let faceTotal = 0;
  // Joints come in runs with one connector: the last one looked up is kept.
  let lastConnectorId: string | undefined;
  let lastConnector: Connector | undefined;
  // What depends only on the orientations of the met and the joined profile, per pair of them:
  // profiles of one analysis context with exactly the same direction and roll share one
  // SectionAxes object (the context's orientation cache compares the numbers exactly), so a pair of
  // those objects keys the answer, and the profiles' own directions (scattered in memory) need not
  // be read per joint. Per pair: the dot products of the met profile's u and v with the joined
  // direction, the absolute dot products of the joined profile's u and v with the met direction,
  // and the met direction itself. A frame has a few such pairs; past PAIRS_KEPT they are worked
  // out per joint.
  const pairMet: SectionAxes[] = [];
  const pairJoined: SectionAxes[] = [];
  const pairDots = new Float64Array(4 * PAIRS_KEPT);
  const pairMetDirection: ReadonlyVec3[] = [];
  for (let j = 0; j < joints.length; j++) {
    const joint = joints[j];
    if (!SLOT_CONNECTOR_KINDS.has(joint.kind) || joint.members.length !== 2) continue;
    if (joint.connectorId !== lastConnectorId) {
      lastConnectorId = joint.connectorId;
      lastConnector = connectors.get(joint.connectorId);
    }
    const connector = lastConnector;
    const joined = memberInfo(ctx, j, 0);
    const met = memberInfo(ctx, j, 1);
    if (!connector || !joined || !met) continue;
    const end = memberEnd(joint.members[0], joined);
    if (!end) continue;
    // The joined profile leaves the met profile along its own axis, away from the joined end. The
    // face it meets is the one facing that way (as `faceFacing`, without a vector per joint:
    // negating the direction negates each dot product exactly).
    let pair = 0;
    while (pair < pairMet.length && (pairMet[pair] !== met.axes || pairJoined[pair] !== joined.axes)) pair++;
    let metU: number;
    let metV: number;
    let joinedU: number;
    let joinedV: number;
    let metDirection: ReadonlyVec3;
    if (pair < pairMet.length) {
      metU = pairDots[4 * pair];
      metV = pairDots[4 * pair + 1];
      joinedU = pairDots[4 * pair + 2];
      joinedV = pairDots[4 * pair + 3];
      metDirection = pairMetDirection[pair];
    } else {
      const d = joined.profile.direction;
      metDirection = met.profile.direction;
      metU = dot(met.axes.u, d);
      metV = dot(met.axes.v, d);
      joinedU = Math.abs(dot(joined.axes.u, metDirection));
      joinedV = Math.abs(dot(joined.axes.v, metDirection));
      if (pair < PAIRS_KEPT) {
        pairMet.push(met.axes);
        pairJoined.push(joined.axes);
        pairMetDirection.push(metDirection);
        pairDots[4 * pair] = metU;
        pairDots[4 * pair + 1] = metV;
        pairDots[4 * pair + 2] = joinedU;
        pairDots[4 * pair + 3] = joinedV;
      }
    }
    const sign = end === 'start' ? 1 : -1;
    const cu = sign * metU;
    const cv = sign * metV;
    const face = Math.abs(cu) >= Math.abs(cv) ? (cu >= 0 ? 0 : 2) : cv >= 0 ? 1 : 3;
    const cosine = face === 0 ? cu : face === 2 ? -cu : face === 1 ? cv : -cv;
    if (cosine < 0.7) continue;
    // As `projectAlong` and `sectionHalfExtentAlong`, with the pair's numbers.
    const p = memberPoint(joined, joint.members[0]);
    const s0 = met.startPoint;
    const along = (p[0] - s0[0]) * metDirection[0] + (p[1] - s0[1]) * metDirection[1] + (p[2] - s0[2]) * metDirection[2];
    const centre = Math.min(Math.max(along, 0), met.profile.length);
    const exact = joint.kind === 'concealed-connector';
    const footprint = (joinedU * joined.width) / 2 + (joinedV * joined.height) / 2;
    const half = exact ? connector.occupiedSlotLength / 2 : footprint + connector.occupiedSlotLength;
    const key = met.index * 4 + face;
    const k = claims.count++;
    claims.joint[k] = j;
    claims.lo[k] = Math.max(0, centre - half);
    claims.hi[k] = Math.min(met.profile.length, centre + half);
    claims.exact[k] = exact ? 1 : 0;
    claims.next[k] = -1;
    if (firstClaim[key] < 0) {
      firstClaim[key] = k;
      facesInOrder[faceTotal++] = key;
    } else claims.next[lastClaim[key]] = k;
    lastClaim[key] = k;
  }
  const list: number[] = [];
  for (let f = 0; f < faceTotal; f++) {
    const key = facesInOrder[f];
    if (claims.next[firstClaim[key]] < 0) continue;
    while (list.length > 0) list.pop();
    for (let k = firstClaim[key]; k >= 0; k = claims.next[k]) list.push(k);
    sortByLo(list, claims.lo);
    let reach = list[0];
    for (let i = 1; i < list.length; i++) {
      const c = list[i];
      if (claims.lo[c] < claims.hi[reach] - 0.5) {
        // Ids and names only for a face whose claims overlap (most faces have none).
        const metId = profiles[key >> 2].profile.id;
        const faceText = String(key & 3);
        const reachJoint = joints[claims.joint[reach]];
        const cJoint = joints[claims.joint[c]];
        const both = [reachJoint.id, cJoint.id].sort();
        const bothJoints = reachJoint.id < cJoint.id ? [reachJoint, cJoint] : [cJoint, reachJoint];
        out.push({
          id: findingId(CHECK, 'slot-claimed-twice', [metId, faceText, ...both]),
          check: CHECK,
          severity: claims.exact[reach] === 1 && claims.exact[c] === 1 ? 'error' : 'warning',
          partIds: [metId, ...both],
          message: `${capitalise(jointName(ctx, bothJoints[0]))} and ${jointName(ctx, bothJoints[1])} both need the slot on face ${faceText} of ${profileName(ctx.profileById.get(metId))} between ${mm(Math.max(claims.lo[c], claims.lo[reach]))} and ${mm(Math.min(claims.hi[c], claims.hi[reach]))} from its start. Move one joint or put its connector on another face.`,
        });
      }
      if (claims.hi[c] > claims.hi[reach]) reach = c;
    }
  }
}

/**
 * Sorts claim indices by their `lo`, keeping the order of equal ones (as the stable
 * `Array.prototype.sort` would). Lists are a handful of claims per slot face; insertion sort makes
 * no work copy per list.
 */
function sortByLo(list: number[], lo: Float64Array): void {
  for (let i = 1; i < list.length; i++) {
    const claim = list[i];
    let j = i - 1;
    while (j >= 0 && lo[list[j]] - lo[claim] > 0) {
      list[j + 1] = list[j];
      j--;
    }
    list[j + 1] = claim;
  }
}

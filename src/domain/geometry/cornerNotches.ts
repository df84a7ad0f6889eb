/**
 * Corner notches of a captured panel: where a connector sits in the slot at a corner of the
 * panel's frame, the sheet needs a square notch that clears the connector. Lengths in mm.
 */

/** Connector kinds that sit in a slot at a frame corner, where a captured panel needs a notch. */
export const NOTCHING_CONNECTOR_KINDS: ReadonlySet<string> = new Set(['corner-bracket', 'concealed-connector']);

/** A joint on one of the frame's profiles, as the notch rule needs it. */
export interface CornerJoint {
  id: string;
  /** The joint's kind (`corner-bracket`, `concealed-connector`, …). */
  kind: string;
  /** Profile ids of the joint's members, in member order. */
  memberIds: readonly string[];
  /** Slot length the connector occupies from the corner, mm; undefined when the connector is unknown. */
  occupiedSlotLength: number | undefined;
}

/** The notch a panel needs: its square size (mm), how many corners (at most 4), and the joints that call for it. */
export interface CornerNotches {
  size: number;
  corners: number;
  jointIds: string[];
}

/**
 * Corner notches of a panel captured in the frame `frameProfileIds`, from the joints on those
 * profiles (a joint may be listed more than once). A joint counts when its kind sits in the slot,
 * its first two members are both frame profiles and its connector occupies slot length; the notch
 * is the longest such length (mm, to 0.1 mm).
 */
export function cornerNotches(frameProfileIds: ReadonlySet<string>, joints: Iterable<CornerJoint>): CornerNotches {
  const tally = cornerNotchTally();
  for (const joint of joints) {
    if (!NOTCHING_CONNECTOR_KINDS.has(joint.kind) || joint.memberIds.length < 2) continue;
    if (!frameProfileIds.has(joint.memberIds[0]) || !frameProfileIds.has(joint.memberIds[1])) continue;
    tallyCornerJoint(tally, joint.id, joint.occupiedSlotLength);
  }
  return cornerNotchesOf(tally);
}

/** The rule's running state while joints are walked: notch size so far (mm) and the joints counted. */
export interface CornerNotchTally {
  size: number;
  jointIds: string[];
}

export function cornerNotchTally(): CornerNotchTally {
  return { size: 0, jointIds: [] };
}

/**
 * Counts one joint whose kind sits in the slot and whose first two members are frame profiles
 * (the caller has checked both): once per joint id, and only when its connector occupies slot
 * length (mm). For callers that walk the design's joints without a `CornerJoint` per joint.
 */
export function tallyCornerJoint(tally: CornerNotchTally, jointId: string, occupiedSlotLength: number | undefined): void {
  if (occupiedSlotLength === undefined || occupiedSlotLength <= 0 || isCounted(tally.jointIds, jointId)) return;
  tally.jointIds.push(jointId);
  // The notch clears the connector's length in the slot beyond the engagement depth.
  tally.size = Math.max(tally.size, Math.round(occupiedSlotLength * 10) / 10);
}

/**
 * Whether `ids` holds `id`. A frame has a handful of corner joints, so a list search stands in for
 * a set; ids are compared by length and last character before whole. Ids made by joining strings
 * (a generated frame's) are compared piece by piece, which made this test most of the tally's
 * time, and most pairs of a frame's joint ids differ in length or in their last character.
 */
function isCounted(ids: readonly string[], id: string): boolean {
  const n = id.length;
  const last = n > 0 ? id.charCodeAt(n - 1) : 0;
  for (let k = 0; k < ids.length; k++) {
    const other = ids[k];
    if (other.length === n && (n === 0 || other.charCodeAt(n - 1) === last) && other === id) return true;
  }
  return false;
}

/** The notch a tally calls for; joint ids in code-unit order (as `Array.prototype.sort` puts strings). */
export function cornerNotchesOf(tally: CornerNotchTally): CornerNotches {
  const ids = tally.jointIds;
  // Insertion sort: a few ids, and no work copy as the built-in sort makes.
  for (let i = 1; i < ids.length; i++) {
    const id = ids[i];
    let j = i - 1;
    while (j >= 0 && ids[j] > id) {
      ids[j + 1] = ids[j];
      j--;
    }
    ids[j + 1] = id;
  }
  return { size: tally.size, corners: Math.min(ids.length, 4), jointIds: ids };
}

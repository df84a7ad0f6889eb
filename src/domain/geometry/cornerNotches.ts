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
  const jointIds: string[] = [];
  const seen = new Set<string>();
  let size = 0;
  for (const joint of joints) {
    if (!NOTCHING_CONNECTOR_KINDS.has(joint.kind) || joint.memberIds.length < 2) continue;
    if (!frameProfileIds.has(joint.memberIds[0]) || !frameProfileIds.has(joint.memberIds[1]) || seen.has(joint.id)) continue;
    const length = joint.occupiedSlotLength;
    if (length === undefined || length <= 0) continue;
    seen.add(joint.id);
    jointIds.push(joint.id);
    // The notch clears the connector's length in the slot beyond the engagement depth.
    size = Math.max(size, Math.round(length * 10) / 10);
  }
  return { size, corners: Math.min(jointIds.length, 4), jointIds: jointIds.sort() };
}

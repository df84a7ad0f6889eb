/**
 * How each part travels into place: an insertion direction (unit vector) and an explode offset
 * (mm, = -direction x distance). Rules (common practice, no source):
 * - a profile slides along its axis onto the connector at the one end that meets parts already
 *   placed; with both ends (or a span) held it comes in square to its axis from outside the frame;
 *   a first profile is lowered into place;
 * - a captured panel slides along its slots, away from the member that closes them;
 * - a face panel moves along its normal onto the frame; door hardware with its door;
 * - drop-in T-nuts go in normal to the slot face, slide-in T-nuts along the profile from its end;
 * - feet, casters and end caps go along the profile axis into its end.
 */
import type { DesignDocument, Joint, Panel, Profile, Vec3 } from '../design/schema';
import type { CatalogueIndex } from '../analysis/catalogueIndex';
import type { PartMotion, TNutMotion } from './types';

/** Explode distances, mm (display choice). */
const JOINT_DISTANCE_MM = 40;
const T_NUT_DISTANCE_MM = 30;
const ACCESSORY_DISTANCE_MM = 60;

const clamp = (v: number, lo: number, hi: number) => Math.min(hi, Math.max(lo, v));
const axisVector = (axis: number, sign: number): Vec3 => {
  const v: Vec3 = [0, 0, 0];
  v[axis] = sign < 0 ? -1 : 1;
  return v;
};
const neg = (v: Vec3): Vec3 => [-v[0] || 0, -v[1] || 0, -v[2] || 0];
const scaled = (v: Vec3, s: number): Vec3 => [v[0] * s || 0, v[1] * s || 0, v[2] * s || 0];

export function profileMid(p: Profile): Vec3 {
  return [p.start[0] + (p.direction[0] * p.length) / 2, p.start[1] + (p.direction[1] * p.length) / 2, p.start[2] + (p.direction[2] * p.length) / 2];
}

function pointOn(p: Profile, along: number): Vec3 {
  return [p.start[0] + p.direction[0] * along, p.start[1] + p.direction[1] * along, p.start[2] + p.direction[2] * along];
}

/** The joint's position on members[0], mm. */
function jointPoint(joint: Joint, profiles: Map<string, Profile>): Vec3 | null {
  const m = joint.members[0];
  const p = profiles.get(m.profileId);
  if (!p) return null;
  return pointOn(p, m.at === 'start' ? 0 : m.at === 'end' ? p.length : (m.along ?? 0));
}

/** The dominant axis of `v` among `allowed`, as a signed unit vector; null when all are ~0. */
function dominant(v: Vec3, allowed: number[]): Vec3 | null {
  let axis = -1;
  let best = 1e-6;
  for (const k of allowed) if (Math.abs(v[k]) > best) { best = Math.abs(v[k]); axis = k; }
  return axis < 0 ? null : axisVector(axis, v[axis]);
}

function perpendicularAxes(direction: Vec3): number[] {
  let along = 0;
  for (let k = 1; k < 3; k++) if (Math.abs(direction[k]) > Math.abs(direction[along])) along = k;
  return [0, 1, 2].filter((k) => k !== along);
}

export interface MotionInput {
  design: DesignDocument;
  catalogue: CatalogueIndex;
  /** Part id -> step index. */
  stepOf: Map<string, number>;
}

/** Motions of every profile, panel, joint and accessory, and of each joint's T-nuts. */
export function computeMotions({ design, catalogue, stepOf }: MotionInput): { motions: Map<string, PartMotion>; tNuts: Map<string, TNutMotion> } {
  const profiles = new Map(design.profiles.map((p) => [p.id, p]));
  const motions = new Map<string, PartMotion>();
  const tNuts = new Map<string, TNutMotion>();
  // Centre of the design's profiles, to tell outside from inside.
  const centre: Vec3 = [0, 0, 0];
  for (const p of design.profiles) {
    const m = profileMid(p);
    centre[0] += m[0] / design.profiles.length;
    centre[1] += m[1] / design.profiles.length;
    centre[2] += m[2] / design.profiles.length;
  }
  const step = (id: string) => stepOf.get(id) ?? Number.POSITIVE_INFINITY;

  // Ends of each profile held by a joint with a profile placed in an earlier step.
  const heldEnds = new Map<string, Set<'start' | 'end' | 'span'>>();
  for (const joint of design.joints) {
    for (const m of joint.members) {
      const mine = step(m.profileId);
      const others = joint.members.filter((o) => o.profileId !== m.profileId);
      if (!others.some((o) => step(o.profileId) < mine)) continue;
      const set = heldEnds.get(m.profileId) ?? new Set();
      set.add(m.at);
      heldEnds.set(m.profileId, set);
    }
  }

  for (const p of design.profiles) {
    const held = heldEnds.get(p.id);
    let dir: Vec3;
    if (held && held.size === 1 && !held.has('span')) {
      // Along the axis, towards the held end.
      dir = held.has('start') ? neg(p.direction) : [...p.direction];
    } else if (held && held.size > 0) {
      const out = dominant(
        [profileMid(p)[0] - centre[0], 0, profileMid(p)[2] - centre[2]],
        perpendicularAxes(p.direction).filter((k) => k !== 1),
      );
      dir = out ? neg(out) : [0, -1, 0];
    } else dir = [0, -1, 0];
    const distance = clamp(p.length * 0.25, 60, 300);
    motions.set(p.id, { partId: p.id, role: 'profile', insertionDirection: dir, explodeOffset: scaled(dir, -distance) });
  }

  for (const panel of design.panels) {
    const dir = panelDirection(panel, profiles, stepOf, centre);
    const distance = clamp(Math.min(panel.rect.width, panel.rect.height) * 0.5, 80, 400);
    motions.set(panel.id, { partId: panel.id, role: 'panel', insertionDirection: dir, explodeOffset: scaled(dir, -distance) });
  }

  for (const joint of design.joints) {
    const at = jointPoint(joint, profiles);
    const a = profiles.get(joint.members[0].profileId);
    const b = profiles.get(joint.members[1]?.profileId ?? '');
    let dir: Vec3 = [0, -1, 0];
    if (at && a && b) {
      // The connector comes in from the open side of the corner (the bisector of the two members).
      const ma = profileMid(a);
      const mb = profileMid(b);
      const bis: Vec3 = [ma[0] + mb[0] - 2 * at[0], ma[1] + mb[1] - 2 * at[1], ma[2] + mb[2] - 2 * at[2]];
      const d = dominant(bis, [0, 1, 2]);
      if (d) dir = neg(d);
      // T-nuts go into the slot of the member the joined end meets.
      const connector = catalogue.connectors.get(joint.connectorId);
      const count = (connector?.tNutCount ?? 0) * joint.quantity;
      if (count > 0) {
        const m = joint.members[1];
        const along = m.at === 'start' ? 0 : m.at === 'end' ? b.length : (m.along ?? 0);
        let nutDir: Vec3;
        if (joint.tNut === 'slide-in') {
          nutDir = along <= b.length / 2 ? [...b.direction] : neg(b.direction);
        } else {
          const toward = dominant([ma[0] - at[0], ma[1] - at[1], ma[2] - at[2]], perpendicularAxes(b.direction));
          nutDir = toward ? neg(toward) : [0, -1, 0];
        }
        tNuts.set(joint.id, { jointId: joint.id, profileId: b.id, kind: joint.tNut, count, insertionDirection: nutDir, explodeOffset: scaled(nutDir, -T_NUT_DISTANCE_MM) });
      }
    }
    motions.set(joint.id, { partId: joint.id, role: 'joint', insertionDirection: dir, explodeOffset: scaled(dir, -JOINT_DISTANCE_MM) });
  }

  for (const acc of design.accessories) {
    const p = acc.profileId ? profiles.get(acc.profileId) : undefined;
    let dir: Vec3 = [0, -1, 0];
    if (acc.panelId && motions.has(acc.panelId) && acc.kind !== 'door-track') dir = [...motions.get(acc.panelId)!.insertionDirection];
    else if (p && acc.end) dir = acc.end === 'start' ? [...p.direction] : neg(p.direction);
    else if (p) {
      const out = dominant([profileMid(p)[0] - centre[0], profileMid(p)[1] - centre[1], profileMid(p)[2] - centre[2]], perpendicularAxes(p.direction));
      if (out) dir = neg(out);
    }
    motions.set(acc.id, { partId: acc.id, role: 'accessory', insertionDirection: dir, explodeOffset: scaled(dir, -ACCESSORY_DISTANCE_MM) });
  }
  return { motions, tNuts };
}

function panelDirection(panel: Panel, profiles: Map<string, Profile>, stepOf: Map<string, number>, centre: Vec3): Vec3 {
  const n = { x: 0, y: 1, z: 2 }[panel.rect.normal];
  const inPlane = [0, 1, 2].filter((k) => k !== n);
  if (panel.mounting === 'captured') {
    // Away from the bounding member placed last: that is the side left open longest.
    const bounding = (panel.boundedBy ?? []).map((id) => profiles.get(id)).filter((p): p is Profile => !!p);
    const last = bounding.sort((a, b) => (stepOf.get(b.id) ?? -1) - (stepOf.get(a.id) ?? -1))[0];
    if (last) {
      const m = profileMid(last);
      const d = dominant([panel.rect.center[0] - m[0], panel.rect.center[1] - m[1], panel.rect.center[2] - m[2]], inPlane);
      if (d) return d;
    }
    return axisVector(inPlane[0], 1);
  }
  // Face panels move along their normal onto the frame.
  const toward = centre[n] - panel.rect.center[n];
  return axisVector(n, toward === 0 ? -1 : toward);
}

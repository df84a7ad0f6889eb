/**
 * The machining a joint's connector needs, placed on the joint's profiles: access counterbores
 * for concealed connectors, end taps and access holes for end screws, end taps for corner cubes.
 */
import { getConnector } from '../catalogue';
import type { Catalogue } from '../catalogue/types';
import { faceNormal, profileEndPoint, sectionAxes } from '../geometry/profileGeometry';
import { dot, sub, type Vec3 } from '../geometry/vectors';
import type { IdAllocator } from './ids';
import type { DesignDocument, Joint, Machining, Profile } from './schema';

/** The face of `profile` whose outward normal is closest to `direction`. */
export function faceTowards(profile: Profile, direction: readonly [number, number, number]): number {
  const axes = sectionAxes(profile.direction, profile.rollDeg);
  let best = 0;
  let bestDot = -Infinity;
  for (let f = 0; f < 4; f++) {
    const d = dot(faceNormal(axes, f), direction);
    if (d > bestDot + 1e-9) {
      bestDot = d;
      best = f;
    }
  }
  return best;
}

/** The first face of `profile` that does not face along `avoidAxis` (keeps key access clear of the met profile). */
function faceAcross(profile: Profile, avoidAxis: readonly [number, number, number] | undefined): number {
  if (!avoidAxis) return 0;
  const axes = sectionAxes(profile.direction, profile.rollDeg);
  for (let f = 0; f < 4; f++) if (Math.abs(dot(faceNormal(axes, f), avoidAxis)) < 0.5) return f;
  return 0;
}

/** The end's outward direction: along the profile at its end, against it at its start. */
export function outwardAtEnd(profile: Profile, end: 'start' | 'end'): Vec3 {
  const d = profile.direction;
  return end === 'end' ? [d[0], d[1], d[2]] : [-d[0], -d[1], -d[2]];
}

/** Machining for `joint` keyed by profile id. Empty when the connector needs none. */
export function machiningForJoint(
  design: DesignDocument,
  joint: Joint,
  catalogue: Catalogue,
  ids: IdAllocator,
): Map<string, Machining[]> {
  const out = new Map<string, Machining[]>();
  const connector = getConnector(catalogue, joint.connectorId);
  if (!connector) return out;
  const byId = new Map(design.profiles.map((p) => [p.id, p]));
  const add = (profileId: string, m: Omit<Machining, 'id' | 'jointId'>) => {
    const list = out.get(profileId) ?? [];
    list.push({ ...m, id: ids.next('mc'), jointId: joint.id });
    out.set(profileId, list);
  };
  const joined = joint.members[0];
  const met = joint.members[1];
  const joinedProfile = byId.get(joined.profileId);
  const metProfile = met ? byId.get(met.profileId) : undefined;

  for (const spec of connector.machining) {
    if (spec.on === 'joined') {
      if (!joinedProfile || joined.at === 'span') continue;
      const face = spec.kind === 'end-tap' ? 0 : faceAcross(joinedProfile, metProfile?.direction);
      add(joinedProfile.id, { kind: spec.kind, fromEnd: joined.at, offset: spec.offsetFromEnd, face, diameter: spec.diameter });
    } else if (spec.on === 'met') {
      if (!joinedProfile || !metProfile || joined.at === 'span') continue;
      // The hole sits where the joined profile's axis crosses the met profile, on its far face.
      const endPoint = profileEndPoint(joinedProfile, joined.at);
      const along = Math.max(0, Math.min(metProfile.length, dot(sub(endPoint, metProfile.start), metProfile.direction)));
      const face = faceTowards(metProfile, outwardAtEnd(joinedProfile, joined.at));
      add(metProfile.id, { kind: spec.kind, fromEnd: 'start', offset: Math.round(along * 1000) / 1000, face, diameter: spec.diameter });
    } else {
      for (const m of joint.members) {
        if (m.at === 'span') continue;
        add(m.profileId, { kind: spec.kind, fromEnd: m.at, offset: spec.offsetFromEnd, face: 0, diameter: spec.diameter });
      }
    }
  }
  return out;
}

/** Profiles with the joint's old machining removed and the connector's machining added. */
export function withJointMachining(design: DesignDocument, joint: Joint, catalogue: Catalogue, ids: IdAllocator): Profile[] {
  const memberIds = new Set(design.joints.find((j) => j.id === joint.id)?.members.map((m) => m.profileId) ?? []);
  for (const m of joint.members) memberIds.add(m.profileId);
  const stripped = design.profiles.map((p) =>
    memberIds.has(p.id) && p.machining.some((m) => m.jointId === joint.id)
      ? { ...p, machining: p.machining.filter((m) => m.jointId !== joint.id) }
      : p,
  );
  const added = machiningForJoint({ ...design, profiles: stripped }, joint, catalogue, ids);
  if (added.size === 0) return stripped;
  return stripped.map((p) => (added.has(p.id) ? { ...p, machining: [...p.machining, ...added.get(p.id)!] } : p));
}

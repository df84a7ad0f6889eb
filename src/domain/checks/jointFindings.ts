/**
 * Joint check: every profile end is joined or free with an end cap (or a foot or caster);
 * each connector fits its members' systems and meets them; the machining a connector needs is on
 * the profile; no two connectors claim one slot position; access holes are not covered; fastener
 * and T-nut counts are sane.
 */
import type { Finding } from '../analysis/types';
import type { Joint, Machining, ProfileEnd } from '../design/schema';
import type { Connector, ConnectorMachining } from '../catalogue/types';
import { CONTACT_TOLERANCE_MM, accessoriesAt, areJoined, jointCountAt, memberEnd, memberPoint, type AnalysisContext, type ProfileInfo } from '../analysis/context';
import type { UniformGrid } from '../geometry/spatialGrid';
import { capitalise, countOf, endPhrase, findingId, jointName, mm, profileName } from '../analysis/describe';
import { distancePointToProfile, firstProfileAtPoint, pointOffFace, projectAlong } from './geometryQueries';
import { addEndCapFix, addMachiningFix } from './fixes';
import { slotClaimFindings } from './slotClaims';

const CHECK = 'joints';
/** A hole within this distance (mm) of where the connector needs it counts as present. Common practice, no source. */
export const MACHINING_POSITION_TOLERANCE_MM = 2;
/** Members of a joint must lie within this distance (mm) of each other. */
const MEMBERS_MEET_TOLERANCE_MM = 1;
/** More connectors than this on one joint is almost certainly a typing mistake (four faces). */
const MAX_CONNECTORS_PER_JOINT = 4;
/** Lift (mm) of the probe point off a face when asking whether something covers a hole. */
const COVER_PROBE_MM = 1;

const END_CLOSERS = new Set(['end-cap', 'leveling-foot', 'caster']);

/**
 * What the per-joint checks read from the context, taken from it once, and per-analysis answers
 * that depend only on the catalogue part, so each is worked out once: reads made once per joint
 * then come from locals and one small record rather than from the context each time.
 */
interface JointCheckCache {
  joints: readonly Joint[];
  profiles: readonly ProfileInfo[];
  /** `AnalysisContext.jointMemberStart` and `jointMemberProfile`. */
  memberStart: Int32Array;
  memberProfile: Int32Array;
  grid: UniformGrid;
  /** Screws a connector lists that the catalogue lacks. */
  unknownScrews: Map<Connector, number>;
  /** System id → T-nut kind → whether the catalogue has that T-nut. */
  hasTNut: Map<string, Map<string, boolean>>;
  /** The connector id looked up last and its connector: joints come in runs with one connector. */
  lastConnectorId: string | undefined;
  lastConnector: Connector | undefined;
  /** The connector whose unknown screws were counted last, and the count. */
  screwsConnector: Connector | undefined;
  screwsUnknown: number;
  /** The last T-nut question (system, kind) and its answer. */
  tNutSystemId: string | undefined;
  tNutKind: string | undefined;
  tNutKnown: boolean;
}

export function jointFindings(ctx: AnalysisContext): Finding[] {
  const findings: Finding[] = [];
  const joints = ctx.design.joints;
  const cache: JointCheckCache = {
    joints,
    profiles: ctx.profiles,
    memberStart: ctx.jointMemberStart,
    memberProfile: ctx.jointMemberProfile,
    grid: ctx.profileGrid,
    unknownScrews: new Map(),
    hasTNut: new Map(),
    lastConnectorId: undefined,
    lastConnector: undefined,
    screwsConnector: undefined,
    screwsUnknown: 0,
    tNutSystemId: undefined,
    tNutKind: undefined,
    tNutKnown: false,
  };
  const infos: ProfileInfo[] = [];
  for (let j = 0; j < joints.length; j++) checkJoint(ctx, j, infos, findings, cache);
  // Access holes are checked in the profile-ends pass (both read each profile's machining) and
  // listed after the slot claims, where they have always been.
  const accessFindings: Finding[] = [];
  checkProfileEnds(ctx, findings, accessFindings);
  slotClaimFindings(ctx, findings);
  for (let k = 0; k < accessFindings.length; k++) findings.push(accessFindings[k]);
  return findings;
}

/** `infos`: a scratch list, refilled with the joint's member profiles (the checks below read it and keep none of it). */
function checkJoint(ctx: AnalysisContext, jointIndex: number, infos: ProfileInfo[], out: Finding[], cache: JointCheckCache): void {
  const joint = cache.joints[jointIndex];
  // Emptied by pop(): setting `length` takes a slow path in the engine, once per joint.
  while (infos.length > 0) infos.pop();
  let missing: string[] | null = null;
  for (let k = 0; k < joint.members.length; k++) {
    const info = memberOf(cache, jointIndex, k);
    if (info) infos.push(info);
    else (missing ??= []).push(joint.members[k].profileId);
  }
  if (missing) {
    out.push({
      id: findingId(CHECK, 'missing-member', [joint.id, ...missing]),
      check: CHECK,
      severity: 'error',
      partIds: [joint.id, ...missing],
      message: `A ${joint.kind.replace(/-/g, ' ')} refers to ${missing.length === 1 ? 'a profile that is' : `${missing.length} profiles that are`} not in the design. Remove the joint or join existing profiles.`,
    });
    return;
  }
  if (joint.connectorId !== cache.lastConnectorId) {
    cache.lastConnectorId = joint.connectorId;
    cache.lastConnector = ctx.catalogue.connectors.get(joint.connectorId);
  }
  const connector = cache.lastConnector;
  if (!connector) {
    out.push({
      id: findingId(CHECK, 'unknown-connector', [joint.id]),
      check: CHECK,
      severity: 'error',
      partIds: [joint.id, ...memberIdsOf(joint)],
      message: `${capitalise(jointName(ctx, joint))} uses a connector that is not in the catalogue. Pick another connector.`,
    });
    return;
  }
  if (connector.kind !== joint.kind) {
    out.push({
      id: findingId(CHECK, 'kind-mismatch', [joint.id]),
      check: CHECK,
      severity: 'warning',
      partIds: [joint.id, ...memberIdsOf(joint)],
      message: `${capitalise(jointName(ctx, joint))} is drawn as a ${joint.kind.replace(/-/g, ' ')} but its connector is a ${connector.name}.`,
    });
  }
  for (const info of infos) {
    const systemId = info.variant?.systemId;
    if (systemId && !(connector.systemIds as string[]).includes(systemId)) {
      out.push({
        id: findingId(CHECK, 'system-mismatch', [joint.id, info.profile.id]),
        check: CHECK,
        severity: 'error',
        partIds: [joint.id, info.profile.id],
        message: `The ${connector.name} in ${jointName(ctx, joint)} does not fit ${profileName(info, info.profile.id)}, which is ${info.system?.name ?? systemId}. Use a connector made for that system.`,
      });
    }
  }
  checkMembersMeet(ctx, joint, connector, infos, out, cache.grid);
  checkMachining(joint, connector, infos, out);
  checkCounts(ctx, joint, connector, infos, out, cache);
}

/** `memberInfo` read from the check's copies of the context's member tables. */
function memberOf(cache: JointCheckCache, jointIndex: number, k: number): ProfileInfo | undefined {
  const at = cache.memberStart[jointIndex] + k;
  if (k < 0 || at >= cache.memberStart[jointIndex + 1]) return undefined;
  const i = cache.memberProfile[at];
  return i < 0 ? undefined : cache.profiles[i];
}

function memberIdsOf(joint: Joint): string[] {
  return joint.members.map((m) => m.profileId);
}

function checkMembersMeet(ctx: AnalysisContext, joint: Joint, connector: Connector, infos: ProfileInfo[], out: Finding[], grid: UniformGrid): void {
  if (joint.kind === 'hinge' || infos.length < 2) return;
  const gap = joint.kind === 'corner-cube' ? cornerCubeGap(ctx, joint, infos) : grid.distanceToPoint(infos[1].index, memberPoint(infos[0], joint.members[0]));
  if (gap > MEMBERS_MEET_TOLERANCE_MM) membersApart(joint, connector, infos, gap, out);
}

/** The cube sits between the ends: each end lies within one section size of the others. */
function cornerCubeGap(ctx: AnalysisContext, joint: Joint, infos: ProfileInfo[]): number {
  const reach = Math.max(...infos.map((i) => Math.max(i.width, i.height)));
  return Math.max(...infos.slice(1).map((info, k) => distancePointToProfile(ctx, memberPoint(info, joint.members[k + 1]), infos[0].index))) - reach;
}

/**
 * The members-apart finding. Closures live here and in `cornerCubeGap`, not in
 * `checkMembersMeet`: there they would make a context per joint once any joint needed them.
 */
function membersApart(joint: Joint, connector: Connector, infos: ProfileInfo[], gap: number, out: Finding[]): void {
  out.push({
    id: findingId(CHECK, 'members-apart', [joint.id]),
    check: CHECK,
    severity: 'error',
    partIds: [joint.id, ...infos.map((i) => i.profile.id)],
    message: `The ${connector.name} joins ${infos.map((i) => profileName(i)).join(' and ')}, but they are ${mm(gap)} apart. Move the profiles together or remove the joint.`,
    data: { gapMm: round(gap) },
  });
}

function checkMachining(joint: Joint, connector: Connector, infos: ProfileInfo[], out: Finding[]): void {
  for (const need of connector.machining) {
    if (need.on === 'joined') {
      const end = memberEnd(joint.members[0], infos[0]);
      if (!end) continue;
      requireMachining(joint, connector, need, infos[0], end, need.offsetFromEnd, out);
    } else if (need.on === 'met') {
      if (!infos[1]) continue;
      const along = projectAlong(infos[1], memberPoint(infos[0], joint.members[0]));
      const fromEnd: ProfileEnd = along <= infos[1].profile.length / 2 ? 'start' : 'end';
      const offset = fromEnd === 'start' ? along : infos[1].profile.length - along;
      requireMachining(joint, connector, need, infos[1], fromEnd, offset, out);
    } else {
      for (let i = 0; i < joint.members.length; i++) {
        const end = memberEnd(joint.members[i], infos[i]);
        if (end) requireMachining(joint, connector, need, infos[i], end, need.offsetFromEnd, out);
      }
    }
  }
}

function machiningAlong(info: ProfileInfo, m: Machining): number {
  return m.fromEnd === 'start' ? m.offset : info.profile.length - m.offset;
}

function requireMachining(
  joint: Joint,
  connector: Connector,
  need: ConnectorMachining,
  info: ProfileInfo,
  fromEnd: ProfileEnd,
  offset: number,
  out: Finding[],
): void {
  const wantAlong = fromEnd === 'start' ? offset : info.profile.length - offset;
  // A loop rather than `some` with a closure: this runs for every joint.
  for (const m of info.profile.machining) {
    if (m.kind === need.kind && (m.jointId === joint.id || Math.abs(machiningAlong(info, m) - wantAlong) <= MACHINING_POSITION_TOLERANCE_MM)) return;
  }
  const what = MACHINING_WORDS[need.kind];
  const where = need.kind === 'end-tap' ? `in ${endPhrase(info, fromEnd)}` : `${mm(offset)} from ${endPhrase(info, fromEnd)}`;
  const fix = addMachiningFix(joint, `Add the ${what}`);
  out.push({
    id: findingId(CHECK, `missing-${need.kind}`, [info.profile.id, joint.id]),
    check: CHECK,
    severity: 'error',
    partIds: [info.profile.id, joint.id],
    message: `${capitalise(profileName(info, info.profile.id))} needs ${need.kind === 'end-tap' ? 'an' : 'an'} ${what} (Ø ${mm(need.diameter)}${need.tapSize ? `, ${need.tapSize} thread` : ''}) ${where} for its ${connector.name}; the cut list does not have it.`,
    ...(fix ? { fix } : {}),
    data: { offsetMm: round(offset), diameterMm: need.diameter },
  });
}

const MACHINING_WORDS: Record<string, string> = {
  'access-counterbore': 'access counterbore',
  'access-hole': 'access hole',
  'end-tap': 'end tap',
  drill: 'drilled hole',
};

function checkCounts(ctx: AnalysisContext, joint: Joint, connector: Connector, infos: ProfileInfo[], out: Finding[], cache: JointCheckCache): void {
  if (joint.quantity > MAX_CONNECTORS_PER_JOINT) {
    out.push({
      id: findingId(CHECK, 'too-many-connectors', [joint.id]),
      check: CHECK,
      severity: 'warning',
      partIds: [joint.id],
      message: `${capitalise(jointName(ctx, joint))} lists ${joint.quantity} ${connector.name}s; a profile has only four faces. Check the quantity.`,
    });
  }
  // Joints come in runs with one connector: the last answer is kept beside the map.
  if (connector !== cache.screwsConnector) {
    let count = cache.unknownScrews.get(connector);
    if (count === undefined) cache.unknownScrews.set(connector, (count = unknownScrewCount(ctx, connector)));
    cache.screwsConnector = connector;
    cache.screwsUnknown = count;
  }
  const unknownScrews = cache.screwsUnknown;
  if (unknownScrews > 0) {
    out.push({
      id: findingId(CHECK, 'unknown-fastener', [joint.id]),
      check: CHECK,
      severity: 'warning',
      partIds: [joint.id],
      message: `The ${connector.name} in ${jointName(ctx, joint)} lists ${countOf(unknownScrews, 'screw')} the catalogue does not have; the bill of materials leaves them out.`,
    });
  }
  if (connector.tNutCount > 0) {
    const systemId = (infos[1] ?? infos[0]).variant?.systemId;
    if (systemId && !hasTNut(ctx, cache, systemId, joint.tNut)) {
      out.push({
        id: findingId(CHECK, 'no-tnut', [joint.id]),
        check: CHECK,
        severity: 'warning',
        partIds: [joint.id],
        message: `The catalogue has no ${joint.tNut} T-nut for ${(infos[1] ?? infos[0]).system?.name ?? 'this profile system'}, so the T-nuts of ${jointName(ctx, joint)} are not in the bill of materials.`,
      });
    }
  }
}

/**
 * Screws a connector lists that the catalogue lacks. A function of its own: a closure over `ctx`
 * inside `checkCounts` made the engine allocate a context for `ctx` on every call (once per joint),
 * even though the closure itself runs once per connector.
 */
function unknownScrewCount(ctx: AnalysisContext, connector: Connector): number {
  let count = 0;
  for (const f of connector.fasteners) if (!ctx.catalogue.fasteners.has(f.fastenerId)) count++;
  return count;
}

/** Whether the catalogue has this T-nut for the system; one answer per system and kind, no key string per joint. */
function hasTNut(ctx: AnalysisContext, cache: JointCheckCache, systemId: string, kind: string): boolean {
  // The last question asked is kept: joints come in runs with one system and T-nut kind.
  if (systemId === cache.tNutSystemId && kind === cache.tNutKind) return cache.tNutKnown;
  cache.tNutSystemId = systemId;
  cache.tNutKind = kind;
  cache.tNutKnown = hasTNutInCatalogue(ctx, cache, systemId, kind);
  return cache.tNutKnown;
}

function hasTNutInCatalogue(ctx: AnalysisContext, cache: JointCheckCache, systemId: string, kind: string): boolean {
  let bySystem = cache.hasTNut.get(systemId);
  if (!bySystem) cache.hasTNut.set(systemId, (bySystem = new Map()));
  let known = bySystem.get(kind);
  if (known === undefined) bySystem.set(kind, (known = ctx.catalogue.tNutsBySystemKind.has(`${systemId}|${kind}`)));
  return known;
}

/** Both ends, in the order the checks visit them (one list, not one per profile). */
const ENDS: readonly ProfileEnd[] = ['start', 'end'];

/** Profile ends, and (into `accessOut`) each profile's access holes while its machining is at hand. */
function checkProfileEnds(ctx: AnalysisContext, out: Finding[], accessOut: Finding[]): void {
  // Index loops: these run for every profile end, and iterators here were allocated per profile.
  const profiles = ctx.profiles;
  for (let i = 0; i < profiles.length; i++) {
    const info = profiles[i];
    checkAccessHolesUncovered(ctx, info, accessOut);
    for (let e = 0; e < ENDS.length; e++) {
      const end = ENDS[e];
      if (jointCountAt(info, end) > 0) continue;
      const accessories = accessoriesAt(info, end);
      if (hasEndCloser(accessories)) {
        // A cap, foot or caster says the designer meant the end to be free.
        checkThreadedEnd(info, end, accessories, out);
        continue;
      }
      const other = unjoinedNeighbourAt(ctx, info, end);
      if (other) {
        out.push({
          id: findingId(CHECK, 'touching-unjoined', [info.profile.id, end, other.profile.id]),
          check: CHECK,
          severity: 'error',
          partIds: [info.profile.id, other.profile.id],
          message: `${capitalise(endPhrase(info, end))} rests against ${profileName(other, other.profile.id)}, but no joint holds them together. Add a joint there.`,
        });
        continue;
      }
      const fix = addEndCapFix(ctx, info, end);
      out.push({
        id: findingId(CHECK, 'open-end', [info.profile.id, end]),
        check: CHECK,
        severity: 'warning',
        partIds: [info.profile.id],
        message: `${capitalise(endPhrase(info, end))} is not joined to anything and has no end cap.`,
        ...(fix ? { fix } : {}),
      });
    }
  }
}

/**
 * The first profile touching this end that no joint holds to it (the first is enough, and stays
 * cheap when many profiles share the point). Its own function: the closure over `info` inside the
 * loop of `checkProfileEnds` made a context per profile, used or not.
 */
function unjoinedNeighbourAt(ctx: AnalysisContext, info: ProfileInfo, end: ProfileEnd): ProfileInfo | undefined {
  const point = end === 'start' ? info.startPoint : info.endPoint;
  return firstProfileAtPoint(ctx, point, CONTACT_TOLERANCE_MM, info.index, (candidate) => !areJoined(ctx, info.profile.id, candidate.profile.id));
}

/** Whether an end has a cap, foot or caster (a loop, not `some` with a closure, for every profile end). */
function hasEndCloser(accessories: readonly { kind: string }[]): boolean {
  for (const a of accessories) if (END_CLOSERS.has(a.kind)) return true;
  return false;
}

/** Feet and casters thread into the centre bore: the end must be tapped. `accessories`: those at the end. */
function checkThreadedEnd(info: ProfileInfo, end: ProfileEnd, accessories: readonly { id: string; kind: string }[], out: Finding[]): void {
  let threaded: { id: string; kind: string } | undefined;
  for (let k = 0; k < accessories.length && !threaded; k++) if (accessories[k].kind === 'leveling-foot' || accessories[k].kind === 'caster') threaded = accessories[k];
  if (!threaded) return;
  for (const m of info.profile.machining) if (m.kind === 'end-tap' && m.fromEnd === end) return;
  const word = threaded.kind === 'caster' ? 'caster' : 'leveling foot';
  out.push({
    id: findingId(CHECK, 'untapped-foot', [info.profile.id, end]),
    check: CHECK,
    severity: 'error',
    partIds: [info.profile.id, threaded.id],
    message: `The ${word} screws into ${endPhrase(info, end)}, but that end is not tapped${info.system ? ` (${info.system.endTapSize})` : ''}. Add an end tap to the cut list.`,
  });
}

function checkAccessHolesUncovered(ctx: AnalysisContext, info: ProfileInfo, out: Finding[]): void {
  const machining = info.profile.machining;
  for (let k = 0; k < machining.length; k++) {
    const m = machining[k];
    if (m.kind !== 'access-counterbore' && m.kind !== 'access-hole') continue;
    const probe = pointOffFace(info, m.face, machiningAlong(info, m), COVER_PROBE_MM);
    const other = firstProfileAtPoint(ctx, probe, 0, info.index, () => true);
    if (!other) continue;
    out.push({
      id: findingId(CHECK, 'access-covered', [info.profile.id, m.id]),
      check: CHECK,
      severity: 'error',
      partIds: [info.profile.id, other.profile.id],
      message: `The ${MACHINING_WORDS[m.kind]} on face ${m.face} of ${profileName(info, info.profile.id)} is covered by ${profileName(other, other.profile.id)}, so the hex key cannot reach the screw. Put the hole on a free face.`,
    });
  }
}

function round(v: number): number {
  return Math.round(v * 100) / 100;
}

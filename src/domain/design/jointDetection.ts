/**
 * Finds where profile ends meet other profiles and proposes joints:
 * - an end against another profile's face near that profile's end → corner;
 * - an end against another profile's face mid-span → tee;
 * - an end against another profile's end, in line → splice;
 * - three ends of mutually square profiles around one box corner (a cube's room left
 *   between them) → corner cube.
 * A uniform grid over the profiles' bounding boxes keeps this near-linear (8,000 profiles).
 * Ends already closed by a joint are skipped. Lengths mm.
 */
import { defaultCatalogue, getVariant } from '../catalogue';
import type { Catalogue } from '../catalogue/types';
import { profileBoundingBox, profileEndPoint, sectionAxes, sectionHalfExtentAlong, type SectionAxes } from '../geometry/profileGeometry';
import type { Box } from '../geometry/box';
import { dot, sub, type Vec3 } from '../geometry/vectors';
import { addJoints, type JointInput } from './operations';
import { jointedEnds } from './endTreatments';
import type { DesignDocument, JointKind, JointMember, Profile, ProfileEnd } from './schema';

/** How far apart (mm) two faces may be and still count as touching. */
export const JOINT_TOLERANCE_MM = 0.5;
/** |cos| below this counts as square (perpendicular); above 1 − this as parallel. */
export const ANGLE_TOLERANCE = 1e-3;

export type JointProposalKind = 'corner' | 'tee' | 'splice' | 'corner-cube';

export interface JointProposal {
  /** Stable key: kind and the members' ends. */
  id: string;
  kind: JointProposalKind;
  /** The joint kind Slotwise suggests for it. */
  suggestedJointKind: JointKind;
  /** members[0] is the end being joined; for tees and corners members[1] meets it along its span. */
  members: JointMember[];
  /** Where the joint is, mm. */
  position: Vec3;
}

export const DEFAULT_JOINT_KIND_FOR: Record<JointProposalKind, JointKind> = {
  corner: 'corner-bracket',
  tee: 'corner-bracket',
  splice: 'gusset-plate',
  'corner-cube': 'corner-cube',
};

interface Placed {
  profile: Profile;
  axes: SectionAxes;
  width: number;
  height: number;
  box: Box;
}

/** A uniform grid of profile indices keyed by cell; long profiles sit in every cell they cross. */
class ProfileGrid {
  private cells = new Map<number, number[]>();
  constructor(private cellSize: number) {}
  private cell(v: number): number {
    return Math.floor(v / this.cellSize);
  }
  /**
   * Cell coordinates wrap every 1,024 cells so the key stays a small integer (fast map keys);
   * cells that wrap onto each other only add candidates, which the exact tests then reject.
   */
  private static key(x: number, y: number, z: number): number {
    return ((x & GRID_MASK) << 20) | ((y & GRID_MASK) << 10) | (z & GRID_MASK);
  }
  insert(index: number, b: Box): void {
    const x0 = this.cell(b.minX), x1 = this.cell(b.maxX);
    const y0 = this.cell(b.minY), y1 = this.cell(b.maxY);
    const z0 = this.cell(b.minZ), z1 = this.cell(b.maxZ);
    for (let x = x0; x <= x1; x++)
      for (let y = y0; y <= y1; y++)
        for (let z = z0; z <= z1; z++) {
          const k = ProfileGrid.key(x, y, z);
          const list = this.cells.get(k);
          if (list) list.push(index);
          else this.cells.set(k, [index]);
        }
  }
  /** Calls `visit` once for each profile whose cells come within `reach` of `p`. */
  query(p: readonly number[], reach: number, visit: (index: number) => void, stamp: Int32Array, mark: number): void {
    const x0 = this.cell(p[0] - reach), x1 = this.cell(p[0] + reach);
    const y0 = this.cell(p[1] - reach), y1 = this.cell(p[1] + reach);
    const z0 = this.cell(p[2] - reach), z1 = this.cell(p[2] + reach);
    for (let x = x0; x <= x1; x++)
      for (let y = y0; y <= y1; y++)
        for (let z = z0; z <= z1; z++) {
          const list = this.cells.get(ProfileGrid.key(x, y, z));
          if (!list) continue;
          for (let i = 0; i < list.length; i++) {
            const index = list[i];
            if (stamp[index] === mark) continue;
            stamp[index] = mark;
            visit(index);
          }
        }
  }
}
const GRID_MASK = 1023;

const outward = (p: Profile, end: ProfileEnd): Vec3 =>
  end === 'end' ? [p.direction[0], p.direction[1], p.direction[2]] : [-p.direction[0], -p.direction[1], -p.direction[2]];
const round3 = (v: number) => Math.round(v * 1000) / 1000;

export function detectJoints(design: DesignDocument, catalogue: Catalogue = defaultCatalogue): JointProposal[] {
  return detectJointsWithStats(design, catalogue).proposals;
}

/** detectJoints plus how many (end, profile) candidate pairs the grid handed to the exact tests. */
export function detectJointsWithStats(
  design: DesignDocument,
  catalogue: Catalogue = defaultCatalogue,
): { proposals: JointProposal[]; candidatePairs: number } {
  let candidatePairs = 0;
  const tol = JOINT_TOLERANCE_MM;
  const placed: Placed[] = [];
  let maxSection = 0;
  for (const profile of design.profiles) {
    const v = getVariant(catalogue, profile.variantId);
    const width = v?.width ?? 40;
    const height = v?.height ?? 40;
    maxSection = Math.max(maxSection, width, height);
    placed.push({ profile, axes: sectionAxes(profile.direction, profile.rollDeg), width, height, box: profileBoundingBox(profile, width, height) });
  }
  const grid = new ProfileGrid(Math.max(50, maxSection * 2));
  placed.forEach((p, i) => grid.insert(i, p.box));
  const stamp = new Int32Array(placed.length).fill(-1);
  let mark = 0;

  const closed = jointedEnds(design);
  const proposals = new Map<string, JointProposal>();
  const claimedEnds = new Set<string>();
  const cubeCorners = new Map<string, { index: number; end: ProfileEnd }[]>();

  placed.forEach((a, ai) => {
    for (const end of ['start', 'end'] as const) {
      const endKey = `${a.profile.id}@${end}`;
      if (closed.has(endKey)) continue;
      const e = profileEndPoint(a.profile, end);
      const o = outward(a.profile, end);
      let found = false;
      grid.query(e, maxSection + tol, (bi) => {
        if (bi === ai || found) return;
        candidatePairs++;
        const b = placed[bi];
        const cos = dot(a.profile.direction, b.profile.direction);
        if (Math.abs(cos) > 1 - ANGLE_TOLERANCE) {
          // Splice: b has an end at e, pointing back at a, on the same line.
          for (const bEnd of ['start', 'end'] as const) {
            const be = profileEndPoint(b.profile, bEnd);
            const d = sub(be, e);
            if (Math.hypot(d[0], d[1], d[2]) > tol) continue;
            if (dot(outward(b.profile, bEnd), o) > -1 + ANGLE_TOLERANCE) continue;
            const members: JointMember[] = [
              { profileId: a.profile.id, at: end },
              { profileId: b.profile.id, at: bEnd },
            ];
            const id = `splice:${[`${a.profile.id}@${end}`, `${b.profile.id}@${bEnd}`].sort().join('+')}`;
            if (!proposals.has(id) && !closed.has(`${b.profile.id}@${bEnd}`)) {
              proposals.set(id, { id, kind: 'splice', suggestedJointKind: DEFAULT_JOINT_KIND_FOR.splice, members, position: e.map(round3) as Vec3 });
            }
            found = true;
          }
          return;
        }
        if (Math.abs(cos) > ANGLE_TOLERANCE) return;
        // Square: a's end face must lie on one of b's side faces.
        const rel = sub(e, b.profile.start);
        const along = dot(rel, b.profile.direction);
        if (along < -tol || along > b.profile.length + tol) return;
        const lateral: Vec3 = [
          rel[0] - along * b.profile.direction[0],
          rel[1] - along * b.profile.direction[1],
          rel[2] - along * b.profile.direction[2],
        ];
        const reach = sectionHalfExtentAlong(b.axes, b.width, b.height, o);
        const gap: Vec3 = [lateral[0] + o[0] * reach, lateral[1] + o[1] * reach, lateral[2] + o[2] * reach];
        if (Math.hypot(gap[0], gap[1], gap[2]) > tol) return;
        const halfAAlongB = sectionHalfExtentAlong(a.axes, a.width, a.height, b.profile.direction);
        const nearEnd = Math.min(along, b.profile.length - along) <= halfAAlongB + tol;
        const kind: JointProposalKind = nearEnd ? 'corner' : 'tee';
        const clampedAlong = round3(Math.max(0, Math.min(b.profile.length, along)));
        const members: JointMember[] = [
          { profileId: a.profile.id, at: end },
          { profileId: b.profile.id, at: 'span', along: clampedAlong },
        ];
        const id = `${kind}:${a.profile.id}@${end}>${b.profile.id}`;
        proposals.set(id, { id, kind, suggestedJointKind: DEFAULT_JOINT_KIND_FOR[kind], members, position: e.map(round3) as Vec3 });
        found = true;
      }, stamp, mark++);
      if (found) {
        claimedEnds.add(endKey);
        continue;
      }
      // No contact: remember where a cube sized like this section would sit beyond the end.
      const half = sectionHalfExtentAlong(a.axes, a.width, a.height, a.axes.u);
      const centre = [e[0] + o[0] * half, e[1] + o[1] * half, e[2] + o[2] * half].map((c) => Math.round(c / tol));
      const key = centre.join(',');
      const list = cubeCorners.get(key) ?? [];
      list.push({ index: ai, end });
      cubeCorners.set(key, list);
    }
  });

  for (const list of cubeCorners.values()) {
    if (list.length !== 3) continue;
    const [p, q, r] = list.map((x) => placed[x.index].profile);
    const square = (m: Profile, n: Profile) => Math.abs(dot(m.direction, n.direction)) < ANGLE_TOLERANCE;
    if (!square(p, q) || !square(q, r) || !square(p, r)) continue;
    const members: JointMember[] = list.map((x) => ({ profileId: placed[x.index].profile.id, at: x.end }));
    const a = placed[list[0].index];
    const e = profileEndPoint(a.profile, list[0].end);
    const o = outward(a.profile, list[0].end);
    const half = sectionHalfExtentAlong(a.axes, a.width, a.height, a.axes.u);
    const id = `corner-cube:${members.map((m) => `${m.profileId}@${m.at}`).sort().join('+')}`;
    proposals.set(id, {
      id,
      kind: 'corner-cube',
      suggestedJointKind: DEFAULT_JOINT_KIND_FOR['corner-cube'],
      members,
      position: [e[0] + o[0] * half, e[1] + o[1] * half, e[2] + o[2] * half].map(round3) as Vec3,
    });
  }
  return { proposals: [...proposals.values()], candidatePairs };
}

/** How to turn a proposal kind into a joint: the joint kind and, optionally, a connector id. */
export type ConnectorChoice = Partial<Record<JointProposalKind, { kind: JointKind; connectorId?: string }>>;

/** Adds a joint for each proposal (with the machining its connector needs). */
export function acceptJointProposals(
  design: DesignDocument,
  proposals: JointProposal[],
  connectorChoice: ConnectorChoice = {},
  catalogue: Catalogue = defaultCatalogue,
): DesignDocument {
  const inputs: JointInput[] = proposals.map((p) => {
    const choice = connectorChoice[p.kind] ?? { kind: p.suggestedJointKind };
    return { kind: choice.kind, connectorId: choice.connectorId, members: p.members };
  });
  return addJoints(design, inputs, catalogue);
}

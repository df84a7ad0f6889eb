import { describe, expect, it } from 'vitest';
import { createEmptyDesign } from '@/domain/design/create';
import { freeEnds } from '@/domain/design/endTreatments';
import { generateDesign } from '@/domain/design/generators';
import { acceptJointProposals, detectJoints, detectJointsWithStats, JOINT_TOLERANCE_MM } from '@/domain/design/jointDetection';
import { addProfile } from '@/domain/design/operations';
import { parseDesignDocument } from '@/domain/design/parse';
import type { DesignDocument, Vec3 } from '@/domain/design/schema';

type P = { id: string; start: Vec3; direction: Vec3; length: number; variantId?: string };
function design(profiles: P[], systemId = 'metric-40'): DesignDocument {
  return profiles.reduce((d, p) => addProfile(d, p), createEmptyDesign({ name: 'Detect', systemId }));
}

/** A 500 x 400 rectangle in the XY plane: two 40 mm uprights and two rails between them. */
const rectangle: P[] = [
  { id: 'left', start: [-230, 0, 0], direction: [0, 1, 0], length: 400 },
  { id: 'right', start: [230, 0, 0], direction: [0, 1, 0], length: 400 },
  { id: 'bottom', start: [-210, 20, 0], direction: [1, 0, 0], length: 420 },
  { id: 'top', start: [-210, 380, 0], direction: [1, 0, 0], length: 420 },
];

describe('detectJoints', () => {
  it('finds the four corners of a rectangle', () => {
    const proposals = detectJoints(design(rectangle));
    expect(proposals).toHaveLength(4);
    expect(proposals.every((p) => p.kind === 'corner' && p.suggestedJointKind === 'corner-bracket')).toBe(true);
    const joined = proposals.map((p) => `${p.members[0].profileId}@${p.members[0].at}>${p.members[1].profileId}`).sort();
    expect(joined).toEqual(['bottom@end>right', 'bottom@start>left', 'top@end>right', 'top@start>left']);
    const bottomLeft = proposals.find((p) => p.members[0].profileId === 'bottom' && p.members[0].at === 'start')!;
    expect(bottomLeft.members[1]).toEqual({ profileId: 'left', at: 'span', along: 20 });
    expect(bottomLeft.position).toEqual([-210, 20, 0]);
  });

  it('finds the T where a member meets another mid-span', () => {
    const d = design([...rectangle, { id: 'middle', start: [-210, 200, 0], direction: [1, 0, 0], length: 420 }]);
    const tees = detectJoints(d).filter((p) => p.kind === 'tee');
    expect(tees.map((t) => `${t.members[0].profileId}@${t.members[0].at}>${t.members[1].profileId}@${t.members[1].along}`).sort()).toEqual([
      'middle@end>right@200',
      'middle@start>left@200',
    ]);
  });

  it('finds a splice where two profiles meet end to end in line, once', () => {
    const d = design([
      { id: 'a', start: [0, 0, 0], direction: [1, 0, 0], length: 300 },
      { id: 'b', start: [300, 0, 0], direction: [1, 0, 0], length: 300 },
    ]);
    const proposals = detectJoints(d);
    expect(proposals).toHaveLength(1);
    expect(proposals[0]).toMatchObject({ kind: 'splice', suggestedJointKind: 'gusset-plate', position: [300, 0, 0] });
  });

  it('proposes a corner cube where three square profiles end around one box corner', () => {
    const d = design([
      // A 40 mm cube fills [0, 40]³; each profile starts at one of its faces.
      { id: 'x', start: [40, 20, 20], direction: [1, 0, 0], length: 300 },
      { id: 'y', start: [20, 40, 20], direction: [0, 1, 0], length: 300 },
      { id: 'z', start: [20, 20, 40], direction: [0, 0, 1], length: 300 },
    ]);
    const cubes = detectJoints(d).filter((p) => p.kind === 'corner-cube');
    expect(cubes).toHaveLength(1);
    expect(cubes[0].members.map((m) => `${m.profileId}@${m.at}`).sort()).toEqual(['x@start', 'y@start', 'z@start']);
    expect(cubes[0].position).toEqual([20, 20, 20]);
  });

  it('ignores ends that stop short of another profile by more than the tolerance', () => {
    const gap = JOINT_TOLERANCE_MM * 4;
    const d = design([rectangle[0], { id: 'short', start: [-210 + gap, 20, 0], direction: [1, 0, 0], length: 200 }]);
    expect(detectJoints(d)).toEqual([]);
  });

  it('accepting the proposals joins every end, with the chosen connector and its machining', () => {
    const d = design(rectangle);
    const joined = acceptJointProposals(d, detectJoints(d), { corner: { kind: 'concealed-connector' } });
    expect(joined.joints).toHaveLength(4);
    expect(joined.joints.every((j) => j.connectorId === 'm40-concealed-connector')).toBe(true);
    expect(joined.profiles.find((p) => p.id === 'top')!.machining.map((m) => m.kind)).toEqual(['access-counterbore', 'access-counterbore']);
    expect(detectJoints(joined)).toEqual([]);
    // The uprights' four ends remain free: they get caps or feet, not joints.
    expect(freeEnds(joined)).toHaveLength(4);
    expect(parseDesignDocument(JSON.parse(JSON.stringify(joined))).ok).toBe(true);
  });

  it('finds every joint of a generated frame again after its joints are removed', () => {
    const generated = generateDesign('shelf-unit', { systemId: 'inch-1.5', width: 900, depth: 450, height: 1500, shelves: 4 });
    const stripped = { ...generated, joints: [] };
    const proposals = detectJoints(stripped);
    expect(proposals).toHaveLength(generated.joints.length);
    const key = (m: { profileId: string; at: string }) => `${m.profileId}@${m.at}`;
    expect(proposals.map((p) => key(p.members[0])).sort()).toEqual(generated.joints.map((j) => key(j.members[0])).sort());
  });

  it('checks only a few nearby profiles per end on an 8,000-profile design, not all pairs', () => {
    const frame = generateDesign('box-frame', { systemId: 'metric-40', width: 600, depth: 400, height: 500, feet: 'none' });
    const copies = Math.ceil(8000 / frame.profiles.length);
    const side = Math.ceil(Math.sqrt(copies));
    const profiles = [];
    for (let c = 0; c < copies; c++) {
      const dx = (c % side) * 700;
      const dz = Math.floor(c / side) * 500;
      for (const p of frame.profiles) profiles.push({ ...p, id: `${p.id}-c${c}`, start: [p.start[0] + dx, p.start[1], p.start[2] + dz] as Vec3, machining: [] });
    }
    const big: DesignDocument = { ...frame, profiles, joints: [], accessories: [], panels: [], steps: [] };
    expect(big.profiles.length).toBeGreaterThanOrEqual(8000);
    const { proposals, candidatePairs } = detectJointsWithStats(big);
    expect(proposals).toHaveLength(copies * frame.joints.length);
    // All pairs would be 2 ends x 8,000 x 8,000 = 128 million tests; the grid hands over a few per end.
    const ends = 2 * big.profiles.length;
    expect(candidatePairs).toBeLessThan(10 * ends);
  });
});

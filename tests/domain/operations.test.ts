import { describe, expect, it } from 'vitest';
import { createEmptyDesign } from '@/domain/design/create';
import { freeEnds } from '@/domain/design/endTreatments';
import { sectionAxes } from '@/domain/geometry/profileGeometry';
import { generateDesign } from '@/domain/design/generators';
import {
  addAccessory,
  addCutout,
  addFeetToFreeBottomEnds,
  addJoint,
  addPanel,
  addProfile,
  applyOperation,
  arrayParts,
  autoEndCaps,
  duplicateParts,
  mirrorParts,
  newId,
  OperationError,
  removeJoint,
  removeParts,
  rotateParts90,
  setJointConnector,
  translateParts,
  updatePanel,
  updateProfile,
  type DesignOperation,
} from '@/domain/design/operations';
import { parseDesignDocument } from '@/domain/design/parse';
import type { DesignDocument } from '@/domain/design/schema';

/** Deep-freezes a design so any mutation by an operation throws. */
function frozen<T>(value: T): T {
  if (value && typeof value === 'object') {
    Object.values(value).forEach(frozen);
    Object.freeze(value);
  }
  return value;
}

function valid(design: DesignDocument): DesignDocument {
  const r = parseDesignDocument(JSON.parse(JSON.stringify(design)));
  if (!r.ok) throw new Error(JSON.stringify(r.errors));
  return r.design;
}

/** Two uprights and a rail between them, joined at both rail ends (metric-40). */
function smallFrame(): DesignDocument {
  let d = createEmptyDesign({ name: 'Test frame', systemId: 'metric-40' });
  d = addProfile(d, { id: 'left', start: [-220, 0, 0], direction: [0, 1, 0], length: 600 });
  d = addProfile(d, { id: 'right', start: [220, 0, 0], direction: [0, 1, 0], length: 600 });
  d = addProfile(d, { id: 'rail', start: [-200, 580, 0], direction: [1, 0, 0], length: 400 });
  d = addJoint(d, { id: 'j-left', kind: 'corner-bracket', members: [{ profileId: 'rail', at: 'start' }, { profileId: 'left', at: 'span', along: 580 }] });
  d = addJoint(d, { id: 'j-right', kind: 'corner-bracket', members: [{ profileId: 'rail', at: 'end' }, { profileId: 'right', at: 'span', along: 580 }] });
  return frozen(d);
}

const box = () => frozen(generateDesign('box-frame', { systemId: 'metric-40', width: 600, depth: 400, height: 500, panels: 'walls' }));

describe('profiles', () => {
  it('adds a profile with the system’s square variant and a fresh id', () => {
    const d = smallFrame();
    const next = addProfile(d, { start: [0, 0, 0], direction: [0, 0, 2], length: 300 });
    expect(next.profiles).toHaveLength(4);
    const added = next.profiles[3];
    expect(added).toMatchObject({ variantId: 'm40-40x40', direction: [0, 0, 1], length: 300 });
    expect(d.profiles.map((p) => p.id)).not.toContain(added.id);
    expect(d.profiles).toHaveLength(3);
    valid(next);
  });

  it('refuses a zero length or an id already in use, leaving the design as it was', () => {
    const d = smallFrame();
    expect(() => addProfile(d, { start: [0, 0, 0], direction: [1, 0, 0], length: 0 })).toThrow(OperationError);
    expect(() => addProfile(d, { id: 'rail', start: [0, 0, 0], direction: [1, 0, 0], length: 10 })).toThrow(/already used/);
    expect(() => updateProfile(d, 'rail', { length: -4 })).toThrow(/greater than 0 mm/);
    expect(() => updateProfile(d, 'nope', { length: 4 })).toThrow(/no profile "nope"/);
  });

  it('updates length, start, direction, roll and variant of one profile only', () => {
    const d = smallFrame();
    const next = updateProfile(d, 'rail', { length: 380, start: [-190, 500, 0], direction: [2, 0, 0], rollDeg: 90, variantId: 'm40-40x80' });
    expect(next.profiles.find((p) => p.id === 'rail')).toMatchObject({ length: 380, start: [-190, 500, 0], direction: [1, 0, 0], rollDeg: 90, variantId: 'm40-40x80' });
    expect(next.profiles.find((p) => p.id === 'left')).toBe(d.profiles[0]);
    expect(d.profiles[2].length).toBe(400);
  });

  it('makes new ids that are not used anywhere in the design', () => {
    const d = smallFrame();
    expect(newId('p', d)).toBe('p-1');
    const withP1 = addProfile(d, { id: 'p-1', start: [0, 0, 0], direction: [1, 0, 0], length: 10 });
    expect(newId('p', withP1)).toBe('p-2');
  });
});

describe('removing parts', () => {
  it('removes a profile with the joints, panels, accessories, loads and step entries that refer to it', () => {
    const d = box();
    const post = d.profiles[0].id;
    const design = frozen({
      ...d,
      loadCases: [{ id: 'lc-1', name: 'Load', support: 'simple' as const, loads: [{ kind: 'point' as const, profileId: post, along: 10, force: 100, direction: [0, -1, 0] as [number, number, number] }] }],
    });
    const next = removeParts(design, [post]);
    expect(next.profiles.some((p) => p.id === post)).toBe(false);
    expect(next.joints.some((j) => j.members.some((m) => m.profileId === post))).toBe(false);
    expect(next.panels.some((p) => p.boundedBy?.includes(post))).toBe(false);
    expect(next.accessories.some((a) => a.profileId === post)).toBe(false);
    expect(next.loadCases[0].loads).toHaveLength(0);
    expect(next.steps.flatMap((s) => s.partIds)).not.toContain(post);
    expect(next.joints.length).toBeLessThan(d.joints.length);
    expect(next.panels.length).toBeLessThan(d.panels.length);
    valid(next);
  });

  it('removes a joint together with the machining its connector needed', () => {
    const d = frozen(setJointConnector(smallFrame(), 'j-left', 'concealed-connector'));
    expect(d.profiles.find((p) => p.id === 'rail')!.machining).toHaveLength(1);
    const next = removeJoint(d, 'j-left');
    expect(next.joints.map((j) => j.id)).toEqual(['j-right']);
    expect(next.profiles.find((p) => p.id === 'rail')!.machining).toHaveLength(0);
    expect(next.profiles).toHaveLength(3);
  });
});

describe('moving and copying', () => {
  it('translates profiles and the panels held only by them', () => {
    const d = box();
    const all = d.profiles.map((p) => p.id);
    const next = translateParts(d, all, [100, 0, -50]);
    next.profiles.forEach((p, i) => expect(p.start).toEqual([d.profiles[i].start[0] + 100, d.profiles[i].start[1], d.profiles[i].start[2] - 50]));
    next.panels.forEach((p, i) => expect(p.rect.center[0]).toBeCloseTo(d.panels[i].rect.center[0] + 100, 9));
    expect(d.profiles[0].start).toEqual(box().profiles[0].start);
  });

  it('keeps joints with a rail moved along the uprights, re-measuring where they sit', () => {
    const d = frozen(setJointConnector(smallFrame(), 'j-right', 'end-screw'));
    const next = translateParts(d, ['rail'], [0, -180, 0]);
    expect(next.joints.map((j) => j.members[1].along)).toEqual([400, 400]);
    const right = next.profiles.find((p) => p.id === 'right')!;
    expect(right.machining).toEqual([expect.objectContaining({ kind: 'access-hole', offset: 400, jointId: 'j-right' })]);
    const raised = updateProfile(d, 'rail', { start: [-200, 300, 0] });
    expect(raised.joints[0].members[1].along).toBe(300);
  });

  it('duplicates parts with new ids, bringing along joints whose members are all copied', () => {
    const d = smallFrame();
    const next = duplicateParts(d, ['left', 'right', 'rail'], [0, 0, 500]);
    expect(next.profiles).toHaveLength(6);
    expect(next.joints).toHaveLength(4);
    const ids = new Set(next.profiles.map((p) => p.id));
    expect(ids.size).toBe(6);
    const copiedJoint = next.joints[2];
    expect(copiedJoint.members.every((m) => !['left', 'right', 'rail'].includes(m.profileId))).toBe(true);
    expect(next.profiles[5].start).toEqual([-200, 580, 500]);
    valid(next);
  });

  it('mirrors a copy about a plane through a point, keeping the original', () => {
    const d = smallFrame();
    const next = mirrorParts(d, ['left'], 'x', [0, 0, 0]);
    expect(next.profiles).toHaveLength(4);
    expect(next.profiles[3]).toMatchObject({ start: [220, 0, 0], direction: [0, 1, 0] });
    const moved = mirrorParts(d, ['rail'], 'y', [0, 300, 0], false);
    expect(moved.profiles.find((p) => p.id === 'rail')).toMatchObject({ start: [-200, 20, 0], direction: [1, 0, 0] });
    const upsideDown = mirrorParts(d, ['left', 'right', 'rail'], 'y', [0, 1000, 0]);
    // The copied uprights now run downwards from y 2000, so the rail sits 580 mm from their start.
    expect(upsideDown.joints.slice(2).map((j) => j.members[1].along)).toEqual([580, 580]);
    expect(upsideDown.profiles[3]).toMatchObject({ start: [-220, 2000, 0], direction: [0, -1, 0] });
    const flipped = mirrorParts(d, ['rail'], 'x', [0, 0, 0], false);
    expect(flipped.profiles.find((p) => p.id === 'rail')).toMatchObject({ start: [200, 580, 0], direction: [-1, 0, 0] });
  });

  it('arrays parts: count in all, each spacing further on', () => {
    const d = smallFrame();
    const next = arrayParts(d, ['rail'], 4, [0, -100, 0]);
    const rails = next.profiles.filter((p) => p.start[0] === -200);
    expect(rails.map((p) => p.start[1])).toEqual([580, 480, 380, 280]);
    expect(() => arrayParts(d, ['rail'], 0, [0, 0, 0])).toThrow(OperationError);
  });

  it('turns parts a quarter turn about an axis through a point, keeping a tall section upright', () => {
    let d = createEmptyDesign({ name: 'Turn', systemId: 'metric-40' });
    d = frozen(addProfile(d, { id: 'beam', variantId: 'm40-40x80', start: [0, 0, 0], direction: [1, 0, 0], length: 500 }));
    const next = rotateParts90(d, ['beam'], 'y', [0, 0, 0], 1);
    const beam = next.profiles[0];
    // Counter-clockwise about +Y takes +X to −Z.
    expect(beam.direction).toEqual([0, 0, -1]);
    expect(beam.start).toEqual([0, 0, 0]);
    // At roll 0 a 40 x 80 along X has its 80 mm side vertical; after the turn it must still be.
    expect(Math.abs(sectionAxes(beam.direction, beam.rollDeg).v[1])).toBe(1);
    const back = rotateParts90(next, ['beam'], 'y', [0, 0, 0], 3);
    expect(back.profiles[0].direction).toEqual([1, 0, 0]);
    expect(back.profiles[0].rollDeg).toBe(0);
  });
});

describe('joints and connectors', () => {
  it('adds the access counterbore at the catalogue distance when a joint gets a concealed connector', () => {
    const d = smallFrame();
    const next = setJointConnector(d, 'j-left', 'concealed-connector');
    expect(next.joints[0]).toMatchObject({ kind: 'concealed-connector', connectorId: 'm40-concealed-connector' });
    const rail = next.profiles.find((p) => p.id === 'rail')!;
    expect(rail.machining).toEqual([
      expect.objectContaining({ kind: 'access-counterbore', fromEnd: 'start', offset: 20, diameter: 10, jointId: 'j-left' }),
    ]);
    expect(d.profiles[2].machining).toHaveLength(0);
  });

  it('replaces a previous connector’s machining with an end tap and an access hole for an end screw', () => {
    const concealed = frozen(setJointConnector(smallFrame(), 'j-right', 'concealed-connector'));
    const next = setJointConnector(concealed, 'j-right', 'end-screw');
    const rail = next.profiles.find((p) => p.id === 'rail')!;
    const right = next.profiles.find((p) => p.id === 'right')!;
    expect(rail.machining.map((m) => m.kind)).toEqual(['end-tap']);
    expect(rail.machining[0]).toMatchObject({ fromEnd: 'end', offset: 0, jointId: 'j-right' });
    expect(right.machining).toEqual([expect.objectContaining({ kind: 'access-hole', fromEnd: 'start', offset: 580, jointId: 'j-right' })]);
    const back = setJointConnector(next, 'j-right', 'corner-bracket');
    expect(back.profiles.flatMap((p) => p.machining)).toHaveLength(0);
    valid(next);
  });

  it('refuses a connector of another kind or an unknown joint', () => {
    const d = smallFrame();
    expect(() => setJointConnector(d, 'j-left', 'end-screw', 'm40-corner-bracket')).toThrow(/not a end-screw/);
    expect(() => setJointConnector(d, 'nope', 'end-screw')).toThrow(/no joint "nope"/);
  });
});

describe('panels and accessories', () => {
  it('adds a captured panel with cut-outs, updates it, and adds another cut-out', () => {
    const d = box();
    const [p1, p2, p3, p4] = d.profiles.map((p) => p.id);
    const next = addPanel(d, {
      materialId: 'polycarbonate',
      thickness: 6,
      mounting: 'captured',
      boundedBy: [p1, p2, p3, p4],
      rect: { center: [0, 250, 0], normal: 'z', width: 500, height: 400 },
      cutouts: [{ kind: 'round', u: 100, v: 0, diameter: 40 }],
    });
    const panel = next.panels[next.panels.length - 1];
    expect(panel.cutouts).toHaveLength(1);
    const updated = updatePanel(next, panel.id, { thickness: 5, materialId: 'acrylic' });
    expect(updated.panels.find((p) => p.id === panel.id)).toMatchObject({ thickness: 5, materialId: 'acrylic' });
    const cut = addCutout(updated, panel.id, { u: -100, v: 50, diameter: 30 });
    expect(cut.panels.find((p) => p.id === panel.id)!.cutouts).toHaveLength(2);
    expect(() => addCutout(updated, panel.id, { u: 240, v: 0, diameter: 30 })).toThrow(/past the edge/);
    expect(() => addPanel(d, { materialId: 'acrylic', thickness: 6, mounting: 'captured', rect: { center: [0, 0, 0], normal: 'y', width: 10, height: 10 } })).toThrow(/four profiles/);
    valid(cut);
  });

  it('adds an accessory only with a catalogue part of the same kind', () => {
    const d = smallFrame();
    const next = addAccessory(d, { kind: 'handle', partId: 'm40-handle', profileId: 'rail', along: 200 });
    expect(next.accessories).toHaveLength(1);
    expect(() => addAccessory(d, { kind: 'caster', partId: 'm40-handle' })).toThrow(/not a caster/);
  });

  it('caps every free end, and no end that is joined or carries a foot', () => {
    const d = smallFrame();
    const feet = frozen(addFeetToFreeBottomEnds(d));
    expect(feet.accessories.map((a) => a.kind)).toEqual(['leveling-foot', 'leveling-foot']);
    expect(feet.profiles.find((p) => p.id === 'left')!.machining).toEqual([expect.objectContaining({ kind: 'end-tap', fromEnd: 'start' })]);
    const capped = autoEndCaps(feet);
    const caps = capped.accessories.filter((a) => a.kind === 'end-cap');
    expect(caps.map((c) => `${c.profileId}@${c.end}`).sort()).toEqual(['left@end', 'right@end']);
    expect(freeEnds(capped)).toEqual([]);
    expect(autoEndCaps(capped)).toBe(capped);
  });

  it('puts feet only under the lowest downward ends, replacing an end cap there', () => {
    const capped = frozen(autoEndCaps(smallFrame()));
    expect(capped.accessories).toHaveLength(4);
    const next = addFeetToFreeBottomEnds(capped, 'caster');
    expect(next.accessories.filter((a) => a.kind === 'caster').map((a) => a.profileId).sort()).toEqual(['left', 'right']);
    expect(next.accessories.filter((a) => a.kind === 'end-cap').map((a) => a.end)).toEqual(['end', 'end']);
  });
});

describe('applyOperation', () => {
  it('replays serialised operations the same as calling the functions', () => {
    const d = smallFrame();
    const ops: DesignOperation[] = [
      { type: 'translateParts', payload: { ids: ['rail'], offset: [0, -10, 0] } },
      { type: 'setJointConnector', payload: { jointId: 'j-left', kind: 'concealed-connector' } },
      { type: 'autoEndCaps' },
      { type: 'addFeetToFreeBottomEnds', payload: { kind: 'leveling-foot' } },
    ];
    const replayed = JSON.parse(JSON.stringify(ops)).reduce((acc: DesignDocument, op: DesignOperation) => applyOperation(acc, op), d);
    const direct = addFeetToFreeBottomEnds(autoEndCaps(setJointConnector(translateParts(d, ['rail'], [0, -10, 0]), 'j-left', 'concealed-connector')));
    expect(replayed).toEqual(direct);
    expect(replayed).not.toEqual(d);
  });

  it('never changes the design it is given', () => {
    const d = box();
    const ids = [d.profiles[0].id, d.joints[0].id];
    const ops: DesignOperation[] = [
      { type: 'addProfile', payload: { profile: { start: [0, 0, 0], direction: [1, 0, 0], length: 100 } } },
      { type: 'updateProfile', payload: { profileId: ids[0], changes: { length: 450 } } },
      { type: 'removeParts', payload: { ids } },
      { type: 'translateParts', payload: { ids, offset: [1, 2, 3] } },
      { type: 'duplicateParts', payload: { ids, offset: [0, 0, 100] } },
      { type: 'mirrorParts', payload: { ids, axis: 'z', point: [0, 0, 0] } },
      { type: 'arrayParts', payload: { ids, count: 3, spacing: [50, 0, 0] } },
      { type: 'rotateParts90', payload: { ids, axis: 'x', point: [0, 0, 0] } },
      { type: 'setJointConnector', payload: { jointId: ids[1], kind: 'end-screw' } },
      { type: 'removeJoint', payload: { jointId: ids[1] } },
      { type: 'addAccessory', payload: { accessory: { kind: 'slot-cover', partId: 'm40-slot-cover', profileId: ids[0], length: 300 } } },
      { type: 'autoEndCaps' },
      { type: 'addFeetToFreeBottomEnds' },
    ];
    for (const op of ops) expect(() => applyOperation(d, op), op.type).not.toThrow();
  });
});

describe('the units operation', () => {
  it('changes only the units the design is shown in: every length and the assembly steps stay as they were', () => {
    const d = box();
    const inches = applyOperation(d, { type: 'setUnits', payload: { units: 'in' } });
    expect(inches.units).toBe('in');
    expect({ ...inches, units: d.units }).toEqual(d);
    expect(d.steps.length).toBeGreaterThan(0);
    expect(inches.steps).toBe(d.steps);
    expect(applyOperation(inches, { type: 'setUnits', payload: { units: 'mm' } }).units).toBe('mm');
  });

  it('refuses units other than mm and in from replayed JSON', () => {
    const op = JSON.parse('{"type":"setUnits","payload":{"units":"cm"}}') as DesignOperation;
    expect(() => applyOperation(box(), op)).toThrow(OperationError);
  });
});

import { describe, expect, it } from 'vitest';
import { accessoryFor, defaultCatalogue } from '@/domain/catalogue';
import { analyzeDesign } from '@/domain/analysis/analyze';
import { createEmptyDesign } from '@/domain/design/create';
import { generateDesign } from '@/domain/design/generators';
import {
  addHingedDoor,
  addProfile,
  addSlidingDoors,
  applyOperation,
  OperationError,
  removeParts,
  SLIDING_LEAF_OVERLAP_MM,
  type DesignOperation,
} from '@/domain/design/operations';
import { findOpenings, type FrameOpening } from '@/domain/design/openings';
import { parseDesignDocument } from '@/domain/design/parse';
import type { DesignDocument, Panel, Vec3 } from '@/domain/design/schema';

/** Deep-freezes a design so any mutation by an operation throws. */
function frozen<T>(value: T): T {
  if (value && typeof value === 'object') {
    Object.values(value).forEach(frozen);
    Object.freeze(value);
  }
  return value;
}

type P = { id: string; start: Vec3; direction: Vec3; length: number };
/** A rectangle of 40 mm profiles in the XY plane (z = 0): clear opening `width` × `height` mm. */
function frame(width: number, height: number): DesignDocument {
  const profiles: P[] = [
    { id: 'left', start: [-width / 2 - 20, 0, 0], direction: [0, 1, 0], length: height + 80 },
    { id: 'right', start: [width / 2 + 20, 0, 0], direction: [0, 1, 0], length: height + 80 },
    { id: 'bottom', start: [-width / 2, 20, 0], direction: [1, 0, 0], length: width },
    { id: 'top', start: [-width / 2, height + 60, 0], direction: [1, 0, 0], length: width },
  ];
  return profiles.reduce((d, p) => addProfile(d, p), createEmptyDesign({ name: 'Door frame', systemId: 'metric-40' }));
}

function onlyOpening(design: DesignDocument): FrameOpening {
  const openings = findOpenings(design);
  expect(openings).toHaveLength(1);
  return openings[0];
}

const slidingOp = (opening: FrameOpening, extra: Partial<{ materialId: string; thickness: number }> = {}): DesignOperation => ({
  type: 'addSlidingDoors',
  payload: { doors: { opening, materialId: 'acrylic', thickness: 4, ...extra } },
});

/** Span of a leaf along the world axis `i`, mm. */
const span = (panel: Panel, i: number, size: number) => [panel.rect.center[i] - size / 2, panel.rect.center[i] + size / 2];

describe('addSlidingDoors', () => {
  const design = frozen(frame(600, 500));
  const opening = onlyOpening(design);
  const doors = applyOperation(design, slidingOp(opening));

  it('puts a door track as long as the opening is wide on the bottom and top rails, starting at the opening edge', () => {
    const tracks = doors.accessories.filter((a) => a.kind === 'door-track');
    expect(tracks.map((a) => a.profileId).sort()).toEqual(['bottom', 'top']);
    for (const t of tracks) {
      expect(t.length).toBe(opening.rect.width);
      expect(t.along).toBe(0);
      expect(t.partId).toBe(accessoryFor(defaultCatalogue, 'metric-40', 'door-track')!.id);
    }
  });

  it('adds two face-mounted door leaves that cover the opening and overlap in the middle', () => {
    const leaves = doors.panels.filter((p) => p.role === 'door');
    expect(leaves).toHaveLength(2);
    expect(leaves.every((p) => p.mounting === 'face' && p.materialId === 'acrylic' && p.thickness === 4)).toBe(true);
    const [left, right] = [...leaves].sort((a, b) => a.rect.center[0] - b.rect.center[0]);
    const [l0, l1] = span(left, 0, left.rect.width);
    const [r0, r1] = span(right, 0, right.rect.width);
    expect(l0).toBeCloseTo(-300);
    expect(r1).toBeCloseTo(300);
    expect(l1 - r0).toBeCloseTo(2 * SLIDING_LEAF_OVERLAP_MM);
    expect(left.rect.width).toBeCloseTo(300 + SLIDING_LEAF_OVERLAP_MM);
    // Two lanes in front of the rails (z > 20 mm, their front face), sheets not touching each other.
    const [lz0, lz1] = span(left, 2, left.thickness);
    const [rz0] = span(right, 2, right.thickness);
    expect(lz0).toBeGreaterThan(20);
    expect(rz0).toBeGreaterThan(lz1);
    // Taller than the clear opening, so the leaves reach into the tracks.
    expect(left.rect.height).toBeGreaterThan(opening.rect.height);
  });

  it('puts one handle on each leaf', () => {
    const leafIds = doors.panels.filter((p) => p.role === 'door').map((p) => p.id);
    const handles = doors.accessories.filter((a) => a.kind === 'handle');
    expect(handles.map((h) => h.panelId).sort()).toEqual([...leafIds].sort());
  });

  it('counts the track in metres and two handles in the bill of materials', () => {
    const bom = analyzeDesign(doors).bom;
    const trackCode = accessoryFor(defaultCatalogue, 'metric-40', 'door-track')!.partCode;
    const handleCode = accessoryFor(defaultCatalogue, 'metric-40', 'handle')!.partCode;
    const track = bom.find((line) => line.code === trackCode);
    expect(track).toMatchObject({ unit: 'm', quantity: 1.2 });
    expect(bom.find((line) => line.code === handleCode)).toMatchObject({ unit: 'pcs', quantity: 2 });
    expect(bom.filter((line) => line.category === 'panel').reduce((n, line) => n + line.quantity, 0)).toBe(2);
  });

  it('adds no error or warning findings of its own (the bare frame has unjoined corners)', () => {
    const serious = (d: DesignDocument) => analyzeDesign(d).findings.filter((f) => f.severity !== 'note').map((f) => f.id).sort();
    expect(serious(doors)).toEqual(serious(design));
  });

  it('leaves its input unchanged and gives a document that parses', () => {
    expect(design.panels).toHaveLength(0);
    expect(design.accessories).toHaveLength(0);
    expect(parseDesignDocument(JSON.parse(JSON.stringify(doors))).ok).toBe(true);
  });

  it('removes the leaves, their handles and the top track when the top rail is removed', () => {
    const after = removeParts(doors, ['top']);
    expect(after.panels).toHaveLength(0);
    expect(after.accessories.map((a) => `${a.kind}@${a.profileId}`)).toEqual(['door-track@bottom']);
  });

  it('is undone exactly by removing the parts it added', () => {
    const added = [...doors.panels, ...doors.accessories].map((part) => part.id);
    expect(removeParts(doors, added)).toEqual(design);
  });

  it('removes a leaf together with its handle but keeps the tracks', () => {
    const leaf = doors.panels[0].id;
    const after = removeParts(doors, [leaf]);
    expect(after.panels.map((p) => p.id)).not.toContain(leaf);
    expect(after.accessories.filter((a) => a.kind === 'handle')).toHaveLength(1);
    expect(after.accessories.filter((a) => a.kind === 'door-track')).toHaveLength(2);
  });

  it('hangs the leaves outside a generated box frame, away from its middle', () => {
    const box = generateDesign('box-frame', { systemId: 'metric-30', width: 600, depth: 400, height: 500 });
    const front = findOpenings(box).find((o) => o.rect.normal === 'z' && o.rect.center[2] < 0)!;
    const withDoors = addSlidingDoors(box, { opening: front, materialId: 'polycarbonate', thickness: 3 });
    const leaves = withDoors.panels.filter((p) => p.role === 'door');
    expect(leaves).toHaveLength(2);
    for (const p of leaves) expect(p.rect.center[2]).toBeLessThan(front.rect.center[2] - 15);
  });

  it('refuses an opening narrower than 200 mm with a readable message', () => {
    const narrow = frame(150, 500);
    expect(() => addSlidingDoors(narrow, { opening: onlyOpening(narrow), materialId: 'acrylic', thickness: 4 })).toThrow(
      /opening is 150 × 500 mm; two sliding doors need at least 200/,
    );
  });

  it('refuses an unknown material and names it', () => {
    expect(() => applyOperation(design, slidingOp(opening, { materialId: 'unobtainium' }))).toThrow(OperationError);
    expect(() => applyOperation(design, slidingOp(opening, { materialId: 'unobtainium' }))).toThrow('Unknown panel material "unobtainium"');
  });

  it('refuses an opening whose profiles are not in the design', () => {
    const ghost = { ...opening, boundedBy: ['bottom', 'top', 'left', 'gone'] as FrameOpening['boundedBy'] };
    expect(() => applyOperation(design, slidingOp(ghost))).toThrow('There is no profile "gone" in this design');
  });
});

describe('addHingedDoor', () => {
  const design = frozen(frame(500, 600));
  const opening = onlyOpening(design);
  const op: DesignOperation = { type: 'addHingedDoor', payload: { door: { opening, materialId: 'acm', thickness: 4, hingeSide: 'right' } } };
  const withDoor = applyOperation(design, op);

  it('adds one door leaf reaching to the profiles centre lines, in front of the frame', () => {
    const leaves = withDoor.panels.filter((p) => p.role === 'door');
    expect(leaves).toHaveLength(1);
    expect(leaves[0].rect.width).toBe(540);
    expect(leaves[0].rect.height).toBe(640);
    expect(leaves[0].rect.center[2]).toBe(22);
  });

  it('puts two hinges on the chosen upright, a handle, and a latch on the other upright', () => {
    const kinds = withDoor.accessories.map((a) => `${a.kind}@${a.profileId ?? '-'}`).sort();
    expect(kinds).toEqual(['handle@-', 'hinge@right', 'hinge@right', 'latch@left']);
    const hinges = withDoor.accessories.filter((a) => a.kind === 'hinge');
    // Opening from y 40 to 640 on uprights starting at y 0: 15 % and 85 % up.
    expect(hinges.map((h) => h.along)).toEqual([130, 550]);
  });

  it('does not change its input and is undone by removing the leaf', () => {
    expect(design.panels).toHaveLength(0);
    const after = removeParts(withDoor, [withDoor.panels[0].id]);
    expect(after.panels).toEqual([]);
    expect(after.accessories).toEqual([]);
  });

  it('refuses a door sheet thicker than 20 mm', () => {
    expect(() => addHingedDoor(design, { opening, materialId: 'plywood', thickness: 25 })).toThrow(/at most 20 mm thick/);
  });
});

import { describe, expect, it } from 'vitest';
import { designDocumentSchema, type DesignDocument } from '@/domain/design/schema';
import { snapPoint, type SnapCatalogue } from '@/features/editor/snapping/snap';
import { drawTarget } from '@/features/editor/snapping/drawTarget';
import { gridStepsFor, roundToStep, unitIncrement } from '@/features/editor/snapping/steps';

const catalogue: SnapCatalogue = {
  variants: [
    { id: 'sq40', width: 40, height: 40 },
    { id: 'rect40x80', width: 40, height: 80 },
  ],
};

function design(profiles: { id: string; variantId?: string; start: [number, number, number]; direction: [number, number, number]; length: number }[]): DesignDocument {
  return designDocumentSchema.parse({
    schemaVersion: 2,
    name: 'Snapping test frame',
    systemId: 'metric-40',
    profiles: profiles.map((p) => ({ variantId: 'sq40', ...p })),
  });
}

// A 500 mm rail along +X at the origin: its top face (y = +20) is face 3, since local y = X × Z = −Y.
const rail = design([{ id: 'rail', start: [0, 0, 0], direction: [1, 0, 0], length: 500 }]);
const down = (x: number, z: number) => ({ origin: [x, 1000, z] as [number, number, number], direction: [0, -1, 0] as [number, number, number] });

describe('snapPoint', () => {
  it('takes a profile end point within tolerance even when a face line passes closer to the pointer', () => {
    const hit = snapPoint(down(497, 0), rail, catalogue, { grid: 10, tolerance: 10 });
    expect(hit.kind).toBe('end');
    expect(hit.profileId).toBe('rail');
    expect(hit.point).toEqual([500, 0, 0]);
  });

  it('snaps to the centre line of the face under the pointer, rounded along the profile', () => {
    const hit = snapPoint(down(251.7, 3), rail, catalogue, { grid: 10, tolerance: 10, alongStep: 10 });
    expect(hit.kind).toBe('face-centre');
    expect(hit.profileId).toBe('rail');
    expect(hit.face).toBe(3);
    expect(hit.point[0]).toBeCloseTo(250, 9);
    expect(hit.point[1]).toBeCloseTo(20, 9);
    expect(hit.point[2]).toBeCloseTo(0, 9);
  });

  it('snaps to a slot line off the face centre on the wide face of a 40 x 80 profile', () => {
    const beam = design([{ id: 'beam', variantId: 'rect40x80', start: [0, 0, 0], direction: [1, 0, 0], length: 600 }]);
    // Looking at the +Z face (face 0, 80 mm tall) near its upper slot at y = +20.
    const hit = snapPoint({ origin: [300, 17, 1000], direction: [0, 0, -1] }, beam, catalogue, { grid: 10, tolerance: 6 });
    expect(hit.kind).toBe('slot-line');
    expect(hit.profileId).toBe('beam');
    expect(hit.point[1]).toBeCloseTo(20, 9);
    expect(hit.point[2]).toBeCloseTo(20, 9);
  });

  it('falls back to the millimetre grid on the floor when nothing is within tolerance', () => {
    const hit = snapPoint(down(123, 1247), rail, catalogue, { grid: 10, tolerance: 10 });
    expect(hit.kind).toBe('grid');
    expect(hit.profileId).toBeUndefined();
    expect(hit.point).toEqual([120, 0, 1250]);
  });

  it('falls back to a whole-inch grid when the units are inches', () => {
    const { minor } = gridStepsFor('in');
    // 2000 mm is 78.74 in, so the nearest whole inch is 79.
    const hit = snapPoint(down(30, 2000), rail, catalogue, { grid: minor, tolerance: 10 });
    expect(hit.kind).toBe('grid');
    expect(hit.point[0]).toBeCloseTo(25.4, 9);
    expect(hit.point[2]).toBeCloseTo(79 * 25.4, 9);
  });

  it('ignores the profiles being moved', () => {
    const hit = snapPoint(down(497, 0), rail, catalogue, { grid: 10, tolerance: 10, excludeIds: ['rail'] });
    expect(hit.kind).toBe('grid');
  });

  it('snaps a dragged point to the nearest end point in space', () => {
    const hit = snapPoint([4, -3, 2], rail, catalogue, { grid: 10, tolerance: 8 });
    expect(hit).toMatchObject({ kind: 'end', profileId: 'rail', point: [0, 0, 0] });
  });
});

describe('drawTarget', () => {
  const empty = design([]);

  it('follows the world axis the pointer moves along and rounds the length to the step', () => {
    const target = drawTarget([0, 0, 0], down(437.4, 12), empty, catalogue, { step: 1, tolerance: 5, grid: 10 });
    expect(target.axisIndex).toBe(0);
    expect(target.direction).toEqual([1, 0, 0]);
    expect(target.length).toBe(437);
    expect(target.end).toEqual([437, 0, 0]);
  });

  it('draws downwards along minus Z when the pointer goes that way', () => {
    const target = drawTarget([0, 0, 0], down(8, -300.2), empty, catalogue, { step: 1, tolerance: 5, grid: 10 });
    expect(target.direction).toEqual([0, 0, -1]);
    expect(target.length).toBe(300);
  });

  it('draws a vertical post when the pointer rises above the first point in a front view', () => {
    const target = drawTarget([0, 0, 0], { origin: [5, 600, 2000], direction: [0, 0, -1] }, empty, catalogue, { step: 1, tolerance: 5, grid: 10 });
    expect(target.axisIndex).toBe(1);
    expect(target.length).toBe(600);
  });

  it('rounds to a sixteenth of an inch in inch units', () => {
    const step = unitIncrement('in');
    expect(step).toBeCloseTo(1.5875, 12);
    const target = drawTarget([0, 0, 0], down(100, 0), empty, catalogue, { step, tolerance: 1, grid: 25.4 });
    expect(target.length).toBeCloseTo(63 * 1.5875, 9);
  });

  it('ends exactly at another profile end the pointer passes near', () => {
    const target = drawTarget([0, 0, 0], down(497, 3), rail, catalogue, { step: 10, tolerance: 8, grid: 10 });
    expect(target.kind).toBe('end');
    expect(target.length).toBe(500);
  });
});

describe('drawTarget snapping', () => {
  it('ignores an end point that lies off the drawing line', () => {
    // The rail's far end (500, 0, 0) is under the pointer, but the line from (0, 0, 300) along X passes 300 mm away.
    const target = drawTarget([0, 0, 300], { origin: [497, 1000, 0], direction: [0, -1, 0] }, rail, catalogue, { step: 1, tolerance: 8, grid: 10 });
    expect(target.kind).toBe('step');
  });
});

describe('roundToStep', () => {
  it('rounds millimetres to whole steps without producing minus zero', () => {
    expect(roundToStep(14.9, 10)).toBe(10);
    expect(Object.is(roundToStep(-0.2, 10), 0)).toBe(true);
  });
});

import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { boxPenetration, type Box } from '@/domain/geometry/box';
import { profileBoundingBox, sectionAxes, faceNormal, profileEndPoint } from '@/domain/geometry/profileGeometry';
import { panelBox } from '@/domain/geometry/panelGeometry';
import { UniformGrid } from '@/domain/geometry/spatialGrid';

const boxArb = fc
  .tuple(
    fc.integer({ min: -2000, max: 2000 }),
    fc.integer({ min: -2000, max: 2000 }),
    fc.integer({ min: -2000, max: 2000 }),
    fc.integer({ min: 1, max: 900 }),
    fc.integer({ min: 1, max: 900 }),
    fc.integer({ min: 1, max: 900 }),
  )
  .map(([x, y, z, w, h, d]): Box => ({ minX: x, minY: y, minZ: z, maxX: x + w, maxY: y + h, maxZ: z + d }));

const near = (a: Box, b: Box, m: number) =>
  a.minX <= b.maxX + 2 * m && b.minX <= a.maxX + 2 * m && a.minY <= b.maxY + 2 * m && b.minY <= a.maxY + 2 * m && a.minZ <= b.maxZ + 2 * m && b.minZ <= a.maxZ + 2 * m;

describe('uniform grid', () => {
  it('finds exactly the pairs of boxes that a comparison of all pairs finds, each once', () => {
    fc.assert(
      fc.property(fc.array(boxArb, { maxLength: 120 }), fc.constantFrom(0, 0.5), fc.option(fc.integer({ min: 5, max: 3000 }), { nil: undefined }), (boxes, margin, cellSize) => {
        const grid = new UniformGrid(boxes, { margin, cellSize });
        const found: string[] = [];
        grid.forEachNearPair((i, j) => found.push(`${i}-${j}`));
        const expected: string[] = [];
        for (let i = 0; i < boxes.length; i++) for (let j = i + 1; j < boxes.length; j++) if (near(boxes[i], boxes[j], margin)) expected.push(`${i}-${j}`);
        expect(found.sort()).toEqual(expected.sort());
      }),
      { numRuns: 150 },
    );
  });

  it('answers a box query with each nearby box once', () => {
    fc.assert(
      fc.property(fc.array(boxArb, { maxLength: 80 }), boxArb, (boxes, query) => {
        const grid = new UniformGrid(boxes);
        const found: number[] = [];
        grid.forEachNear(query, (i) => found.push(i));
        const expected = boxes.map((b, i) => (near(b, query, 0) ? i : -1)).filter((i) => i >= 0);
        expect(found.sort((a, b) => a - b)).toEqual(expected);
      }),
    );
  });
});

describe('profile geometry', () => {
  it('puts the 80 mm side of a 40 x 80 profile along X at roll 0 vertical, and horizontal at roll 90', () => {
    const upright = profileBoundingBox({ start: [0, 0, 0], direction: [1, 0, 0], length: 1000, rollDeg: 0 }, 40, 80);
    expect(upright).toEqual({ minX: 0, maxX: 1000, minY: -40, maxY: 40, minZ: -20, maxZ: 20 });
    const flat = profileBoundingBox({ start: [0, 0, 0], direction: [1, 0, 0], length: 1000, rollDeg: 90 }, 40, 80);
    expect(flat).toEqual({ minX: 0, maxX: 1000, minY: -20, maxY: 20, minZ: -40, maxZ: 40 });
  });

  it('uses world X as the width axis for a vertical profile at roll 0', () => {
    const axes = sectionAxes([0, 1, 0], 0);
    expect(axes.u).toEqual([1, 0, 0]);
    expect(faceNormal(axes, 2)).toEqual([-1, 0, 0]);
    const box = profileBoundingBox({ start: [100, 0, 100], direction: [0, 1, 0], length: 500 }, 40, 80);
    expect(box).toEqual({ minX: 80, maxX: 120, minY: 0, maxY: 500, minZ: 60, maxZ: 140 });
  });

  it('finds the end point along a downward profile', () => {
    expect(profileEndPoint({ start: [0, 900, 0], direction: [0, -1, 0], length: 900 }, 'end')).toEqual([0, 0, 0]);
  });

  it('measures penetration as the smallest overlap of the three axes', () => {
    const a: Box = { minX: 0, minY: 0, minZ: 0, maxX: 100, maxY: 40, maxZ: 40 };
    expect(boxPenetration(a, { ...a, minX: 90, maxX: 200 })).toBe(10);
    expect(boxPenetration(a, { ...a, minX: 100, maxX: 200 })).toBe(0);
    expect(boxPenetration(a, { ...a, minX: 150, maxX: 200 })).toBe(-50);
  });

  it('sizes a panel box by its normal: width and height on the other axes in x, y, z order', () => {
    expect(panelBox([0, 0, 0], 'x', 200, 100, 6)).toEqual({ minX: -3, maxX: 3, minY: -100, maxY: 100, minZ: -50, maxZ: 50 });
  });
});

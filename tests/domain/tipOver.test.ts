import { describe, expect, it } from 'vitest';
import { tipOverAngleDegrees, tipOverForce } from '@/domain/structure/tipOver';
import fc from 'fast-check';
import { convexHull, convexHullXZ } from '@/domain/checks/footprint';

describe('tipOverForce (statics, F = W·d/h; derived, no published figure)', () => {
  it('needs 100 N at 1.5 m to tip 600 N whose centre of mass is 250 mm inside the edge', () => {
    expect(tipOverForce({ weight: 600, leverArm: 250, pushHeight: 1500 })).toBeCloseTo(100, 12);
  });

  it('balances moments: the push moment equals the restoring moment', () => {
    const weight = 812;
    const leverArm = 333;
    const pushHeight = 1234;
    const force = tipOverForce({ weight, leverArm, pushHeight });
    expect(force * pushHeight).toBeCloseTo(weight * leverArm, 9);
  });

  it('halves when the push is twice as high', () => {
    const low = tipOverForce({ weight: 500, leverArm: 300, pushHeight: 600 });
    const high = tipOverForce({ weight: 500, leverArm: 300, pushHeight: 1200 });
    expect(high).toBeCloseTo(low / 2, 12);
  });

  it('gives no resistance when the centre of mass is already outside the edge, and refuses a zero push height', () => {
    expect(tipOverForce({ weight: 500, leverArm: -10, pushHeight: 600 })).toBe(0);
    expect(() => tipOverForce({ weight: 500, leverArm: 300, pushHeight: 0 })).toThrow();
  });

  it('tips statically at 45° when the centre of mass is as high as it is inside the edge', () => {
    expect(tipOverAngleDegrees({ leverArm: 400, centreOfMassHeight: 400 })).toBeCloseTo(45, 12);
  });
});

describe('the footprint hull of many feet', () => {
  // The analysis builds the footprint from number lists and, for finite points, keeps only each
  // x column's lowest and highest point before the monotone chain (feet stand in rows). The
  // reference is the plain monotone chain (`convexHull`, Andrew's algorithm): both must give the
  // same corners in the same order, repeated and collinear points included.
  const coordinate = fc.oneof(fc.integer({ min: -5, max: 5 }), fc.constantFrom(0.5, -2.25, 1e-9, 1000, 0.1 + 0.2));
  const point = fc.tuple(coordinate, coordinate);

  it('gives the corners the plain monotone chain gives (property)', () => {
    fc.assert(
      fc.property(fc.array(point, { maxLength: 60 }), (points) => {
        const lists = { x: points.map((p) => p[0]), z: points.map((p) => p[1]) };
        expect(convexHullXZ(lists)).toEqual(convexHull(points.map((p) => [p[0], p[1]] as [number, number])));
      }),
      { numRuns: 2000 },
    );
  });

  it('keeps the reference path for −0 and non-finite numbers', () => {
    const points: [number, number][] = [[-0, 0], [1, 0], [0, 1], [1, 1], [Number.NaN, 2]];
    expect(convexHullXZ({ x: points.map((p) => p[0]), z: points.map((p) => p[1]) })).toEqual(convexHull(points));
  });
});

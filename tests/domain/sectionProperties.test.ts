import { describe, expect, it } from 'vitest';
import {
  circlePolygon,
  circleSection,
  hollowCircleSection,
  hollowRectangleSection,
  polygonSectionProperties,
  principalSecondMoments,
  rectanglePolygon,
  rectangleSection,
  type Polygon,
} from '@/domain/structure/sectionProperties';

const reversed = (polygon: Polygon): Polygon => [...polygon].reverse();

describe('polygonSectionProperties', () => {
  it('matches the closed forms for a solid rectangle (A = bh, I = bh³/12; any mechanics of materials text)', () => {
    const section = polygonSectionProperties(rectanglePolygon(30, 50));
    const closed = rectangleSection(30, 50);
    expect(section.area).toBeCloseTo(1500, 9);
    expect(section.ix).toBeCloseTo((30 * 50 ** 3) / 12, 6);
    expect(section.iy).toBeCloseTo((50 * 30 ** 3) / 12, 6);
    expect(section.sx).toBeCloseTo(closed.sx, 6);
    expect(section.sy).toBeCloseTo(closed.sy, 6);
    expect(section.rx).toBeCloseTo(closed.rx, 9);
    expect(section.ixy).toBeCloseTo(0, 6);
  });

  it('reproduces the 8/5 mm square tube worked example: A 39, I 289.25, S 72.3125, r 2.7234 (check-values.md, verified)', () => {
    const section = polygonSectionProperties(rectanglePolygon(8, 8), [rectanglePolygon(5, 5)]);
    expect(section.area).toBeCloseTo(39, 9);
    expect(section.ix).toBeCloseTo(289.25, 9);
    expect(section.iy).toBeCloseTo(289.25, 9);
    expect(section.sx).toBeCloseTo(72.3125, 9);
    expect(section.rx).toBeCloseTo(2.7234, 4);
    const closed = hollowRectangleSection(8, 8, 5, 5);
    expect(closed.ix).toBeCloseTo(289.25, 9);
    expect(closed.sx).toBeCloseTo(72.3125, 9);
  });

  it('reproduces the 305×305 mm, 12.7 mm wall hollow section: I = 211.845×10⁶ mm⁴ (check-values.md, verified)', () => {
    const inner = 305 - 2 * 12.7;
    const section = polygonSectionProperties(rectanglePolygon(305, 305), [rectanglePolygon(inner, inner)]);
    expect(section.ix / 1e6).toBeCloseTo(211.845, 3);
    expect(hollowRectangleSection(305, 305, inner, inner).ix / 1e6).toBeCloseTo(211.845, 3);
  });

  it('gives the 40×40×2 mm tube A = 304 mm², I = 73,365 mm⁴, S = 3,668 mm³ (derived from the closed form, no published figure)', () => {
    const section = polygonSectionProperties(rectanglePolygon(40, 40), [rectanglePolygon(36, 36)]);
    expect(section.area).toBeCloseTo(304, 9);
    expect(section.ix).toBeCloseTo((40 ** 4 - 36 ** 4) / 12, 6);
    expect(Math.round(section.ix)).toBe(73365);
    expect(Math.round(section.sx)).toBe(3668);
  });

  it('gives the same answer for either winding of outline and holes', () => {
    const outline = rectanglePolygon(40, 80, 5, -3);
    const hole = rectanglePolygon(10, 20, 5, 10);
    const a = polygonSectionProperties(outline, [hole]);
    const b = polygonSectionProperties(reversed(outline), [hole]);
    const c = polygonSectionProperties(outline, [reversed(hole)]);
    for (const other of [b, c]) {
      expect(other.area).toBeCloseTo(a.area, 9);
      expect(other.ix).toBeCloseTo(a.ix, 6);
      expect(other.iy).toBeCloseTo(a.iy, 6);
      expect(other.centroid.y).toBeCloseTo(a.centroid.y, 9);
    }
    expect(a.area).toBeCloseTo(40 * 80 - 10 * 20, 9);
  });

  it('moves the centroid away from an off-centre hole and uses the far fibre for the section modulus', () => {
    // 40 × 80 solid with a 10 × 20 hole centred 13 mm above the middle: parallel axis theorem by hand.
    const section = polygonSectionProperties(rectanglePolygon(40, 80), [rectanglePolygon(10, 20, 0, 13)]);
    const area = 3200 - 200;
    const cy = (0 - 200 * 13) / area;
    const ix = (40 * 80 ** 3) / 12 + 3200 * cy ** 2 - ((10 * 20 ** 3) / 12 + 200 * (13 - cy) ** 2);
    expect(section.centroid.y).toBeCloseTo(cy, 9);
    expect(section.ix).toBeCloseTo(ix, 5);
    expect(section.sx).toBeCloseTo(ix / (40 - cy), 5);
  });

  it('finds a product of area for an L-shape and principal axes that straddle it', () => {
    const angle: Polygon = [
      [0, 0],
      [50, 0],
      [50, 5],
      [5, 5],
      [5, 50],
      [0, 50],
    ];
    const section = polygonSectionProperties(angle);
    expect(section.area).toBeCloseTo(50 * 5 + 45 * 5, 9);
    expect(section.ixy).toBeLessThan(0); // both legs lie on the far side of the centroid from each other
    const principal = principalSecondMoments(section);
    expect(principal.major).toBeGreaterThan(section.ix);
    expect(principal.minor).toBeLessThan(section.iy);
    expect(principal.major + principal.minor).toBeCloseTo(section.ix + section.iy, 6);
  });

  it('approaches the circle and tube closed forms (I = πd⁴/64, π(D⁴ − d⁴)/64) with a 256-sided polygon', () => {
    const solid = polygonSectionProperties(circlePolygon(50, 256));
    expect(solid.area / circleSection(50).area).toBeCloseTo(1, 9);
    expect(solid.ix / circleSection(50).ix).toBeCloseTo(1, 4);
    const tube = polygonSectionProperties(circlePolygon(50, 256), [circlePolygon(40, 256)]);
    expect(tube.ix / hollowCircleSection(50, 40).ix).toBeCloseTo(1, 4);
    expect(hollowCircleSection(50, 40).ix).toBeCloseTo((Math.PI * (50 ** 4 - 40 ** 4)) / 64, 6);
  });

  it('refuses an outline with no area', () => {
    expect(() =>
      polygonSectionProperties([
        [0, 0],
        [1, 1],
        [2, 2],
      ]),
    ).toThrow(/positive area/);
  });
});

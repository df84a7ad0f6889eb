import { describe, expect, it } from 'vitest';
import { beamResponse, type BeamCase } from '@/domain/structure/beams';

const tube = { elasticModulus: 69_000, secondMoment: (40 ** 4 - 36 ** 4) / 12, sectionModulus: (40 ** 4 - 36 ** 4) / 12 / 20 };

describe('beamResponse (AWC Design Aid 6 formulas, as listed in check-values.md)', () => {
  it('gives 0.1667 mm for 1,000 N at mid-span of a 4 m simple span, E 200 GPa, I 4×10⁷ mm⁴ (published worked example, verified)', () => {
    const result = beamResponse({ case: 'simple-centre-point', span: 4000, load: 1000, elasticModulus: 200_000, secondMoment: 4e7, sectionModulus: 1 });
    expect(result.maxDeflection).toBeCloseTo(0.1667, 4);
    expect(result.maxMoment).toBeCloseTo(1000 * 4000 / 4, 6);
  });

  it.each<[BeamCase, number, number]>([
    // 40×40×2 tube, E 69 GPa, L 1 m (derived example in check-values.md, computed from the formulas)
    ['simple-centre-point', 500, 2.06],
    ['simple-uniform', 500, 1.29],
    ['cantilever-end-point', 500, 32.9],
    ['fixed-centre-point', 500, 0.514],
  ])('gives the derived 40×40×2 tube deflection for %s, %f N: %f mm (derived)', (beamCase, load, expected) => {
    const result = beamResponse({ case: beamCase, span: 1000, load, ...tube });
    expect(result.maxDeflection).toBeCloseTo(expected, expected < 1 ? 3 : expected < 10 ? 2 : 1);
  });

  it('computes moment and stress from M = PL/4, wL²/8, PL, PL/8, wL²/12 and σ = M/S', () => {
    const span = 1000;
    const load = 500;
    const expectedMoments: Record<BeamCase, number> = {
      'simple-centre-point': (load * span) / 4,
      'simple-point-at': (load * span) / 4,
      'simple-uniform': (load * span) / 8,
      'cantilever-end-point': load * span,
      'fixed-centre-point': (load * span) / 8,
      'fixed-uniform': (load * span) / 12,
    };
    for (const [beamCase, moment] of Object.entries(expectedMoments) as [BeamCase, number][]) {
      const result = beamResponse({ case: beamCase, span, load, ...tube });
      expect(result.maxMoment).toBeCloseTo(moment, 6);
      expect(result.maxStress).toBeCloseTo(moment / tube.sectionModulus, 9);
    }
  });

  it('gives wL⁴/(384EI) for both ends fixed under a spread load, one fifth of the simple span', () => {
    const fixed = beamResponse({ case: 'fixed-uniform', span: 1000, load: 500, ...tube });
    const simple = beamResponse({ case: 'simple-uniform', span: 1000, load: 500, ...tube });
    expect(fixed.maxDeflection * 5).toBeCloseTo(simple.maxDeflection, 9);
  });

  it('reduces the off-centre point load to the mid-span case at the middle, and moves less at a quarter point', () => {
    const middle = beamResponse({ case: 'simple-point-at', span: 1000, load: 500, at: 500, ...tube });
    const centre = beamResponse({ case: 'simple-centre-point', span: 1000, load: 500, ...tube });
    expect(middle.maxDeflection).toBeCloseTo(centre.maxDeflection, 12);
    const quarter = beamResponse({ case: 'simple-point-at', span: 1000, load: 500, at: 250, ...tube });
    // AWC DA6 case 8: δmax = P·b·(L² − b²)^1.5 / (9√3·L·EI) with b = 250 mm.
    const EI = tube.elasticModulus * tube.secondMoment;
    expect(quarter.maxDeflection).toBeCloseTo((500 * 250 * (1000 ** 2 - 250 ** 2) ** 1.5) / (9 * Math.sqrt(3) * 1000 * EI), 9);
    expect(quarter.maxMoment).toBeCloseTo((500 * 250 * 750) / 1000, 9);
    const mirrored = beamResponse({ case: 'simple-point-at', span: 1000, load: 500, at: 750, ...tube });
    expect(mirrored.maxDeflection).toBeCloseTo(quarter.maxDeflection, 12);
  });

  it('finds the off-centre maximum deflection by searching the elastic curve numerically', () => {
    // Independent check: the deflection curve of a simple beam with a point load at a (x ≤ a):
    // y = P·b·x·(L² − b² − x²)/(6·L·EI), and the mirrored form beyond the load.
    const L = 1000;
    const a = 300;
    const b = L - a;
    const P = 500;
    const EI = tube.elasticModulus * tube.secondMoment;
    let largest = 0;
    for (let x = 0; x <= L; x += 0.25) {
      const y = x <= a ? (P * b * x * (L * L - b * b - x * x)) / (6 * L * EI) : (P * a * (L - x) * (L * L - a * a - (L - x) ** 2)) / (6 * L * EI);
      largest = Math.max(largest, y);
    }
    const result = beamResponse({ case: 'simple-point-at', span: L, load: P, at: a, ...tube });
    expect(result.maxDeflection).toBeCloseTo(largest, 6);
  });

  it('refuses a load position outside the span and a zero span', () => {
    expect(() => beamResponse({ case: 'simple-point-at', span: 1000, load: 1, at: 1200, ...tube })).toThrow();
    expect(() => beamResponse({ case: 'simple-centre-point', span: 0, load: 1, ...tube })).toThrow();
  });
});

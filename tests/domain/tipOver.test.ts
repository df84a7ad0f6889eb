import { describe, expect, it } from 'vitest';
import { tipOverAngleDegrees, tipOverForce } from '@/domain/structure/tipOver';

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

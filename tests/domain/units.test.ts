import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  MM_PER_INCH,
  type LengthUnit,
  formatForce,
  formatLength,
  formatMass,
  inchesToMm,
  mmToInches,
  newtonsToPoundsForce,
  parseLength,
  poundsForceToNewtons,
} from '@/domain/units';

function mmOf(text: string, unit: LengthUnit = 'mm'): number {
  const result = parseLength(text, unit);
  if (!result.ok) throw new Error(result.error);
  return result.mm;
}

describe('unit constants', () => {
  it('uses exactly 25.4 mm per inch (international yard and pound agreement, 1959; verified)', () => {
    expect(MM_PER_INCH).toBe(25.4);
    expect(inchesToMm(1)).toBe(25.4);
    expect(mmToInches(25.4)).toBe(1);
  });

  it('converts 1 lbf to 4.4482216152605 N (derived from 0.45359237 kg and 9.80665 m/s², both exact)', () => {
    expect(poundsForceToNewtons(1)).toBeCloseTo(0.45359237 * 9.80665, 12);
    expect(newtonsToPoundsForce(4.4482216152605)).toBeCloseTo(1, 12);
    expect(newtonsToPoundsForce(poundsForceToNewtons(123.4))).toBeCloseTo(123.4, 10);
  });
});

describe('parseLength', () => {
  it.each([
    ['23-7/16"', 23.4375],
    ['23 7/16 in', 23.4375],
    ['23.4375in', 23.4375],
    ['7/8"', 0.875],
    ["1' 2-1/2\"", 14.5],
    ['1 ft 2 in', 14],
    ["2'", 24],
    ["1' 6", 18],
    ['3/4 inch', 0.75],
    ['5 ½″', 5.5],
  ])('reads the inch length %s as %f in', (text, inches) => {
    expect(mmOf(text, 'mm')).toBeCloseTo(inches * 25.4, 9);
  });

  it.each([
    ['600', 'mm', 600],
    ['600 mm', 'in', 600],
    ['60 cm', 'in', 600],
    ['0.6 m', 'in', 600],
    ['595.5mm', 'mm', 595.5],
    ['.5 mm', 'mm', 0.5],
    ['12', 'in', 12 * 25.4],
    ['1 1/2', 'in', 1.5 * 25.4],
    ['23 7/16', 'in', 23.4375 * 25.4],
    ['23 7/16', 'mm', 23.4375],
  ] as const)('reads %s with default unit %s as %f mm', (text, unit, mm) => {
    expect(mmOf(text, unit)).toBeCloseTo(mm, 9);
  });

  it('keeps the sign of a negative length so callers can decide', () => {
    expect(mmOf('-12 mm')).toBe(-12);
    expect(mmOf('-1-1/2 in')).toBeCloseTo(-1.5 * 25.4, 9);
  });

  it('rejects empty input with a message that says what to type', () => {
    const result = parseLength('   ', 'mm');
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.error).toMatch(/Enter a length/);
  });

  it.each(['abc', '12 apples', '1 2', '5 mm 3', '1/2/3', '--5', '12 in 3 mm', "1' 2 mm", '1,5', 'mm'])('rejects the garbage %s with a clear message', (text) => {
    const result = parseLength(text, 'mm');
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.error).toContain(`Could not read “${text}” as a length. Try 23-7/16 in or 595 mm.`);
  });

  it('rejects a zero denominator and names the fraction', () => {
    const result = parseLength('3/0 in', 'mm');
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.error).toMatch(/3\/0/);
    expect(parseLength('2-1/0"', 'mm').ok).toBe(false);
  });
});

describe('formatLength', () => {
  it('shows 595.3125 mm as 23-7/16 in, reduced to lowest terms', () => {
    expect(formatLength(595.3125, 'in')).toBe('23-7/16 in');
  });

  it('shows whole inches and pure fractions without a stray part', () => {
    expect(formatLength(25.4 * 24, 'in')).toBe('24 in');
    expect(formatLength(25.4 * 0.875, 'in')).toBe('7/8 in');
    expect(formatLength(0, 'in')).toBe('0 in');
  });

  it('rounds to the nearest 1/16 in when asked', () => {
    expect(formatLength(25.4 * (1 + 3 / 32), 'in', { denominator: 16 })).toMatch(/^1-(1\/16|1\/8) in$/);
    expect(formatLength(25.4 * (1 + 1 / 32), 'in', { denominator: 32 })).toBe('1-1/32 in');
  });

  it('shows millimetres with up to one decimal and trims trailing zeros', () => {
    expect(formatLength(600, 'mm')).toBe('600 mm');
    expect(formatLength(595.3125, 'mm')).toBe('595.3 mm');
    expect(formatLength(595.96, 'mm')).toBe('596 mm');
    expect(formatLength(12.5, 'mm', { withUnit: false })).toBe('12.5');
  });

  it('shows decimal inches when the decimal style is asked for', () => {
    expect(formatLength(595.3125, 'in', { style: 'decimal' })).toBe('23.438 in');
  });

  it('reads back any k/32 inch length it shows, in the same form (property)', () => {
    fc.assert(
      fc.property(fc.integer({ min: -20000, max: 20000 }), (k) => {
        const mm = inchesToMm(k / 32);
        const shown = formatLength(mm, 'in');
        const read = parseLength(shown, 'mm');
        expect(read.ok).toBe(true);
        if (read.ok) {
          expect(read.mm).toBeCloseTo(mm, 9);
          expect(formatLength(read.mm, 'in')).toBe(shown);
        }
      }),
      { numRuns: 500 },
    );
  });

  it('reads back any 0.1 mm length it shows, in the same form (property)', () => {
    fc.assert(
      fc.property(fc.integer({ min: -100000, max: 100000 }), (tenths) => {
        const mm = tenths / 10;
        const shown = formatLength(mm, 'mm');
        const read = parseLength(shown, 'in');
        expect(read.ok).toBe(true);
        if (read.ok) {
          expect(read.mm).toBe(mm);
          expect(formatLength(read.mm, 'mm')).toBe(shown);
        }
      }),
      { numRuns: 500 },
    );
  });
});

describe('formatMass and formatForce', () => {
  it('shows mass in kg for millimetre users and lb for inch users (1 lb = 0.45359237 kg, exact)', () => {
    expect(formatMass(12.4, 'mm')).toBe('12.4 kg');
    expect(formatMass(0.45359237 * 10, 'in')).toBe('10 lb');
  });

  it('shows force in N, kN above 10 kN, and lbf for inch users', () => {
    expect(formatForce(850, 'mm')).toBe('850 N');
    expect(formatForce(16867, 'mm')).toBe('16.9 kN');
    expect(formatForce(poundsForceToNewtons(190), 'in')).toBe('190 lbf');
  });
});

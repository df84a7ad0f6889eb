import { describe, expect, it } from 'vitest';
import { hexKeyFor, minimumEngagementInAluminium, threadFor, type ScrewHead, type ScrewSize } from '@/domain/catalogue/fastenerStandards';

type KeyRow = [ScrewHead, ScrewSize, string, string];

// Hex keys from check-values.md; every row verified in the standard named beside it.
const inchSocket: KeyRow[] = [
  ['socket', '#8', '9/64 in', 'ASME B18.3'],
  ['socket', '#10', '5/32 in', 'ASME B18.3'],
  ['socket', '1/4', '3/16 in', 'ASME B18.3'],
  ['socket', '5/16', '1/4 in', 'ASME B18.3'],
  ['socket', '3/8', '5/16 in', 'ASME B18.3'],
  ['socket', '1/2', '3/8 in', 'ASME B18.3'],
];
const metricSocket: KeyRow[] = [
  ['socket', 'M3', '2.5 mm', 'ISO 4762'],
  ['socket', 'M4', '3 mm', 'ISO 4762'],
  ['socket', 'M5', '4 mm', 'ISO 4762'],
  ['socket', 'M6', '5 mm', 'ISO 4762'],
  ['socket', 'M8', '6 mm', 'ISO 4762'],
  ['socket', 'M10', '8 mm', 'ISO 4762'],
  ['socket', 'M12', '10 mm', 'ISO 4762'],
];
const inchLowHeads = (head: ScrewHead): KeyRow[] => [
  [head, '#8', '3/32 in', 'ASME B18.3'],
  [head, '#10', '1/8 in', 'ASME B18.3'],
  [head, '1/4', '5/32 in', 'ASME B18.3'],
  [head, '5/16', '3/16 in', 'ASME B18.3'],
  [head, '3/8', '7/32 in', 'ASME B18.3'],
  [head, '1/2', '5/16 in', 'ASME B18.3'],
];
const metricLowHeads = (head: ScrewHead, standard: string): KeyRow[] => [
  [head, 'M3', '2 mm', standard],
  [head, 'M4', '2.5 mm', standard],
  [head, 'M5', '3 mm', standard],
  [head, 'M6', '4 mm', standard],
  [head, 'M8', '5 mm', standard],
  [head, 'M10', '6 mm', standard],
  [head, 'M12', '8 mm', standard],
];

describe('hexKeyFor', () => {
  it.each([
    ...inchSocket,
    ...metricSocket,
    ...inchLowHeads('button'),
    ...metricLowHeads('button', 'ISO 7380-1'),
    ...inchLowHeads('flat'),
    ...metricLowHeads('flat', 'ISO 10642'),
  ])('a %s head %s screw takes a %s key (%s, verified)', (head, size, label, standard) => {
    const key = hexKeyFor(head, size);
    expect(key.label).toBe(label);
    expect(key.standard).toBe(standard);
  });

  it('gives inch keys in mm through 25.4 mm/in', () => {
    expect(hexKeyFor('socket', '1/4').mm).toBeCloseTo((3 / 16) * 25.4, 12);
    expect(hexKeyFor('socket', 'M8').mm).toBe(6);
  });
});

describe('threadFor', () => {
  it.each([
    ['#8', 'coarse', '#8-32', 32],
    ['#10', 'coarse', '#10-24', 24],
    ['#10', 'fine', '#10-32', 32],
    ['1/4', 'coarse', '1/4-20', 20],
    ['1/4', 'fine', '1/4-28', 28],
    ['5/16', 'coarse', '5/16-18', 18],
    ['5/16', 'fine', '5/16-24', 24],
    ['3/8', 'coarse', '3/8-16', 16],
    ['1/2', 'coarse', '1/2-13', 13],
  ] as const)('gives %s %s as %s (ASME B1.1 unified series, verified)', (size, series, designation, threadsPerInch) => {
    const thread = threadFor(size, series);
    expect(thread.designation).toBe(designation);
    expect(thread.pitchMm).toBeCloseTo(25.4 / threadsPerInch, 12);
  });

  it.each([
    ['M3', 0.5],
    ['M4', 0.7],
    ['M5', 0.8],
    ['M6', 1.0],
    ['M8', 1.25],
    ['M10', 1.5],
    ['M12', 1.75],
  ] as const)('gives %s a coarse pitch of %f mm (ISO 261/262, verified)', (size, pitch) => {
    const thread = threadFor(size);
    expect(thread.pitchMm).toBe(pitch);
    expect(thread.designation).toBe(`${size} x ${pitch}`);
    expect(thread.nominalDiameterMm).toBe(Number(size.slice(1)));
  });

  it('gives #8 and #10 major diameters of 0.164 and 0.190 in (0.060 + 0.013·N, ASME B1.1; derived)', () => {
    expect(threadFor('#8').nominalDiameterMm).toBeCloseTo(0.164 * 25.4, 12);
    expect(threadFor('#10').nominalDiameterMm).toBeCloseTo(0.19 * 25.4, 12);
  });

  it('marks fine threads outside the check list as recalled from memory', () => {
    expect(threadFor('M8', 'fine').source).toMatch(/recalled from memory/);
    expect(threadFor('1/4', 'fine').source).toMatch(/verified/);
  });

  it('asks for at least twice the nominal diameter of engagement into aluminium (common engineering guidance, partly)', () => {
    expect(minimumEngagementInAluminium('M8')).toBe(16);
  });
});

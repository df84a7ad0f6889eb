/**
 * Defects found by probing the domain core with hostile documents (issue "proof under load, faults
 * and bad input", items 1, 3 and 7). Each test failed on the code before the fix.
 */
import { describe, expect, it } from 'vitest';
import { analyzeDesign } from '@/domain/analysis/analyze';
import { MAX_FINDINGS_PER_CHECK } from '@/domain/checks/findingCap';
import { parseDesignDocument } from '@/domain/design/parse';
import { CURRENT_SCHEMA_VERSION, DESIGN_LIMITS, designDocumentSchema } from '@/domain/design/schema';
import { unsafeTextReason } from '@/domain/text/safeText';

const profile = (id: string, over: Record<string, unknown> = {}) => ({ id, variantId: 'm40-40x40', length: 500, start: [0, 0, 0], direction: [1, 0, 0], ...over });
const documentWith = (profiles: unknown[], over: Record<string, unknown> = {}) => ({ schemaVersion: CURRENT_SCHEMA_VERSION, name: 'Probe', systemId: 'metric-40', profiles, ...over });
const errorsOf = (json: unknown) => {
  const result = parseDesignDocument(json);
  return result.ok ? [] : result.errors;
};

describe('a design of many coincident profiles (defect 1)', () => {
  it('is analysed without a stack overflow, listing at most the cap per check and counting the rest', () => {
    const design = designDocumentSchema.parse(documentWith(Array.from({ length: 500 }, (_, i) => profile(`p${i}`))));
    const analysis = analyzeDesign(design, undefined, { timings: false });
    const overlaps = analysis.findings.filter((f) => f.check === 'interference');
    // 200 listed overlaps and one closing count.
    expect(overlaps).toHaveLength(MAX_FINDINGS_PER_CHECK + 1);
    const more = overlaps.find((f) => f.id === 'interference:more')!;
    expect(more.message).toMatch(/^…and at least 10,000 more overlaps not listed/);
    expect(analysis.omittedFindings).toBeGreaterThanOrEqual(10_000);
    expect(analysis.counts.error).toBeGreaterThan(10_000);
  });

  it('states the exact count when fewer than 10,000 are left out', () => {
    // 30 stacked profiles: 435 overlapping pairs, 235 of them not listed.
    const design = designDocumentSchema.parse(documentWith(Array.from({ length: 30 }, (_, i) => profile(`p${i}`))));
    const more = analyzeDesign(design).findings.find((f) => f.id === 'interference:more')!;
    expect(more.message).toMatch(/^…and 235 more overlaps not listed/);
    expect(more.data).toEqual({ omitted: 235 });
  });
});

describe('absurd numbers in a design document (defect 3)', () => {
  it.each([
    ['a length of 1e12 mm', { length: 1e12 }, 'profiles.0.length'],
    ['a length of 1e300 mm', { length: 1e300 }, 'profiles.0.length'],
    ['a length of 1e-300 mm', { length: 1e-300 }, 'profiles.0.length'],
    ['a length just over 20 m', { length: 20_000.5 }, 'profiles.0.length'],
    ['a start at 1e300 mm', { start: [1e300, 0, 0] }, 'profiles.0.start.0'],
    ['a start 100.001 m from the origin', { start: [0, -100_001, 0] }, 'profiles.0.start.1'],
    ['a roll of 1e9 degrees', { rollDeg: 1e9 }, 'profiles.0.rollDeg'],
  ])('refuses %s', (_what, over, path) => {
    expect(errorsOf(documentWith([profile('p1', over)])).map((e) => e.path)).toContain(path);
  });

  it('accepts the largest frame the limits allow: a 20 m profile starting 100 m away', () => {
    expect(errorsOf(documentWith([profile('p1', { length: DESIGN_LIMITS.maxLengthMm, start: [-DESIGN_LIMITS.maxCoordinateMm, 0, 0] })]))).toEqual([]);
  });

  it('refuses more profiles than the documented maximum', () => {
    const profiles = Array.from({ length: DESIGN_LIMITS.maxProfiles + 1 }, (_, i) => profile(`p${i}`, { start: [0, 0, i * 50] }));
    expect(errorsOf(documentWith(profiles))).toContainEqual({ path: 'profiles', message: 'At most 10,000 profiles' });
  });

  it('refuses forces above 1 MN and non-finite settings', () => {
    const loadCases = [{ id: 'lc', name: 'Shelf', loads: [{ kind: 'point', profileId: 'p1', along: 10, force: 1e12 }] }];
    expect(errorsOf(documentWith([profile('p1')], { loadCases })).map((e) => e.path)).toContain('loadCases.0.loads.0.force');
    expect(errorsOf(documentWith([profile('p1')], { settings: { stockLength: 1e300 } })).map((e) => e.path)).toContain('settings.stockLength');
  });
});

describe('names with control or invisible characters (defect 7)', () => {
  it.each([
    ['NUL', 'Frame\u0000one'],
    ['an ANSI escape', 'Frame \u001b[31mred'],
    ['a line break', 'Frame\r\nInjected: yes'],
    ['only zero-width spaces', '\u200B\u200B\u200B'],
    ['a right-to-left override', 'evil\u202Etxt.exe'],
    ['a lone surrogate', 'Frame \uD800 one'],
  ])('refuses a design name with %s', (_what, name) => {
    expect(errorsOf(documentWith([], { name })).map((e) => e.path)).toContain('name');
  });

  it('refuses the same characters in profile labels but keeps ordinary international names', () => {
    expect(errorsOf(documentWith([profile('p1', { label: 'left\u202Eleg' })])).map((e) => e.path)).toContain('profiles.0.label');
    for (const name of ['Ständer für Drucker', 'Étagère', 'Rack 東京 🛠️', 'Family 👨‍👩‍👧 shelf', 'مكتبة']) {
      expect(unsafeTextReason(name), name).toBeNull();
    }
  });

  it('keeps line breaks in notes but not other control characters', () => {
    expect(unsafeTextReason('Line one\nLine two', { multiline: true })).toBeNull();
    expect(unsafeTextReason('Bell\u0007', { multiline: true })).toMatch(/control character/);
  });
});

import { describe, expect, it } from 'vitest';
import { analyzeDesign, createAnalysisContext } from '@/domain/analysis/analyze';
import { jointByIdOf } from '@/domain/analysis/context';
import { applyOperation } from '@/domain/design/operations';
import { demoDesigns } from '@/domain/fixtures';
import { boxFrame } from './checksDesigns';

describe('analyzeDesign', () => {
  it('returns plain JSON data that survives a round trip unchanged', () => {
    const design = boxFrame({ backPanel: true, jointKind: 'concealed-connector' });
    design.loadCases = [{ id: 'lc', name: 'Shelf', support: 'simple', tipOverHeight: 900, loads: [{ kind: 'point', profileId: 'RXF-top', along: 300, force: 400, direction: [0, -1, 0] }] }];
    const analysis = analyzeDesign(design);
    expect(JSON.parse(JSON.stringify(analysis))).toEqual(analysis);
    expect(Object.keys(analysis.timingsMs ?? {})).toContain('interference');
  });

  it('counts findings by severity and lists errors first', () => {
    const design = boxFrame({ backPanel: true, panelThickness: 3 });
    design.accessories = design.accessories.filter((a) => a.id !== 'L2-cap');
    design.profiles.push({ ...design.profiles.find((p) => p.id === 'RXF-low')!, id: 'STRAY', start: [40, 130, 20] });
    const analysis = analyzeDesign(design);
    for (const severity of ['error', 'warning', 'note'] as const) {
      expect(analysis.counts[severity]).toBe(analysis.findings.filter((f) => f.severity === severity).length);
    }
    expect(analysis.counts.error).toBeGreaterThan(0);
    const order = analysis.findings.map((f) => ['error', 'warning', 'note'].indexOf(f.severity));
    expect(order).toEqual([...order].sort((a, b) => a - b));
  });

  it('offers fixes that apply to the design without throwing', () => {
    const design = boxFrame({ backPanel: true, panelThickness: 12, jointKind: 'concealed-connector' });
    design.accessories = design.accessories.filter((a) => a.id !== 'L3-cap');
    design.profiles = design.profiles.map((p) => (p.id === 'RZL-top' ? { ...p, machining: [] } : p));
    const withFixes = analyzeDesign(design).findings.filter((f) => f.fix);
    expect(withFixes.length).toBeGreaterThanOrEqual(3);
    for (const f of withFixes) expect(() => applyOperation(design, f.fix!.operation)).not.toThrow();
  });

  it('analyses an empty design without findings', () => {
    const design = boxFrame();
    const empty = { ...design, profiles: [], joints: [], accessories: [] };
    const analysis = analyzeDesign(empty);
    expect(analysis.findings).toEqual([]);
    expect(analysis.bom).toEqual([]);
    expect(analysis.mass.total).toBe(0);
  });
});

describe('the demo designs', () => {
  it('are there to check', () => {
    expect(demoDesigns.length).toBeGreaterThanOrEqual(3);
  });

  for (const design of demoDesigns) {
    it(`raise no joint, panel-fit, interference or sequence errors: ${design.name}`, () => {
      const analysis = analyzeDesign(design);
      const geometric = analysis.findings.filter((f) => f.check !== 'structure' && f.severity !== 'note');
      expect(geometric).toEqual([]);
      expect(analysis.structure).toHaveLength(design.loadCases.length);
      expect(analysis.cutList).toHaveLength(design.profiles.length);
    });
  }
});

describe('the analysis context', () => {
  it('is plain data fields only: an accessor on it makes the engine keep every context in hash-table mode', () => {
    // Engine behaviour measured here (DEVELOPERS.md, "Analysis speed"): an object literal with a
    // getter is built in dictionary mode, so every ctx.x read in every check became a look-up.
    const ctx = createAnalysisContext(boxFrame());
    const accessors = Object.entries(Object.getOwnPropertyDescriptors(ctx))
      .filter(([, d]) => d.get !== undefined || d.set !== undefined)
      .map(([name]) => name);
    expect(accessors).toEqual([]);
    expect(jointByIdOf(ctx).size).toBe(ctx.design.joints.length);
    expect(jointByIdOf(ctx)).toBe(jointByIdOf(ctx));
  });
});

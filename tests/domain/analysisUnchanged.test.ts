/**
 * The analysis gives the same output, to the byte, before and after speed work: each golden
 * design's whole analysis (findings, BOM, cut list, stock plans, tools, mass, cost, structure)
 * is hashed and compared with the stored snapshot. A deliberate change of the analysis output
 * updates the snapshot with `npx vitest run tests/domain/analysisUnchanged.test.ts -u`, and the
 * commit says why.
 */
import { createHash } from 'node:crypto';
import { describe, expect, it } from 'vitest';
import { analyzeDesign } from '@/domain/analysis/analyze';
import { canonicalJson, comparableAnalysis, goldenCases } from './analysisGoldenCases';

describe('the analysis output of the golden designs', () => {
  for (const golden of goldenCases) {
    it(`is unchanged: ${golden.name}`, () => {
      const design = golden.design();
      const analysis = analyzeDesign(design);
      const json = canonicalJson(comparableAnalysis(analysis));
      expect({
        profiles: design.profiles.length,
        findings: analysis.findings.length,
        counts: analysis.counts,
        bomLines: analysis.bom.length,
        cutItems: analysis.cutList.length,
        sha256: createHash('sha256').update(json).digest('hex'),
      }).toMatchSnapshot();
    });
  }

  it('does not depend on a previous analysis of the same design (no state kept between runs)', () => {
    const design = goldenCases.find((c) => c.name.startsWith('box frame, faults'))!.design();
    const first = canonicalJson(comparableAnalysis(analyzeDesign(design)));
    analyzeDesign(goldenCases[0].design());
    expect(canonicalJson(comparableAnalysis(analyzeDesign(design)))).toBe(first);
  });
});

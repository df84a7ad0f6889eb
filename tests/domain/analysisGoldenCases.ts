/**
 * Designs whose whole analysis is pinned by `analysisUnchanged.test.ts`: the demo designs, small
 * hand-built frames with faults (missing caps, a stray rail, thin and thick panels, loads), the
 * generated floor frames of the analysis benchmark at 500, 2,000 and 8,000 profiles, and a pile of
 * coincident profiles whose findings are capped. Speed work on the analysis must leave every
 * output of these byte-for-byte equal.
 */
import type { DesignAnalysis } from '@/domain/analysis/types';
import type { DesignDocument } from '@/domain/design/schema';
import { demoDesigns } from '@/domain/fixtures';
import { largeFrame } from '../../bench/largeFrame';
import { boxFrame, translateDesign } from './checksDesigns';

export interface GoldenCase {
  name: string;
  design: () => DesignDocument;
}

function faultyBox(): DesignDocument {
  const design = boxFrame({ backPanel: true, panelThickness: 3 });
  design.accessories = design.accessories.filter((a) => a.id !== 'L2-cap');
  design.profiles.push({ ...design.profiles.find((p) => p.id === 'RXF-low')!, id: 'STRAY', start: [40, 130, 20] });
  return design;
}

function loadedConcealed(): DesignDocument {
  const design = boxFrame({ backPanel: true, panelThickness: 12, jointKind: 'concealed-connector' });
  design.accessories = design.accessories.filter((a) => a.id !== 'L3-cap');
  design.profiles = design.profiles.map((p) => (p.id === 'RZL-top' ? { ...p, machining: [] } : p));
  design.loadCases = [{ id: 'lc', name: 'Shelf', support: 'simple', tipOverHeight: 900, loads: [{ kind: 'point', profileId: 'RXF-top', along: 300, force: 400, direction: [0, -1, 0] }] }];
  return design;
}

function coincident(n: number): DesignDocument {
  const base = boxFrame();
  return {
    ...base,
    name: 'Stacked',
    joints: [],
    accessories: [],
    panels: [],
    profiles: Array.from({ length: n }, (_, i) => ({ id: `p${i}`, variantId: 'm40-40x40', length: 500, start: [0, 0, 0], direction: [1, 0, 0], rollDeg: 0, machining: [] })),
  };
}

export const goldenCases: GoldenCase[] = [
  ...demoDesigns.map((d) => ({ name: `demo: ${d.name}`, design: () => structuredClone(d) })),
  { name: 'box frame, corner brackets', design: () => boxFrame() },
  { name: 'box frame, faults and a stray rail', design: faultyBox },
  { name: 'box frame, concealed connectors, thick panel, a load', design: loadedConcealed },
  { name: 'box frame moved far from the origin', design: () => translateDesign(boxFrame({ backPanel: true }), [12_345.5, 0, -8_000.25]) },
  { name: 'generated frame, 500 profiles', design: () => largeFrame({ profiles: 500, overlapEvery: 25 }) },
  { name: 'generated frame, 2,000 profiles, no overlaps', design: () => largeFrame({ profiles: 2000 }) },
  { name: 'generated frame, 8,000 profiles', design: () => largeFrame({ profiles: 8000, overlapEvery: 25 }) },
  { name: '300 coincident profiles (capped findings)', design: () => coincident(300) },
];

/** JSON with object keys sorted, so a change of key order alone is not a change of output. */
export function canonicalJson(value: unknown): string {
  return JSON.stringify(value, (_key, v: unknown) => {
    if (v && typeof v === 'object' && !Array.isArray(v)) {
      const sorted: Record<string, unknown> = {};
      for (const k of Object.keys(v as object).sort()) sorted[k] = (v as Record<string, unknown>)[k];
      return sorted;
    }
    return v;
  });
}

/** The analysis without its stage timings (the only part that differs between runs). */
export function comparableAnalysis(analysis: DesignAnalysis): Omit<DesignAnalysis, 'timingsMs'> {
  const { timingsMs: _timings, ...rest } = analysis;
  return rest;
}

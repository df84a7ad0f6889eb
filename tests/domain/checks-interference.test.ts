import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { createAnalysisContext } from '@/domain/analysis/analyze';
import { interferenceFindings, interferenceFindingsAllPairs } from '@/domain/checks/interferenceFindings';
import { designDocumentSchema, CURRENT_SCHEMA_VERSION } from '@/domain/design/schema';

const axisDirections = [
  [1, 0, 0],
  [0, 1, 0],
  [0, 0, 1],
  [-1, 0, 0],
  [0, -1, 0],
  [0, 0, -1],
] as const;

const profileArb = fc.record({
  start: fc.tuple(fc.integer({ min: 0, max: 40 }), fc.integer({ min: 0, max: 40 }), fc.integer({ min: 0, max: 40 })).map((t) => t.map((v) => v * 20) as [number, number, number]),
  direction: fc.constantFrom(...axisDirections),
  length: fc.integer({ min: 40, max: 900 }),
  variantId: fc.constantFrom('m40-40x40', 'm40-40x80', 'm20-20x20'),
  rollDeg: fc.constantFrom(0, 90),
});

const panelArb = fc.record({
  center: fc.tuple(fc.integer({ min: 0, max: 800 }), fc.integer({ min: 0, max: 800 }), fc.integer({ min: 0, max: 800 })),
  normal: fc.constantFrom('x' as const, 'y' as const, 'z' as const),
  width: fc.integer({ min: 50, max: 600 }),
  height: fc.integer({ min: 50, max: 600 }),
});

describe('interference check on random designs', () => {
  it('finds the same collisions with the grid as with all pairs', () => {
    fc.assert(
      fc.property(fc.array(profileArb, { maxLength: 60 }), fc.array(panelArb, { maxLength: 8 }), fc.boolean(), (profiles, panels, withJoints) => {
        const design = designDocumentSchema.parse({
          schemaVersion: CURRENT_SCHEMA_VERSION,
          name: 'Random',
          systemId: 'metric-40',
          profiles: profiles.map((p, i) => ({ ...p, id: `P${i}`, direction: [...p.direction] })),
          panels: panels.map((p, i) => ({ id: `S${i}`, materialId: 'acrylic', thickness: 6, mounting: 'face', rect: p })),
          joints: withJoints
            ? profiles.slice(1).map((_, i) => ({ id: `J${i}`, kind: 'corner-bracket', connectorId: 'm40-corner-bracket', members: [{ profileId: `P${i}`, at: 'start' }, { profileId: `P${i + 1}`, at: 'end' }] }))
            : [],
        });
        const ctx = createAnalysisContext(design);
        expect(interferenceFindings(ctx)).toEqual(interferenceFindingsAllPairs(ctx));
      }),
      { numRuns: 120 },
    );
  });

  it('finds overlaps at all in those random designs (the comparison is not vacuous)', () => {
    const design = designDocumentSchema.parse({
      schemaVersion: CURRENT_SCHEMA_VERSION,
      name: 'Crossing',
      systemId: 'metric-40',
      profiles: [
        { id: 'A', variantId: 'm40-40x40', length: 400, start: [0, 0, 0], direction: [1, 0, 0] },
        { id: 'B', variantId: 'm40-40x40', length: 400, start: [200, -200, 0], direction: [0, 1, 0] },
      ],
    });
    const found = interferenceFindings(createAnalysisContext(design));
    expect(found.map((f) => f.partIds)).toEqual([['A', 'B']]);
    expect(found[0].data?.overlapMm).toBe(40);
  });
});

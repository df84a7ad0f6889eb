import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { analyzeDesign } from '@/domain/analysis/analyze';
import { defaultCatalogue } from '@/domain/catalogue';
import type { DesignDocument } from '@/domain/design/schema';
import { boxFrame, translateDesign } from './checksDesigns';

const frames = fc.record({
  width: fc.integer({ min: 300, max: 2000 }),
  depth: fc.integer({ min: 300, max: 1200 }),
  height: fc.integer({ min: 400, max: 2000 }),
  backPanel: fc.boolean(),
  jointKind: fc.constantFrom('corner-bracket' as const, 'concealed-connector' as const),
});

const sumQuantity = (design: DesignDocument, category: string) =>
  analyzeDesign(design).bom.filter((b) => b.category === category).reduce((s, b) => s + b.quantity, 0);

describe('bill of materials', () => {
  it('counts exactly the profiles, connectors, screws, T-nuts, panels and accessories in the design', () => {
    fc.assert(
      fc.property(frames, (o) => {
        const design = boxFrame(o);
        const bom = analyzeDesign(design).bom;
        const profileLine = bom.find((b) => b.category === 'profile')!;
        expect(profileLine.pieces).toBe(design.profiles.length);
        expect(profileLine.quantity).toBeCloseTo(design.profiles.reduce((s, p) => s + p.length, 0) / 1000, 3);
        const connector = defaultCatalogue.connectors.find((c) => c.id === design.joints[0].connectorId)!;
        const perJoint = connector.fasteners.reduce((s, f) => s + f.quantity, 0);
        expect(bom.filter((b) => b.category === 'connector').reduce((s, b) => s + b.quantity, 0)).toBe(design.joints.length);
        expect(bom.filter((b) => b.category === 'fastener').reduce((s, b) => s + b.quantity, 0)).toBe(design.joints.length * perJoint);
        expect(bom.filter((b) => b.category === 't-nut').reduce((s, b) => s + b.quantity, 0)).toBe(design.joints.length * connector.tNutCount);
        expect(bom.filter((b) => b.category === 'panel').reduce((s, b) => s + b.quantity, 0)).toBe(design.panels.length);
        expect(bom.filter((b) => b.category === 'accessory').reduce((s, b) => s + b.quantity, 0)).toBe(design.accessories.length);
        for (const line of bom) expect(line.linePrice).toBeCloseTo(line.quantity * line.unitPrice, 1);
      }),
      { numRuns: 25 },
    );
  });

  it('lists gasket by length in metres', () => {
    const design = boxFrame({ backPanel: true, panelThickness: 3 });
    design.accessories.push({ id: 'G', kind: 'gasket', partId: 'm40-panel-gasket', panelId: 'BACK', length: 2950, quantity: 1 });
    const gasket = analyzeDesign(design).bom.find((b) => b.category === 'gasket');
    expect(gasket).toMatchObject({ unit: 'm', quantity: 2.95 });
  });

  it('counts socket-head screws when the joint asks for them', () => {
    const design = boxFrame();
    design.joints = design.joints.map((j) => ({ ...j, fastenerHead: 'socket' }));
    const screws = analyzeDesign(design).bom.filter((b) => b.category === 'fastener');
    expect(screws).toHaveLength(1);
    expect(screws[0].description).toMatch(/^Socket head cap screw M8/);
    expect(sumQuantity(design, 'fastener')).toBe(32);
  });
});

describe('cut list', () => {
  it('gives every piece its profile length, the tolerance, and groups identical pieces', () => {
    fc.assert(
      fc.property(frames, (o) => {
        const design = boxFrame(o);
        const analysis = analyzeDesign(design);
        const byId = new Map(design.profiles.map((p) => [p.id, p]));
        expect(analysis.cutList).toHaveLength(design.profiles.length);
        for (const item of analysis.cutList) {
          expect(item.length).toBe(byId.get(item.id)!.length);
          expect(item.tolerance).toBe(design.settings.cutTolerance);
        }
        expect(analysis.cutGroups.reduce((s, g) => s + g.quantity, 0)).toBe(design.profiles.length);
      }),
      { numRuns: 25 },
    );
  });

  it('names end treatments and machining positions from a named end', () => {
    const analysis = analyzeDesign(boxFrame({ jointKind: 'concealed-connector' }));
    const leg = analysis.cutList.find((c) => c.id === 'L1')!;
    expect(leg.ends.start).toMatchObject({ kind: 'foot', thread: 'M8 x 1.25' });
    expect(leg.ends.end.kind).toBe('cap');
    const rail = analysis.cutList.find((c) => c.id === 'RXF-low')!;
    expect(rail.machining.map((m) => m.description)).toEqual([
      'Access counterbore Ø 10 mm on face 1, 20 mm from the left end',
      'Access counterbore Ø 10 mm on face 1, 20 mm from the right end',
    ]);
  });
});

describe('stock plan', () => {
  it('plans one set of bars per variant holding every piece', () => {
    const design = boxFrame();
    design.profiles[0] = { ...design.profiles[0], variantId: 'm40-40x80' };
    const analysis = analyzeDesign(design);
    expect(analysis.stockPlans.map((s) => s.variantId)).toEqual(['m40-40x40', 'm40-40x80']);
    const placed = analysis.stockPlans.flatMap((s) => s.plan.bars.flatMap((b) => b.cuts.map((c) => c.id))).sort();
    expect(placed).toEqual(design.profiles.map((p) => p.id).sort());
  });
});

describe('tools', () => {
  it('contains the hex key for every screw used, with its standard', () => {
    // Key sizes: ISO 7380-1 (button head M8 → 5 mm), ISO 4762 (socket head M8 → 6 mm), verified (check-values.md).
    const button = analyzeDesign(boxFrame()).tools.filter((t) => t.kind === 'hex-key');
    expect(button.map((t) => [t.size, t.standard])).toEqual([['5 mm', 'ISO 7380-1']]);
    const design = boxFrame();
    design.joints = design.joints.map((j) => ({ ...j, fastenerHead: 'socket' }));
    const socket = analyzeDesign(design).tools.filter((t) => t.kind === 'hex-key');
    expect(socket.map((t) => [t.size, t.standard])).toEqual([['6 mm', 'ISO 4762']]);
  });

  it('names the inch key from ASME B18.3 for inch screws', () => {
    // ASME B18.3, verified (check-values.md): 5/16 button head → 3/16 in; 5/16 socket head → 1/4 in.
    const design = boxFrame();
    design.profiles = design.profiles.map((p) => ({ ...p, variantId: 'in-1.5x1.5' }));
    design.joints = design.joints.map((j, i) => ({ ...j, connectorId: 'in1.5-corner-bracket', fastenerHead: i === 0 ? 'socket' : 'button' }));
    const keys = analyzeDesign(design).tools.filter((t) => t.kind === 'hex-key');
    expect(keys.map((t) => [t.size, t.standard])).toEqual([
      ['3/16 in', 'ASME B18.3'],
      ['1/4 in', 'ASME B18.3'],
    ]);
  });

  it('lists the drill for counterbores, the tap for tapped ends, a mallet for door track and the cutting kit', () => {
    const design = boxFrame({ jointKind: 'concealed-connector' });
    design.accessories.push({ id: 'T', kind: 'door-track', partId: 'm40-door-track', profileId: 'RXF-low', length: 700, quantity: 1 });
    const tools = analyzeDesign(design).tools;
    expect(tools.find((t) => t.kind === 'drill')?.size).toBe('10 mm');
    expect(tools.find((t) => t.kind === 'tap')?.size).toBe('M8 x 1.25');
    expect(tools.some((t) => t.kind === 'mallet')).toBe(true);
    expect(tools.some((t) => t.kind === 'saw')).toBe(true);
    expect(tools.some((t) => t.kind === 'square')).toBe(true);
  });
});

describe('mass and cost', () => {
  it('weighs profiles as mass per metre times length and sizes the frame from its boxes', () => {
    const design = boxFrame({ width: 800, depth: 500, height: 900 });
    const analysis = analyzeDesign(design);
    const perMetre = defaultCatalogue.variants.find((v) => v.id === 'm40-40x40')!.massPerMetre;
    const metres = design.profiles.reduce((s, p) => s + p.length, 0) / 1000;
    expect(analysis.mass.byCategory.profile).toBeCloseTo(perMetre * metres, 3);
    expect(analysis.mass.overallSize).toEqual({ x: 800, y: 900, z: 500 });
    expect(analysis.mass.centreOfMass[0]).toBeCloseTo(400, 1);
    expect(analysis.mass.total).toBeGreaterThan(analysis.mass.byCategory.profile);
  });

  it('adds up its lines to the total, in demo USD prices', () => {
    const analysis = analyzeDesign(boxFrame({ backPanel: true, jointKind: 'concealed-connector' }));
    const sum = analysis.cost.lines.reduce((s, l) => s + l.linePrice, 0);
    expect(analysis.cost.total).toBeCloseTo(sum, 2);
    expect(analysis.cost).toMatchObject({ currency: 'USD', note: 'demo prices' });
    expect(analysis.cost.lines.find((l) => l.category === 'panel')?.unit).toBe('m²');
    expect(analysis.cost.subtotalByCategory.cutting).toBeCloseTo(12 * defaultCatalogue.prices.perCut, 2);
    expect(analysis.cost.subtotalByCategory.machining).toBeGreaterThan(0);
  });
});

describe('translating a whole design', () => {
  it('changes neither its bill of materials, its findings nor its mass', () => {
    fc.assert(
      fc.property(
        frames,
        fc.tuple(fc.integer({ min: -5000, max: 5000 }), fc.integer({ min: -5000, max: 5000 }), fc.integer({ min: -5000, max: 5000 })),
        (o, offset) => {
          const design = boxFrame(o);
          design.loadCases = [{ id: 'lc', name: 'Load', support: 'simple', tipOverHeight: 800, loads: [{ kind: 'point', profileId: 'RXF-top', along: 100, force: 300, direction: [0, -1, 0] }] }];
          const a = analyzeDesign(design, undefined, { timings: false });
          const b = analyzeDesign(translateDesign(design, offset), undefined, { timings: false });
          expect(b.bom).toEqual(a.bom);
          expect(b.findings).toEqual(a.findings);
          expect(b.mass.total).toBe(a.mass.total);
          expect(b.mass.overallSize).toEqual(a.mass.overallSize);
          expect(b.structure[0].members).toEqual(a.structure[0].members);
        },
      ),
      { numRuns: 20 },
    );
  });
});

import { describe, expect, it } from 'vitest';
import { analyzeDesign } from '@/domain/analysis/analyze';
import { defaultCatalogue } from '@/domain/catalogue';
import type { Catalogue } from '@/domain/catalogue/types';
import { designDocumentSchema, type DesignDocument, type DesignDocumentInput, CURRENT_SCHEMA_VERSION } from '@/domain/design/schema';
import { beamResponse } from '@/domain/structure/beams';
import { boxFrame } from './checksDesigns';

/**
 * Derived example in check-values.md (no published figure; computed from the closed forms in
 * American Wood Council, Design Aid 6): 40 x 40 x 2 mm sharp-cornered square tube,
 * I = 73,365 mm⁴, S = 3,668 mm³, E = 69 GPa, L = 1 m.
 */
const TUBE = { ix: 73365, iy: 73365, sx: 3668, sy: 3668 };
const tubeCatalogue: Catalogue = {
  ...defaultCatalogue,
  variants: defaultCatalogue.variants.map((v) => (v.id === 'm40-40x40' ? { ...v, sectionProperties: { ...v.sectionProperties, ...TUBE } } : v)),
  alloys: defaultCatalogue.alloys.map((a) => ({ ...a, elasticModulus: 69000 })),
};

/** A 1,000 mm beam along X between two posts, joined at both ends. */
function beamOnPosts(loads: DesignDocumentInput['loadCases'], variantId = 'm40-40x40', rollDeg = 0): DesignDocument {
  return designDocumentSchema.parse({
    schemaVersion: CURRENT_SCHEMA_VERSION,
    name: 'Beam',
    systemId: 'metric-40',
    profiles: [
      { id: 'P1', variantId: 'm40-40x40', length: 600, start: [-20, 0, 0], direction: [0, 1, 0] },
      { id: 'P2', variantId: 'm40-40x40', length: 600, start: [1020, 0, 0], direction: [0, 1, 0] },
      { id: 'B', variantId, length: 1000, start: [0, 500, 0], direction: [1, 0, 0], rollDeg },
    ],
    joints: [
      { id: 'J1', kind: 'corner-bracket', connectorId: 'm40-corner-bracket', members: [{ profileId: 'B', at: 'start' }, { profileId: 'P1', at: 'span', along: 500 }] },
      { id: 'J2', kind: 'corner-bracket', connectorId: 'm40-corner-bracket', members: [{ profileId: 'B', at: 'end' }, { profileId: 'P2', at: 'span', along: 500 }] },
    ],
    loadCases: loads,
  });
}

const tubeInput = { elasticModulus: 69000, secondMoment: TUBE.ix, sectionModulus: TUBE.sx, span: 1000 };

describe('structure results for a single loaded member', () => {
  it('match beams.ts and the derived tube example for a centre load on a simple span (2.06 mm)', () => {
    const design = beamOnPosts([{ id: 'lc', name: 'Centre', loads: [{ kind: 'point', profileId: 'B', along: 500, force: 500 }] }]);
    const member = analyzeDesign(design, tubeCatalogue).structure[0].members[0];
    const direct = beamResponse({ ...tubeInput, case: 'simple-point-at', load: 500, at: 500 });
    expect(member.profileId).toBe('B');
    expect(member.span).toBe(1000);
    expect(member.maxDeflection).toBeCloseTo(direct.maxDeflection, 3);
    expect(member.maxDeflection).toBeCloseTo(2.06, 2); // check-values.md, derived
    expect(member.maxStress).toBeCloseTo(direct.maxStress, 2);
  });

  it('match the fixed-ends centre-load case when the load case says fixed (0.514 mm)', () => {
    const design = beamOnPosts([{ id: 'lc', name: 'Fixed', support: 'fixed', loads: [{ kind: 'point', profileId: 'B', along: 500, force: 500 }] }]);
    const member = analyzeDesign(design, tubeCatalogue).structure[0].members[0];
    expect(member.beamCase).toBe('fixed-centre-point');
    expect(member.maxDeflection).toBeCloseTo(0.514, 3); // check-values.md, derived
  });

  it('match the uniform-load case for load spread along the member (1.29 mm)', () => {
    const design = beamOnPosts([{ id: 'lc', name: 'Spread', loads: [{ kind: 'uniform', profileId: 'B', totalForce: 500 }] }]);
    const member = analyzeDesign(design, tubeCatalogue).structure[0].members[0];
    const direct = beamResponse({ ...tubeInput, case: 'simple-uniform', load: 500 });
    expect(member.maxDeflection).toBeCloseTo(direct.maxDeflection, 3);
    expect(member.maxDeflection).toBeCloseTo(1.29, 2); // check-values.md, derived
  });

  it('uses the strong axis of a 40 x 80 profile standing on edge and the weak axis when rolled flat', () => {
    const load: DesignDocumentInput['loadCases'] = [{ id: 'lc', name: 'Centre', loads: [{ kind: 'point', profileId: 'B', along: 500, force: 500 }] }];
    const v = defaultCatalogue.variants.find((x) => x.id === 'm40-40x80')!.sectionProperties;
    const onEdge = analyzeDesign(beamOnPosts(load, 'm40-40x80', 0)).structure[0].members[0];
    const flat = analyzeDesign(beamOnPosts(load, 'm40-40x80', 90)).structure[0].members[0];
    // At roll 0 a profile along X has its 80 mm height (local y) vertical: bending about local x.
    expect(onEdge.secondMoment).toBe(Math.round(v.ix));
    expect(flat.secondMoment).toBe(Math.round(v.iy));
    expect(flat.maxDeflection / onEdge.maxDeflection).toBeCloseTo(v.ix / v.iy, 1);
  });
});

describe('structure check', () => {
  it('warns about a shelf rail loaded past span/360', () => {
    const design = boxFrame();
    // 720 mm span, limit 2 mm; 2,500 N at mid-span on a 40 x 40 rail sags about 2.1 mm.
    design.loadCases = [{ id: 'heavy', name: 'Heavy printer', support: 'simple', loads: [{ kind: 'point', profileId: 'RXF-top', along: 360, force: 2500, direction: [0, -1, 0] }] }];
    const analysis = analyzeDesign(design);
    const member = analysis.structure[0].members[0];
    expect(member.deflectionLimit).toBeCloseTo(720 / 360, 6);
    expect(member.deflectionOk).toBe(false);
    const finding = analysis.findings.find((f) => f.id === 'structure:deflection:heavy+RXF-top');
    expect(finding?.severity).toBe('warning');
    expect(finding?.message).toContain('span/360');
  });

  it('stays quiet on a light load, and reports legs, tip-over and cautions', () => {
    const design = boxFrame();
    design.loadCases = [{ id: 'light', name: 'Light', support: 'simple', tipOverHeight: 900, loads: [{ kind: 'point', profileId: 'RXF-top', along: 360, force: 100, direction: [0, -1, 0] }] }];
    const analysis = analyzeDesign(design);
    const result = analysis.structure[0];
    expect(analysis.findings.filter((f) => f.check === 'structure' && f.severity !== 'note')).toEqual([]);
    expect(result.legs.map((l) => l.profileId).sort()).toEqual(['L1', 'L2', 'L3', 'L4']);
    // Nothing braces the box frame against racking: legs pinned at the feet, free to sway at the top (K = 2.0, AISC 360 Commentary Table C-A-7.1).
    expect(result.legs[0].endCondition).toBe('pinned-fixed-sway');
    expect(result.legs[0].effectiveLengthFactor).toBe(2);
    expect(result.legs[0].utilisation).toBeGreaterThan(0);
    expect(result.legs[0].utilisation).toBeLessThan(0.05);
    expect(result.tipOver?.force).toBeGreaterThan(0);
    expect(result.cautions.join(' ')).toMatch(/qualified engineer/);
    expect(result.cautions.join(' ')).toMatch(/Shear deflection is neglected/);
  });

  it('computes the tip-over force from the lever arm to the nearest footprint edge', () => {
    const design = boxFrame({ width: 800, depth: 500 });
    design.loadCases = [{ id: 'push', name: 'Push', support: 'simple', tipOverHeight: 1000, loads: [] }];
    const analysis = analyzeDesign(design);
    const tip = analysis.structure[0].tipOver!;
    // Symmetric frame: the centre of mass is mid-depth. The footprint runs through the feet, on the
    // legs' axes 20 mm inside the outer faces, so 250 − 20 = 230 mm from the front and back edges.
    expect(tip.footprint).toBe('feet');
    expect(tip.leverArm).toBeCloseTo(230, 0);
    expect(tip.force).toBeCloseTo((analysis.mass.total * 9.80665 * tip.leverArm) / 1000, 1);
  });

  it('reports the legs under an overloaded rail past their buckling estimate as errors', () => {
    const design = boxFrame({ height: 3000 });
    design.loadCases = [{ id: 'crush', name: 'Crush', support: 'simple', loads: [{ kind: 'uniform', profileId: 'RXF-top', totalForce: 20000 }] }];
    const legs = analyzeDesign(design).findings.filter((f) => f.id.startsWith('structure:leg-buckling'));
    // The load sits on the front top rail: by statics the two front legs carry it, the back legs only the frame.
    expect(legs).toHaveLength(2);
    expect(legs.every((f) => f.severity === 'error')).toBe(true);
  });
});

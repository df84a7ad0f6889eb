import { describe, expect, it } from 'vitest';
import {
  EUROCODE_9_ALUMINIUM,
  acrylicThicknessTolerance,
  aluminiumCompositeArealMass,
  alloys,
  getAlloy,
  getPanelMaterialSpec,
  ksiToMpa,
  mpaToKsi,
  panelMass,
  panelMaterialSpecs,
  staggeredRoundHoleOpenArea,
} from '@/domain/catalogue/materials';
import { newtonsToPoundsForce } from '@/domain/units';

describe('unit conversions for material data', () => {
  it('converts 1 ksi to 6.894757 MPa (derived from exact lbf and inch definitions)', () => {
    expect(ksiToMpa(1)).toBeCloseTo(6.894757, 6);
    expect(mpaToKsi(ksiToMpa(35))).toBeCloseTo(35, 12);
    // 1 ksi = 1000 lbf per square inch, so 6.894757 N/mm² × 645.16 mm² is 1000 lbf.
    expect(newtonsToPoundsForce(ksiToMpa(1) * 645.16)).toBeCloseTo(1000, 9);
  });

  it('matches the ksi figures ASTM B221 prints beside the MPa minimums (verified)', () => {
    expect(ksiToMpa(25)).toBeCloseTo(172, 0);
    expect(ksiToMpa(30)).toBeCloseTo(207, 0);
    expect(ksiToMpa(16)).toBeCloseTo(110, 0);
    expect(ksiToMpa(22)).toBeCloseTo(152, 0);
    expect(ksiToMpa(35)).toBeCloseTo(241, 0);
    expect(ksiToMpa(38)).toBeCloseTo(262, 0);
    expect(ksiToMpa(10_000) / 1000).toBeCloseTo(68.9, 1);
  });
});

describe('alloys', () => {
  it('gives 6063-T6 E 68.9 GPa, 2.70 g/cm³, ν 0.33 (Aluminum Association via ASM / MatWeb, verified) and 172 / 207 MPa (ASTM B221, verified)', () => {
    const alloy = getAlloy('6063-T6');
    expect(alloy).toMatchObject({ elasticModulus: 68_900, density: 2700, poissonRatio: 0.33, minYield: 172, minTensile: 207 });
  });

  it('gives 6063-T5 110 / 152 MPa to 0.5 in (ASTM B221, verified), with the 6063 family modulus and density', () => {
    const alloy = getAlloy('6063-T5');
    expect(alloy).toMatchObject({ minYield: 110, minTensile: 152, elasticModulus: 68_900, density: 2700 });
    expect(alloy.source).toMatch(/6063 family/);
  });

  it('gives 6061-T6 241 / 262 MPa (ASTM B221, verified) and says its modulus is recalled from memory', () => {
    const alloy = getAlloy('6061-T6');
    expect(alloy).toMatchObject({ minYield: 241, minTensile: 262 });
    expect(alloy.source).toMatch(/recalled from memory/);
  });

  it('gives 6105-T5 241 / 262 MPa and marks it partly sourced (ASTM B221 via a secondary source)', () => {
    const alloy = getAlloy('6105-T5');
    expect(alloy).toMatchObject({ minYield: 241, minTensile: 262 });
    expect(alloy.source).toMatch(/partly/);
  });

  it('lists exactly the four extrusion alloys and refuses an unknown one', () => {
    expect(alloys.map((alloy) => alloy.id).sort()).toEqual(['6061-T6', '6063-T5', '6063-T6', '6105-T5']);
    expect(() => getAlloy('7075-T6')).toThrow(/Unknown alloy/);
  });

  it('keeps the Eurocode 9 design values E 70,000, G 27,000 MPa, ν 0.3, α 23e-6/K, ρ 2,700 (EN 1999-1-1 §3.2.5, verified)', () => {
    expect(EUROCODE_9_ALUMINIUM).toEqual({ elasticModulus: 70_000, shearModulus: 27_000, poissonRatio: 0.3, thermalExpansionPerK: 23e-6, density: 2700 });
  });
});

describe('panel materials', () => {
  it.each([
    ['acrylic', 1160, 1200, 'verified'],
    ['polycarbonate', 1200, 1220, 'verified'],
    ['hdpe', 930, 970, 'verified'],
    ['abs', 1040, 1070, 'partly'],
    ['plywood', 500, 700, 'partly'],
    ['mdf', 500, 1000, 'partly'],
  ] as const)('gives %s a density within %i–%i kg/m³ (check-values.md, %s)', (id, low, high, status) => {
    const spec = getPanelMaterialSpec(id);
    expect(spec.density).toBeGreaterThanOrEqual(low);
    expect(spec.density).toBeLessThanOrEqual(high);
    expect(spec.source).toContain(status);
  });

  it('gives acrylic 1.18 g/cm³ (verified)', () => {
    expect(getPanelMaterialSpec('acrylic').density).toBe(1180);
  });

  it('gives 4 mm aluminium composite about 5.5 kg/m² (derived from 0.5 mm skins and a 3 mm PE core)', () => {
    expect(aluminiumCompositeArealMass()).toBeCloseTo(5.5, 1);
    const spec = getPanelMaterialSpec('acm');
    expect(panelMass(spec, 1000, 1000, 4)).toBeCloseTo(aluminiumCompositeArealMass(), 9);
  });

  it('gives perforated aluminium the solid density less its open area (geometry derived, pattern recalled from memory)', () => {
    const open = staggeredRoundHoleOpenArea(5, 8);
    expect(open).toBeCloseTo(0.354, 3);
    expect(getPanelMaterialSpec('perforated-aluminium').density).toBeCloseTo(2700 * (1 - open), 9);
    expect(getPanelMaterialSpec('perforated-aluminium').source).toMatch(/recalled from memory/);
  });

  it('has every panel material the catalogue needs, with a colour and opacity to draw it', () => {
    expect(panelMaterialSpecs.map((spec) => spec.id).sort()).toEqual(
      ['abs', 'acm', 'acrylic', 'hdpe', 'mdf', 'perforated-aluminium', 'plywood', 'polycarbonate'].sort(),
    );
    for (const spec of panelMaterialSpecs) {
      expect(spec.color).toMatch(/^#[0-9a-f]{6}$/i);
      expect(spec.opacity).toBeGreaterThan(0);
      expect(spec.opacity).toBeLessThanOrEqual(1);
      expect(spec.thicknesses.length).toBeGreaterThan(0);
    }
  });

  it('gives cast acrylic a tolerance of ±(0.4 + 0.1·t) (ISO 7823-1, verified) and extruded ±10 % / ±5 % (ISO 7823-2, partly)', () => {
    expect(acrylicThicknessTolerance(5, 'cast')).toBeCloseTo(0.9, 12);
    expect(acrylicThicknessTolerance(2, 'extruded')).toBeCloseTo(0.2, 12);
    expect(acrylicThicknessTolerance(6, 'extruded')).toBeCloseTo(0.3, 12);
  });
});

/**
 * Alloy and panel material constants, each with its source and how sure we are of it
 * ("verified", "partly", "derived", "recalled from memory", "common practice").
 * Units: MPa, kg/m³, mm.
 */

/** MPa in one ksi: 1000 lbf/in² = 4448.2216152605 N / 645.16 mm² (derived from exact definitions). */
export const MPA_PER_KSI = 4448.2216152605 / 645.16;

/** Converts ksi to MPa. */
export function ksiToMpa(ksi: number): number {
  return ksi * MPA_PER_KSI;
}

/** Converts MPa to ksi. */
export function mpaToKsi(mpa: number): number {
  return mpa / MPA_PER_KSI;
}

export interface Alloy {
  id: '6063-T5' | '6063-T6' | '6061-T6' | '6105-T5';
  name: string;
  /** MPa */
  elasticModulus: number;
  /** kg/m³ */
  density: number;
  /** MPa, ASTM B221 minimum */
  minYield: number;
  /** MPa, ASTM B221 minimum */
  minTensile: number;
  poissonRatio: number;
  source: string;
}

/** Coefficient of thermal expansion of 6063-T6, per kelvin (23.4 µm/(m·K); ASM / MatWeb, verified). */
export const ALUMINIUM_THERMAL_EXPANSION_PER_K = 23.4e-6;

/** Eurocode 9 design values for aluminium, EN 1999-1-1 §3.2.5 (verified). MPa, kg/m³, 1/K. */
export const EUROCODE_9_ALUMINIUM = {
  elasticModulus: 70_000,
  shearModulus: 27_000,
  poissonRatio: 0.3,
  thermalExpansionPerK: 23e-6,
  density: 2700,
} as const;

export const alloys: Alloy[] = [
  {
    id: '6063-T5',
    name: '6063-T5 aluminium',
    elasticModulus: 68_900,
    density: 2700,
    minYield: 110,
    minTensile: 152,
    poissonRatio: 0.33,
    source:
      'Yield 110 MPa (16 ksi) / tensile 152 MPa (22 ksi): ASTM B221 minimums up to 0.5 in thick (verified). ' +
      'Modulus, density and Poisson ratio taken as the 6063 family values (Aluminum Association data via ASM / MatWeb, verified for 6063-T6).',
  },
  {
    id: '6063-T6',
    name: '6063-T6 aluminium',
    elasticModulus: 68_900,
    density: 2700,
    minYield: 172,
    minTensile: 207,
    poissonRatio: 0.33,
    source:
      'Modulus 68.9 GPa (10,000 ksi), density 2.70 g/cm³, Poisson 0.33: Aluminum Association data via ASM / MatWeb (verified). ' +
      'Yield 172 MPa (25 ksi) / tensile 207 MPa (30 ksi): ASTM B221 minimums (verified).',
  },
  {
    id: '6061-T6',
    name: '6061-T6 aluminium',
    elasticModulus: 68_900,
    density: 2700,
    minYield: 241,
    minTensile: 262,
    poissonRatio: 0.33,
    source:
      'Yield 241 MPa (35 ksi) / tensile 262 MPa (38 ksi): ASTM B221 extrusion minimums (verified). ' +
      'Modulus 68.9 GPa, density 2.70 g/cm³ and Poisson 0.33 recalled from memory (ASM / MatWeb), not checked.',
  },
  {
    id: '6105-T5',
    name: '6105-T5 aluminium',
    elasticModulus: 68_900,
    density: 2700,
    minYield: 241,
    minTensile: 262,
    poissonRatio: 0.33,
    source:
      'Yield 241 MPa (35 ksi) / tensile 262 MPa (38 ksi) up to 0.5 in: ASTM B221 via a secondary source (partly). ' +
      'Modulus 68.9 GPa, density 2.70 g/cm³ and Poisson 0.33 recalled from memory, not checked.',
  },
];

/** The alloy with this id; throws for an unknown id. */
export function getAlloy(id: string): Alloy {
  const alloy = alloys.find((candidate) => candidate.id === id);
  if (!alloy) throw new Error(`Unknown alloy “${id}”. Known alloys: ${alloys.map((a) => a.id).join(', ')}.`);
  return alloy;
}

// ---------------------------------------------------------------------------------------------
// Panels

export interface PanelMaterialSpec {
  id: string;
  name: string;
  /** kg/m³ (an equivalent density for layered or perforated sheet) */
  density: number;
  /** mm, common sheet thicknesses */
  thicknesses: number[];
  appearance: 'clear' | 'tinted' | 'opaque' | 'perforated';
  /** hex colour for rendering, our own choice */
  color: string;
  /** 0..1 for rendering, our own choice */
  opacity: number;
  source: string;
  /** Sheet thickness tolerance ± (fixed + share·t) mm. */
  thicknessTolerance: { fixed: number; share: number; source: string };
  /** Bending modulus, MPa, for shelf sag; null when Slotwise has no figure. */
  elasticModulus: number | null;
  /** Linear thermal expansion, per kelvin. */
  thermalExpansion: number;
  /** Figures behind the three fields above. */
  mechanicalSource: string;
}

/** Aluminium composite panel build-up, 4 mm: two 0.5 mm aluminium skins on a 3 mm polyethylene core (common build-up). */
export const ACM_4MM_LAYERS = { skinThickness: 0.5, coreThickness: 3, skinDensity: 2700, coreDensity: 930 } as const;

/** Areal mass in kg/m² of the 4 mm aluminium composite panel, from its layers (derived; ~5.5 kg/m²). */
export function aluminiumCompositeArealMass(layers: typeof ACM_4MM_LAYERS = ACM_4MM_LAYERS): number {
  return (2 * layers.skinThickness * layers.skinDensity + layers.coreThickness * layers.coreDensity) / 1000;
}

/**
 * Open-area fraction of round holes of diameter d on a 60° staggered pitch p (mm in): π d² / (2√3 p²).
 * Geometry, derived; the 5 mm on 8 mm pattern below is a common one (recalled from memory).
 */
export function staggeredRoundHoleOpenArea(holeDiameter: number, pitch: number): number {
  return (Math.PI * holeDiameter ** 2) / (2 * Math.sqrt(3) * pitch ** 2);
}

export const PERFORATED_PATTERN = { holeDiameter: 5, pitch: 8 } as const;
const PERFORATED_OPEN_AREA = staggeredRoundHoleOpenArea(PERFORATED_PATTERN.holeDiameter, PERFORATED_PATTERN.pitch);
const ACM_THICKNESS = ACM_4MM_LAYERS.skinThickness * 2 + ACM_4MM_LAYERS.coreThickness;

export const panelMaterialSpecs: PanelMaterialSpec[] = [
  {
    id: 'acrylic',
    name: 'Acrylic (PMMA), clear',
    density: 1180,
    thicknesses: [3, 4.5, 5, 6, 8, 10],
    appearance: 'clear',
    color: '#cfe9ee',
    opacity: 0.3,
    source: 'Density 1.18 g/cm³ (range 1.16–1.20), verified. Thicknesses common practice, no source.',
    thicknessTolerance: { fixed: 0.4, share: 0.1, source: 'Cast acrylic, ISO 7823-1: ±(0.4 + 0.1·t) mm (check-values, verified)' },
    elasticModulus: 3200,
    thermalExpansion: 70e-6,
    mechanicalSource: 'E about 3.2 GPa and expansion about 70 µm/(m·K), from memory.',
  },
  {
    id: 'polycarbonate',
    name: 'Polycarbonate, clear',
    density: 1200,
    thicknesses: [3, 4.5, 5, 6, 8, 10],
    appearance: 'clear',
    color: '#dbe8e4',
    opacity: 0.35,
    source: 'Density 1.20–1.22 g/cm³, verified (lower end used). Thicknesses common practice, no source.',
    thicknessTolerance: { fixed: 0, share: 0.05, source: 'Extruded sheet, about ±5 % (from memory)' },
    elasticModulus: 2300,
    thermalExpansion: 65e-6,
    mechanicalSource: 'E about 2.3 GPa and expansion about 65 µm/(m·K), from memory.',
  },
  {
    id: 'hdpe',
    name: 'HDPE sheet',
    density: 950,
    thicknesses: [3, 6, 10, 12],
    appearance: 'opaque',
    color: '#ecebe4',
    opacity: 1,
    source: 'Density 0.93–0.97 g/cm³, verified (mid-range used). Thicknesses common practice, no source.',
    thicknessTolerance: { fixed: 0, share: 0.05, source: 'Extruded sheet, about ±5 % (from memory)' },
    elasticModulus: 900,
    thermalExpansion: 150e-6,
    mechanicalSource: 'E about 0.9 GPa and expansion about 150 µm/(m·K), from memory.',
  },
  {
    id: 'abs',
    name: 'ABS sheet',
    density: 1050,
    thicknesses: [2, 3, 4, 6],
    appearance: 'opaque',
    color: '#34383d',
    opacity: 1,
    source: 'Density 1.04–1.07 g/cm³, partly (secondary source; mid-range used). Thicknesses common practice, no source.',
    thicknessTolerance: { fixed: 0, share: 0.05, source: 'Extruded sheet, about ±5 % (from memory)' },
    elasticModulus: 2200,
    thermalExpansion: 80e-6,
    mechanicalSource: 'E about 2.2 GPa and expansion about 80 µm/(m·K), from memory.',
  },
  {
    id: 'acm',
    name: 'Aluminium composite panel 4 mm',
    density: (aluminiumCompositeArealMass() * 1000) / ACM_THICKNESS,
    thicknesses: [ACM_THICKNESS],
    appearance: 'opaque',
    color: '#b9bec4',
    opacity: 1,
    source:
      'Equivalent density derived from the 4 mm build-up (0.5 mm aluminium skins at 2,700 kg/m³, 3 mm PE core at 930 kg/m³ — core density recalled from memory): about 5.5 kg/m² (derived). Valid for 4 mm only.',
    thicknessTolerance: { fixed: 0.2, share: 0, source: 'About ±0.2 mm (from memory)' },
    elasticModulus: null,
    thermalExpansion: 24e-6,
    mechanicalSource: 'Composite build-up: no single modulus, so no sag estimate; expansion close to the aluminium skins, about 24 µm/(m·K), from memory.',
  },
  {
    id: 'perforated-aluminium',
    name: 'Perforated aluminium sheet',
    density: 2700 * (1 - PERFORATED_OPEN_AREA),
    thicknesses: [1, 1.5, 2],
    appearance: 'perforated',
    color: '#a9b0b7',
    opacity: 0.7,
    source:
      'Equivalent density = 2,700 kg/m³ × (1 − open area). Round 5 mm holes on an 8 mm staggered pitch (common practice, recalled from memory) give about 35 % open area (derived from the geometry).',
    thicknessTolerance: { fixed: 0.1, share: 0, source: 'About ±0.1 mm (from memory)' },
    elasticModulus: null,
    thermalExpansion: 23.4e-6,
    mechanicalSource: 'Perforations make the bending stiffness uncertain, so no sag estimate; expansion of aluminium 23.4 µm/(m·K) (6063-T6, verified).',
  },
  {
    id: 'plywood',
    name: 'Plywood',
    density: 600,
    thicknesses: [6, 9, 12, 18],
    appearance: 'opaque',
    color: '#c9a46c',
    opacity: 1,
    source: 'Density 500–700 kg/m³, partly (mid-range used; varies by species). Thicknesses common practice, no source.',
    thicknessTolerance: { fixed: 0.3, share: 0.03, source: 'About ±(0.3 + 3 %) mm (from memory; plywood thickness varies by grade)' },
    elasticModulus: 7000,
    thermalExpansion: 7e-6,
    mechanicalSource: 'E about 7 GPa along the face grain (varies 5–9 GPa by species and lay-up) and expansion about 7 µm/(m·K) in the plane, from memory.',
  },
  {
    id: 'mdf',
    name: 'MDF',
    density: 750,
    thicknesses: [6, 9, 12, 18],
    appearance: 'opaque',
    color: '#a9825a',
    opacity: 1,
    source: 'Density 500–1,000 kg/m³, partly (a typical board value used). Thicknesses common practice, no source.',
    thicknessTolerance: { fixed: 0.2, share: 0, source: 'About ±0.2 mm (from memory)' },
    elasticModulus: 3000,
    thermalExpansion: 10e-6,
    mechanicalSource: 'E about 3 GPa and expansion about 10 µm/(m·K), from memory.',
  },
];

/** The panel material with this id; throws for an unknown id. */
export function getPanelMaterialSpec(id: string): PanelMaterialSpec {
  const spec = panelMaterialSpecs.find((candidate) => candidate.id === id);
  if (!spec) throw new Error(`Unknown panel material “${id}”.`);
  return spec;
}

/** Upper thickness tolerance ± in mm of a sheet of this material and nominal thickness (mm). */
export function sheetThicknessTolerance(spec: Pick<PanelMaterialSpec, 'thicknessTolerance'>, thickness: number): number {
  return spec.thicknessTolerance.fixed + spec.thicknessTolerance.share * thickness;
}

/** Panel mass in kg from its size in mm and the material's (equivalent) density. */
export function panelMass(spec: Pick<PanelMaterialSpec, 'density'>, width: number, height: number, thickness: number): number {
  return (spec.density * width * height * thickness) / 1e9;
}

/**
 * Acrylic sheet thickness tolerance in mm (±) for a nominal thickness in mm: cast sheet ±(0.4 + 0.1·t)
 * (ISO 7823-1, verified); extruded ±10 % below 3 mm and ±5 % from 3 mm (ISO 7823-2, partly).
 */
export function acrylicThicknessTolerance(thickness: number, kind: 'cast' | 'extruded'): number {
  if (kind === 'cast') return 0.4 + 0.1 * thickness;
  return thickness < 3 ? 0.1 * thickness : 0.05 * thickness;
}

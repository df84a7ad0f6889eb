/**
 * Beam bending estimates from the closed forms in American Wood Council, Design Aid 6, "Beam
 * Formulas with Shear and Moment Diagrams" (any mechanics of materials text gives the same). Figure numbers in the comments below are recalled from memory.
 * Units: mm, N, MPa (N/mm²); moments in N·mm. Shear deflection is neglected: at T-slot spans
 * (span/depth above ~10) it is a few per cent at most.
 */

export type BeamCase =
  | 'simple-centre-point'
  | 'simple-point-at'
  | 'simple-uniform'
  | 'cantilever-end-point'
  | 'fixed-centre-point'
  | 'fixed-uniform';

export interface BeamInput {
  case: BeamCase;
  /** mm, between supports (or free length of a cantilever) */
  span: number;
  /** N; the total load for the uniform cases */
  load: number;
  /** mm from the left support, only for 'simple-point-at' (default: mid-span) */
  at?: number;
  /** MPa */
  elasticModulus: number;
  /** mm⁴, about the axis the load bends the member around */
  secondMoment: number;
  /** mm³, for that same axis */
  sectionModulus: number;
}

export interface BeamResponse {
  /** N·mm */
  maxMoment: number;
  /** mm */
  maxDeflection: number;
  /** MPa */
  maxStress: number;
}

export const BEAM_CASE_LABELS: Record<BeamCase, string> = {
  'simple-centre-point': 'Simply supported, load at mid-span',
  'simple-point-at': 'Simply supported, load at a point',
  'simple-uniform': 'Simply supported, load spread evenly',
  'cantilever-end-point': 'Cantilever, load at the free end',
  'fixed-centre-point': 'Both ends fixed, load at mid-span',
  'fixed-uniform': 'Both ends fixed, load spread evenly',
};

/** Maximum moment (N·mm), deflection (mm) and bending stress (MPa) for a beam case; inputs in mm, N, MPa, mm⁴, mm³. */
export function beamResponse(i: BeamInput): BeamResponse {
  const { span: L, load: P, elasticModulus: E, secondMoment: I, sectionModulus: S } = i;
  if (!(L > 0)) throw new Error('A beam span must be greater than 0 mm.');
  if (!(E > 0) || !(I > 0) || !(S > 0)) throw new Error('Elastic modulus, second moment and section modulus must be positive.');
  const EI = E * I;
  let maxMoment: number;
  let maxDeflection: number;
  switch (i.case) {
    case 'simple-centre-point': // AWC DA6 figure 7
      maxMoment = (P * L) / 4;
      maxDeflection = (P * L ** 3) / (48 * EI);
      break;
    case 'simple-point-at': {
      // AWC DA6 figure 8: M = Pab/L; δmax = P·b·(L² − b²)^1.5 / (9√3·L·EI), b the shorter segment.
      const a = i.at ?? L / 2;
      if (!(a >= 0 && a <= L)) throw new Error('The load position must lie between the supports.');
      const b = Math.min(a, L - a);
      maxMoment = (P * a * (L - a)) / L;
      maxDeflection = (P * b * (L * L - b * b) ** 1.5) / (9 * Math.sqrt(3) * L * EI);
      break;
    }
    case 'simple-uniform': // AWC DA6 figure 1, W = wL
      maxMoment = (P * L) / 8;
      maxDeflection = (5 * P * L ** 3) / (384 * EI);
      break;
    case 'cantilever-end-point': // AWC DA6 figure 22
      maxMoment = P * L;
      maxDeflection = (P * L ** 3) / (3 * EI);
      break;
    case 'fixed-centre-point': // AWC DA6 figure 16
      maxMoment = (P * L) / 8;
      maxDeflection = (P * L ** 3) / (192 * EI);
      break;
    case 'fixed-uniform': // AWC DA6 figure 15: moment at the supports wL²/12
      maxMoment = (P * L) / 12;
      maxDeflection = (P * L ** 3) / (384 * EI);
      break;
    default:
      throw new Error(`Unknown beam case ${(i as { case: string }).case}`);
  }
  return { maxMoment, maxDeflection, maxStress: maxMoment / S };
}

/** Deflection limit in mm for a span in mm: span/360 for shelves carrying equipment (common practice, no source). */
export function deflectionLimit(span: number, ratio = 360): number {
  return span / ratio;
}

/** Allowable bending stress in MPa: yield (MPa) divided by a safety factor (2.0 default, common practice, no source). */
export function allowableStress(minYield: number, safetyFactor = 2): number {
  return minYield / safetyFactor;
}

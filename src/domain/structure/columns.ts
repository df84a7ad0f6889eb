/**
 * Euler buckling of a straight, elastic, centrally loaded column: Pcr = π²EI/(KL)².
 * Units: mm, MPa, mm⁴ → N. Effective length factors K from AISC 360 Commentary, Table C-A-7.1.
 * Euler's load is an upper bound for slender members; short members yield or buckle locally first.
 */

export type EndCondition = 'fixed-fixed' | 'fixed-pinned' | 'pinned-pinned' | 'fixed-free' | 'fixed-sway' | 'pinned-fixed-sway';

/** K factors, theoretical and recommended design values (AISC 360 Commentary, Table C-A-7.1). */
export const EFFECTIVE_LENGTH_FACTORS: Record<EndCondition, { theoretical: number; recommended: number }> = {
  'fixed-fixed': { theoretical: 0.5, recommended: 0.65 },
  'fixed-pinned': { theoretical: 0.7, recommended: 0.8 },
  'pinned-pinned': { theoretical: 1.0, recommended: 1.0 },
  'fixed-free': { theoretical: 2.0, recommended: 2.1 },
  'fixed-sway': { theoretical: 1.0, recommended: 1.2 },
  'pinned-fixed-sway': { theoretical: 2.0, recommended: 2.0 },
};

export const END_CONDITION_LABELS: Record<EndCondition, string> = {
  'fixed-fixed': 'Both ends fixed',
  'fixed-pinned': 'One end fixed, one pinned',
  'pinned-pinned': 'Both ends pinned',
  'fixed-free': 'One end fixed, one free',
  'fixed-sway': 'Both ends fixed against rotation, free to sway',
  'pinned-fixed-sway': 'One end pinned, one fixed against rotation and free to sway',
};

/** Effective length factor K (dimensionless) for an end condition; the recommended design value unless asked otherwise. */
export function effectiveLengthFactor(endCondition: EndCondition, factor: 'theoretical' | 'recommended' = 'recommended'): number {
  const entry = EFFECTIVE_LENGTH_FACTORS[endCondition];
  if (!entry) throw new Error(`Unknown end condition ${endCondition}`);
  return entry[factor];
}

/**
 * Euler critical load in N: π²EI/(KL)², E in MPa, I in mm⁴, L in mm. K uses the recommended design
 * value by default (conservative); pass factor 'theoretical' for the textbook ideal.
 */
export function eulerCriticalLoad(i: {
  elasticModulus: number;
  secondMoment: number;
  length: number;
  endCondition: EndCondition;
  factor?: 'theoretical' | 'recommended';
}): number {
  if (!(i.length > 0)) throw new Error('A column length must be greater than 0 mm.');
  if (!(i.elasticModulus > 0) || !(i.secondMoment > 0)) throw new Error('Elastic modulus and second moment must be positive.');
  const effectiveLength = effectiveLengthFactor(i.endCondition, i.factor ?? 'recommended') * i.length;
  return (Math.PI ** 2 * i.elasticModulus * i.secondMoment) / effectiveLength ** 2;
}

/** Slenderness KL/r (dimensionless) from length and radius of gyration in mm. */
export function slendernessRatio(i: { length: number; radiusOfGyration: number; endCondition: EndCondition; factor?: 'theoretical' | 'recommended' }): number {
  return (effectiveLengthFactor(i.endCondition, i.factor ?? 'recommended') * i.length) / i.radiusOfGyration;
}

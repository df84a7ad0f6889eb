/**
 * Flexural buckling of aluminium columns and the axial + bending interaction, after EN 1999-1-1
 * (Eurocode 9) §6.3.1 and §6.3.3. Units: mm, N, MPa, N·mm.
 *
 * χ = 1 / (φ + √(φ² − λ̄²)) ≤ 1, φ = 0.5·(1 + α·(λ̄ − λ̄₀) + λ̄²), λ̄ = √(A·f₀ / N_cr)   (§6.3.1.2)
 * Buckling class A (heat-treated alloys such as 6063-T5/T6, EN 1999-1-1 Table 3.2b): α = 0.20,
 * λ̄₀ = 0.10; class B: α = 0.32, λ̄₀ = 0.00 (Table 6.6; values from memory of the standard).
 * The same form with α = 0.34, λ̄₀ = 0.2 is EN 1993-1-1's curve b, which the tests check against a
 * published worked example.
 */

export type BucklingClass = 'A' | 'B';

/** Imperfection factor α and limit of the horizontal plateau λ̄₀ (EN 1999-1-1 Table 6.6, from memory). */
export const BUCKLING_CLASS_PARAMETERS: Record<BucklingClass, { alpha: number; lambda0: number }> = {
  A: { alpha: 0.2, lambda0: 0.1 },
  B: { alpha: 0.32, lambda0: 0 },
};

/** Non-dimensional slenderness λ̄ = √(A·f₀ / N_cr); area mm², f₀ MPa, N_cr N. */
export function relativeSlenderness(i: { area: number; proofStrength: number; criticalLoad: number }): number {
  if (!(i.criticalLoad > 0)) throw new Error('The critical load must be positive.');
  return Math.sqrt((i.area * i.proofStrength) / i.criticalLoad);
}

/** Reduction factor χ (0..1) from λ̄, α and λ̄₀. */
export function bucklingReductionFactor(slenderness: number, alpha: number, lambda0: number): number {
  const phi = 0.5 * (1 + alpha * (slenderness - lambda0) + slenderness ** 2);
  const chi = 1 / (phi + Math.sqrt(Math.max(0, phi ** 2 - slenderness ** 2)));
  return Math.min(1, chi);
}

export interface ColumnCapacity {
  /** N, A·f₀: the squash load, the cap on any column capacity. */
  squashLoad: number;
  /** N, Euler's π²EI/(KL)². */
  criticalLoad: number;
  slenderness: number;
  chi: number;
  /** N, χ·A·f₀ (no partial factor: Slotwise divides by its own safety factor). */
  bucklingLoad: number;
}

/** Column capacity of a section (area mm², I mm⁴, f₀ MPa, E MPa) over an effective length K·L in mm. */
export function columnCapacity(i: {
  area: number;
  secondMoment: number;
  proofStrength: number;
  elasticModulus: number;
  effectiveLength: number;
  bucklingClass?: BucklingClass;
}): ColumnCapacity {
  if (!(i.effectiveLength > 0)) throw new Error('The effective length must be greater than 0 mm.');
  const { alpha, lambda0 } = BUCKLING_CLASS_PARAMETERS[i.bucklingClass ?? 'A'];
  const criticalLoad = (Math.PI ** 2 * i.elasticModulus * i.secondMoment) / i.effectiveLength ** 2;
  const squashLoad = i.area * i.proofStrength;
  const slenderness = relativeSlenderness({ area: i.area, proofStrength: i.proofStrength, criticalLoad });
  const chi = bucklingReductionFactor(slenderness, alpha, lambda0);
  return { squashLoad, criticalLoad, slenderness, chi, bucklingLoad: chi * squashLoad };
}

/** Exponent on the axial term of the flexural-buckling interaction (EN 1999-1-1 §6.3.3.1, ξ_yc = 0.8; from memory). */
export const AXIAL_INTERACTION_EXPONENT = 0.8;

/**
 * Axial force plus bending, EN 1999-1-1 §6.3.3.1 (6.59) with ω = 1 (no welds, no local weakening):
 * (N / N_b)^0.8 + M / M_R ≤ 1, N_b = χ·A·f₀, M_R = W·f₀. Both resistances are divided by the
 * safety factor. Returns the left-hand side (1 = at the limit).
 */
export function axialBendingUtilisation(i: { axialLoad: number; bucklingLoad: number; moment: number; sectionModulus: number; proofStrength: number; safetyFactor: number }): number {
  const nTerm = Math.max(0, i.axialLoad) / (i.bucklingLoad / i.safetyFactor);
  const mTerm = Math.abs(i.moment) / ((i.sectionModulus * i.proofStrength) / i.safetyFactor);
  return nTerm ** AXIAL_INTERACTION_EXPONENT + mTerm;
}

/**
 * Deflection of a panel under a spread load. Units: mm, N, MPa.
 *
 * Simply supported rectangle, uniform load q over the whole plate (Roark's Formulas for Stress and
 * Strain, 7th ed., Table 11.4 case 1a, ν = 0.3): y_max = α·q·b⁴/(E·t³), b the shorter side, with α
 * from the table below by a/b (linear between rows).
 * One-way strip (a sheet on two parallel supports): a beam of unit width, y = 5·q·L⁴/(384·D),
 * D = E·t³/(12·(1 − ν²)).
 */

/** Roark Table 11.4 case 1a: a/b → α (ν = 0.3). */
export const ROARK_SIMPLY_SUPPORTED_ALPHA: readonly [number, number][] = [
  [1.0, 0.0444],
  [1.2, 0.0616],
  [1.4, 0.077],
  [1.6, 0.0906],
  [1.8, 0.1017],
  [2.0, 0.111],
  [3.0, 0.1335],
  [4.0, 0.14],
  [5.0, 0.1417],
  [Infinity, 0.1421],
];

/** α for a/b ≥ 1, interpolated linearly in the table. */
export function roarkAlpha(aspect: number): number {
  const r = Math.max(1, aspect);
  const table = ROARK_SIMPLY_SUPPORTED_ALPHA;
  for (let i = 1; i < table.length; i++) {
    const [a1, v1] = table[i];
    const [a0, v0] = table[i - 1];
    if (r <= a1) return a1 === Infinity ? v0 + ((v1 - v0) * (r - a0)) / (r + 1) : v0 + ((v1 - v0) * (r - a0)) / (a1 - a0);
  }
  return table[table.length - 1][1];
}

/** Centre deflection (mm) of a simply supported rectangle a × b (mm) under pressure q (MPa = N/mm²). */
export function simplySupportedPlateDeflection(i: { a: number; b: number; thickness: number; pressure: number; elasticModulus: number }): number {
  const long = Math.max(i.a, i.b);
  const short = Math.min(i.a, i.b);
  return (roarkAlpha(long / short) * i.pressure * short ** 4) / (i.elasticModulus * i.thickness ** 3);
}

/** Mid-span deflection (mm) of a one-way strip over span L (mm) under pressure q (MPa). */
export function oneWayStripDeflection(i: { span: number; thickness: number; pressure: number; elasticModulus: number; poisson?: number }): number {
  const nu = i.poisson ?? 0.3;
  const D = (i.elasticModulus * i.thickness ** 3) / (12 * (1 - nu * nu));
  return (5 * i.pressure * i.span ** 4) / (384 * D);
}

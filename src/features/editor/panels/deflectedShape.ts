// Elastic-curve shapes for the load sketch (textbook beam formulas, e.g. American Wood Council
// Design Aid 6), normalised so the largest deflection is 1. Only the shape matters for the picture.

export type SketchLoad = { kind: 'point'; at: number } | { kind: 'uniform' };
export type SketchSupport = 'simple' | 'fixed';

function rawDeflection(x: number, span: number, support: SketchSupport, load: SketchLoad): number {
  const L = span;
  if (load.kind === 'uniform') {
    return support === 'simple' ? x * (L ** 3 - 2 * L * x * x + x ** 3) : x * x * (L - x) ** 2;
  }
  const a = Math.min(Math.max(load.at, 0), L);
  const b = L - a;
  if (support === 'simple') {
    if (x <= a) return b * x * (L * L - b * b - x * x);
    const u = L - x;
    return a * u * (L * L - a * a - u * u);
  }
  if (x <= a) return b * b * x * x * (3 * a * L - 3 * a * x - b * x);
  const u = L - x;
  return a * a * u * u * (3 * b * L - 3 * b * u - a * u);
}

/** `samples + 1` points [x mm, deflection 0..1] along the span. */
export function deflectedShape(span: number, support: SketchSupport, load: SketchLoad, samples = 48): [number, number][] {
  const points: [number, number][] = [];
  for (let i = 0; i <= samples; i += 1) {
    const x = (span * i) / samples;
    points.push([x, rawDeflection(x, span, support, load)]);
  }
  const peak = Math.max(...points.map(([, y]) => Math.abs(y)));
  return peak > 0 ? points.map(([x, y]) => [x, y / peak]) : points.map(([x]) => [x, 0]);
}

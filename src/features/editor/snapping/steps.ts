/** Grid and nudge steps for the two display units, in mm (25.4 mm per inch exactly). */
import { MM_PER_INCH, type LengthUnit } from '@/domain/units';

/** Minor and major grid lines: 10 / 100 mm, or 1 in / 12 in. */
export function gridStepsFor(units: LengthUnit): { minor: number; major: number } {
  return units === 'in' ? { minor: MM_PER_INCH, major: 12 * MM_PER_INCH } : { minor: 10, major: 100 };
}

/** The smallest move a drag or the draw tool makes: 1 mm, or 1/16 in. */
export function unitIncrement(units: LengthUnit): number {
  return units === 'in' ? MM_PER_INCH / 16 : 1;
}

/** Rounds a length in mm to a whole number of `step` mm. */
export function roundToStep(mm: number, step: number): number {
  if (!(step > 0)) return mm;
  return Math.round(mm / step) * step + 0;
}

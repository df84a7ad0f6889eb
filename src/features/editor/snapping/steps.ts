/** Grid and nudge steps for the two display units, in mm (25.4 mm per inch exactly). */
import { MM_PER_INCH, type LengthUnit } from '@/domain/units';

export { gridStepsFor } from '@/components/viewer/gridSteps';

/** The smallest move a drag or the draw tool makes: 1 mm, or 1/16 in. */
export function unitIncrement(units: LengthUnit): number {
  return units === 'in' ? MM_PER_INCH / 16 : 1;
}

/** Rounds a length in mm to a whole number of `step` mm. */
export function roundToStep(mm: number, step: number): number {
  if (!(step > 0)) return mm;
  return Math.round(mm / step) * step + 0;
}

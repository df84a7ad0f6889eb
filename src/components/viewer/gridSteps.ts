import { MM_PER_INCH, type LengthUnit } from '@/domain/units';

/** Minor and major grid lines, mm: 10 / 100 mm, or 1 in / 12 in (25.4 mm per inch exactly). */
export function gridStepsFor(units: LengthUnit): { minor: number; major: number } {
  return units === 'in' ? { minor: MM_PER_INCH, major: 12 * MM_PER_INCH } : { minor: 10, major: 100 };
}

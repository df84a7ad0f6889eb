import { z } from 'zod';
import { LENGTH_UNITS, type LengthUnit } from '../units';

/** The length units a person reads and types in ('mm' | 'in'); lengths are mm inside. */
export const lengthUnitSchema = z.enum(LENGTH_UNITS, { error: 'Choose mm or in' });
export type { LengthUnit };

import { z } from 'zod';
import { positiveWhole } from '../designs/schemas';

export const designParamsSchema = z.object({ designId: positiveWhole('A design id') });
export const diffQuerySchema = z.object({ from: positiveWhole('from (a revision number)'), to: positiveWhole('to (a revision number)') });
export const exportParamsSchema = z.object({
  designId: positiveWhole('A design id'),
  file: z.enum(['design.json', 'bom.csv', 'cutlist.csv'], { error: 'Export design.json, bom.csv or cutlist.csv' }),
});
export const exportQuerySchema = z.object({ revision: positiveWhole('A revision number').optional() });
export const importBodySchema = z.strictObject({
  /** The design document, checked in full by the domain parser. */
  document: z.unknown().refine((value) => value !== undefined, 'Send the design document'),
});

import { z } from 'zod';
import { lengthUnitSchema, systemIdSchema } from '../../../src/domain/contracts';
import { THUMBNAIL_MAX_BYTES, decodeThumbnail } from './thumbnail';


const objectError = {
  error: (issue: { code: string; keys?: string[] }) =>
    issue.code === 'unrecognized_keys' ? `Unknown field: ${issue.keys?.join(', ')}` : 'Send a JSON object',
};

/** Path parameters: plain digits only (no "0x1", " 1", "1e0"), as a number. */
export const positiveWhole = (what: string) =>
  z
    .string({ error: `${what} is a whole number` })
    .regex(/^[1-9]\d{0,14}$/, `${what} is a whole number from 1`)
    .transform(Number);

export const designIdParamsSchema = z.object({ id: positiveWhole('A design id') });
export const revisionParamsSchema = z.object({ id: positiveWhole('A design id'), number: positiveWhole('A revision number') });

export const designNameSchema = z
  .string({ error: 'Enter a name for the design' })
  .trim()
  .min(1, 'Enter a name for the design')
  .max(120, 'A design name is at most 120 characters');

export const createDesignBodySchema = z.strictObject(
  {
    name: designNameSchema,
    systemId: systemIdSchema,
    units: lengthUnitSchema.optional(),
    /** Checked in full by the domain parser in the route (it may migrate older versions). */
    document: z.unknown().optional(),
  },
  objectError,
);

const thumbnailSchema = z
  .string({ error: 'A thumbnail is a PNG data URL' })
  .max(Math.ceil((THUMBNAIL_MAX_BYTES * 4) / 3) + 64, 'A thumbnail is at most 400 KB')
  .transform((dataUrl, ctx) => {
    const decoded = decodeThumbnail(dataUrl);
    if (!decoded.ok) {
      ctx.addIssue({ code: 'custom', message: decoded.message });
      return z.NEVER;
    }
    return decoded.png;
  });

export const saveRevisionBodySchema = z.strictObject(
  {
    baseRevision: z.number({ error: 'baseRevision is the revision number this save started from' }).int('baseRevision is a whole number').positive('baseRevision is a whole number from 1'),
    document: z.unknown().refine((value) => value !== undefined, 'Send the design document'),
    thumbnail: thumbnailSchema.optional(),
    message: z.string({ error: 'A message is text' }).trim().max(500, 'A message is at most 500 characters').optional(),
  },
  objectError,
);

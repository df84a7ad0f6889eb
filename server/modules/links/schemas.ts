import { z } from 'zod';
import { positiveWhole } from '../designs/schemas';

const futureDate = z.iso
  .datetime({ offset: true, error: 'Give a date and time like 2026-12-31T23:59:00Z' })
  .transform((text) => new Date(text))
  .refine((date) => date.getTime() > Date.now(), 'The expiry must be in the future');

export const linkLabelSchema = z.string({ error: 'A label is text' }).trim().max(120, 'A label is at most 120 characters');

export const createLinkBodySchema = z.strictObject({
  designId: z.number({ error: 'designId is the design to share' }).int().positive(),
  /** A revision number to pin, or null/absent to follow the latest. */
  revision: z.number({ error: 'revision is a revision number or null' }).int().positive().nullable().optional(),
  label: linkLabelSchema.optional(),
  expiresAt: futureDate.nullable().optional(),
  /** Send the link by e-mail as well. */
  email: z.email({ error: 'Enter an email address like name@example.com' }).optional(),
});

export const classLinkBodySchema = createLinkBodySchema.omit({ email: true });

export const linkIdParamsSchema = z.object({ id: positiveWhole('A link id') });
export const listLinksQuerySchema = z.object({ designId: positiveWhole('A design id').optional() });

/** Tokens are 43 base64url characters; anything else is answered like an unknown token. */
export const tokenParamsSchema = z.object({ token: z.string() });

export { futureDate };

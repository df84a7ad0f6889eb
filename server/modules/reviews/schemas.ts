import { z } from 'zod';
import { REVIEW_DECISIONS } from '../../db/models/sharing';
import { displayNameSchema } from '../users/schemas';
import { positiveWhole } from '../designs/schemas';

export const designParamsSchema = z.object({ designId: positiveWhole('A design id') });

export const inviteBodySchema = z.strictObject({
  email: z.email({ error: 'Enter the customer\'s email address, like name@example.com' }).trim().toLowerCase().max(254, 'An email address is at most 254 characters'),
  /** Used when a new customer account is made. */
  displayName: displayNameSchema.optional(),
});

const coordinate = z.number({ error: 'A position is three numbers in mm' }).finite('A position is three finite numbers in mm').min(-1e6).max(1e6);

export const commentBodySchema = z.strictObject({
  revision: z.number({ error: 'revision is the revision number being reviewed' }).int().positive(),
  partId: z.string({ error: 'partId is the id of a part' }).trim().min(1).max(64).nullable().optional(),
  /** The pin, in design coordinates (mm). */
  position: z.tuple([coordinate, coordinate, coordinate]).nullable().optional(),
  body: z.string({ error: 'Write a comment' }).trim().min(1, 'Write a comment').max(2000, 'A comment is at most 2,000 characters'),
  parentId: z.number().int().positive().nullable().optional(),
});

export const decisionBodySchema = z.strictObject({
  revision: z.number({ error: 'revision is the revision number decided on' }).int().positive(),
  decision: z.enum(REVIEW_DECISIONS, { error: 'Choose approved or changes_requested' }),
  note: z.string({ error: 'A note is text' }).trim().max(2000, 'A note is at most 2,000 characters').optional(),
});

export const reviewQuerySchema = z.object({ revision: positiveWhole('A revision number').optional() });

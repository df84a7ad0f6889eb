import { z } from 'zod';
import { BUILD_STATES, PROGRESS_KINDS } from '../../db/models/build';
import { positiveWhole } from '../designs/schemas';

const objectError = {
  error: (issue: { code: string; keys?: string[] }) =>
    issue.code === 'unrecognized_keys' ? `Unknown field: ${issue.keys?.join(', ')}` : 'Send a JSON object',
};

export const buildIdParamsSchema = z.object({ id: positiveWhole('A build id') });
export const buildsQuerySchema = z.strictObject({ designId: positiveWhole('A design id').optional() }, objectError);

const wholeFromOne = (what: string) => z.number({ error: `${what} is a whole number` }).int(`${what} is a whole number`).positive(`${what} is a whole number from 1`);

const dueDateSchema = z
  .string({ error: 'A due date is YYYY-MM-DD' })
  .regex(/^\d{4}-\d{2}-\d{2}$/, 'A due date is YYYY-MM-DD')
  .refine((value) => !Number.isNaN(Date.parse(`${value}T00:00:00Z`)) && new Date(`${value}T00:00:00Z`).toISOString().startsWith(value), 'That due date is not on the calendar');

const noteSchema = z.string({ error: 'A note is text' }).trim().max(1000, 'A note is at most 1000 characters');

const builderIdsSchema = z
  .array(wholeFromOne('A builder id'), { error: 'builderIds is a list of user ids' })
  .min(1, 'Choose at least one builder')
  .max(20, 'At most 20 builders per build')
  .transform((ids) => [...new Set(ids)]);

export const createBuildBodySchema = z.strictObject(
  {
    designId: wholeFromOne('designId'),
    /** Defaults to the design's latest revision. */
    revision: wholeFromOne('revision').optional(),
    builderIds: builderIdsSchema,
    dueDate: dueDateSchema.nullable().optional(),
    note: noteSchema.optional(),
  },
  objectError,
);

export const patchBuildBodySchema = z.strictObject(
  {
    revision: wholeFromOne('revision').optional(),
    builderIds: builderIdsSchema.optional(),
    dueDate: dueDateSchema.nullable().optional(),
    note: noteSchema.optional(),
  },
  objectError,
);

export const changeStateBodySchema = z.strictObject(
  { state: z.enum(BUILD_STATES, { error: `Choose a state: ${BUILD_STATES.join(', ')}` }) },
  objectError,
);

const tickSchema = z.strictObject(
  {
    /** The device's id for this record (a UUID), so re-sent offline queues are stored once. */
    clientId: z.string({ error: 'clientId is text' }).regex(/^[A-Za-z0-9-]{8,64}$/, 'clientId is 8 to 64 letters, digits or dashes'),
    kind: z.enum(PROGRESS_KINDS, { error: `kind is one of: ${PROGRESS_KINDS.join(', ')}` }),
    itemKey: z.string({ error: 'itemKey is text' }).min(1, 'itemKey is required').max(200, 'itemKey is at most 200 characters'),
    done: z.boolean({ error: 'done is true or false' }),
    /** When the builder ticked, ISO 8601; defaults to now. */
    madeAt: z.iso.datetime({ error: 'madeAt is an ISO 8601 date and time' }).optional(),
  },
  objectError,
);

export const tickBodySchema = z.strictObject(
  {
    /** The revision the builder was looking at when ticking. */
    revision: wholeFromOne('revision'),
    ticks: z.array(tickSchema, { error: 'ticks is a list' }).min(1, 'Send at least one tick').max(500, 'At most 500 ticks at once'),
  },
  objectError,
);

export type CreateBuildBody = z.output<typeof createBuildBodySchema>;
export type PatchBuildBody = z.output<typeof patchBuildBodySchema>;
export type TickBody = z.output<typeof tickBodySchema>;

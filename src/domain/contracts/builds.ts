import { z } from 'zod';
import { personRefSchema } from './designs';

/** Response shapes of /api/builds, shared by the workbench and the designs list (see docs/api.md). */
export const BUILD_STATE_VALUES = ['planned', 'cutting', 'assembling', 'done', 'on-hold'] as const;
export const buildStateSchema = z.enum(BUILD_STATE_VALUES);
export type BuildState = z.infer<typeof buildStateSchema>;
export const BUILD_STATE_LABELS: Record<BuildState, string> = {
  planned: 'Planned',
  cutting: 'Cutting',
  assembling: 'Assembling',
  done: 'Done',
  'on-hold': 'On hold',
};

export const progressKindSchema = z.enum(['cut', 'kit', 'step']);
export type ProgressKind = z.infer<typeof progressKindSchema>;

export const buildSummarySchema = z.object({
  id: z.number(),
  designId: z.number(),
  designName: z.string(),
  revision: z.number(),
  /** The design's newest revision; above `revision` when the design moved on after the build was planned. */
  latestDesignRevision: z.number(),
  state: buildStateSchema,
  dueDate: z.string().nullable(),
  note: z.string().nullable(),
  builders: z.array(personRefSchema),
  createdBy: personRefSchema,
  createdAt: z.string(),
  updatedAt: z.string(),
  /** Items ticked done on the build's revision, per kind. */
  progress: z.object({ cut: z.number(), kit: z.number(), step: z.number() }),
});
export type BuildSummary = z.infer<typeof buildSummarySchema>;

export const progressRecordSchema = z.object({
  id: z.number(),
  revision: z.number(),
  kind: progressKindSchema,
  itemKey: z.string(),
  done: z.boolean(),
  clientId: z.string(),
  madeBy: personRefSchema,
  madeAt: z.string(),
});
export type ProgressRecord = z.infer<typeof progressRecordSchema>;

export const stateChangeSchema = z.object({
  fromState: buildStateSchema.nullable(),
  toState: buildStateSchema,
  changedBy: personRefSchema,
  changedAt: z.string(),
});
export type StateChange = z.infer<typeof stateChangeSchema>;

export const buildDetailSchema = z.object({
  build: buildSummarySchema,
  stateHistory: z.array(stateChangeSchema),
  /** Every progress record on the build's revision, oldest first (two builders' ticks of one step are both here). */
  records: z.array(progressRecordSchema),
  /** Records kept with earlier revisions the build followed. */
  earlierRevisionRecords: z.number(),
});
export type BuildDetail = z.infer<typeof buildDetailSchema>;

export const buildNoticeSchema = z.object({ code: z.enum(['superseded_revision', 'newer_design_revision']), message: z.string() });
export type BuildNotice = z.infer<typeof buildNoticeSchema>;

export const tickResponseSchema = buildDetailSchema.extend({ notice: buildNoticeSchema.nullable(), stored: z.number() });

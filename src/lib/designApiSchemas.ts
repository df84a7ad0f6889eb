import { z } from 'zod';

/** Response shapes shared by the designs list and the editor (see docs/api.md). */
export const personRefSchema = z.object({ id: z.number(), displayName: z.string() });

export const designSummarySchema = z.object({
  id: z.number(),
  name: z.string(),
  systemId: z.string(),
  latestRevision: z.number(),
  updatedAt: z.string(),
  updatedBy: personRefSchema,
  thumbnailUrl: z.string().nullable(),
  profileCount: z.number(),
  /** The customer's newest decision; `current` when it is about the latest revision. */
  approval: z
    .object({ revision: z.number(), decision: z.enum(['approved', 'changes_requested']), by: z.string(), at: z.string(), current: z.boolean() })
    .nullable()
    .optional(),
});
export type DesignSummary = z.infer<typeof designSummarySchema>;

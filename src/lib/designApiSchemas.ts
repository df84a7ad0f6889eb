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
});
export type DesignSummary = z.infer<typeof designSummarySchema>;

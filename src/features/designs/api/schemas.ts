import { z } from 'zod';

const personRefSchema = z.object({ id: z.number(), displayName: z.string() });

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

/** A revision without its document (lists, and answers where the document is not needed). */
export const revisionMetaSchema = z.object({
  number: z.number(),
  createdAt: z.string(),
  createdBy: personRefSchema,
  message: z.string().nullable(),
});
export type RevisionMeta = z.infer<typeof revisionMetaSchema>;

export const designsListResponseSchema = z.object({ designs: z.array(designSummarySchema) });

import { z } from 'zod';

import { designSummarySchema, personRefSchema, type DesignSummary } from '@/lib/designApiSchemas';

export { designSummarySchema, type DesignSummary };

/** A revision without its document (lists, and answers where the document is not needed). */
export const revisionMetaSchema = z.object({
  number: z.number(),
  createdAt: z.string(),
  createdBy: personRefSchema,
  message: z.string().nullable(),
});
export type RevisionMeta = z.infer<typeof revisionMetaSchema>;

export const designsListResponseSchema = z.object({ designs: z.array(designSummarySchema) });

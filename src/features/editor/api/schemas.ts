import { z } from 'zod';
import { storedDesignDocumentSchema } from '@/domain/design/migrations';

import { designSummarySchema, personRefSchema } from '@/lib/designApiSchemas';

export const editorDesignSummarySchema = designSummarySchema;

/** A revision with its document, validated against the design-document schema. */
export const editorRevisionSchema = z.object({
  number: z.number(),
  document: storedDesignDocumentSchema,
  createdAt: z.string(),
  createdBy: personRefSchema,
  message: z.string().nullable(),
});
export type EditorRevision = z.infer<typeof editorRevisionSchema>;

export const editorDesignResponseSchema = z.object({ design: editorDesignSummarySchema, revision: editorRevisionSchema });
export type EditorDesignDetail = z.infer<typeof editorDesignResponseSchema>;

import { z } from 'zod';
import { designDocumentSchema } from '@/domain/design/schema';

import { designSummarySchema, personRefSchema } from '@/lib/designApiSchemas';

export const editorDesignSummarySchema = designSummarySchema;

/** A revision with its document, validated against the design-document schema. */
export const editorRevisionSchema = z.object({
  number: z.number(),
  document: designDocumentSchema,
  createdAt: z.string(),
  createdBy: personRefSchema,
  message: z.string().nullable(),
});
export type EditorRevision = z.infer<typeof editorRevisionSchema>;

/** What a save answers: the new revision's details, without the document (the client sent it). */
export const savedRevisionSchema = z.object({
  number: z.number(),
  createdAt: z.string(),
  createdBy: personRefSchema,
  message: z.string().nullable(),
  thumbnailUrl: z.string().nullable(),
  profileCount: z.number(),
});
export type SavedRevision = z.infer<typeof savedRevisionSchema>;

export const editorDesignResponseSchema = z.object({ design: editorDesignSummarySchema, revision: editorRevisionSchema });
export type EditorDesignDetail = z.infer<typeof editorDesignResponseSchema>;

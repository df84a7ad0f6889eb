import { z } from 'zod';
import { designDocumentSchema } from '@/domain/design/schema';

const personRefSchema = z.object({ id: z.number(), displayName: z.string() });

export const editorDesignSummarySchema = z.object({
  id: z.number(),
  name: z.string(),
  systemId: z.string(),
  latestRevision: z.number(),
  updatedAt: z.string(),
  updatedBy: personRefSchema,
  thumbnailUrl: z.string().nullable(),
  profileCount: z.number(),
});

/** A revision with its document, validated against the design-document schema. */
export const editorRevisionSchema = z.object({
  number: z.number(),
  document: designDocumentSchema,
  createdAt: z.string(),
  createdBy: personRefSchema,
  message: z.string().nullable(),
});
export type EditorRevision = z.infer<typeof editorRevisionSchema>;

export const editorDesignResponseSchema = z.object({ design: editorDesignSummarySchema, revision: editorRevisionSchema });
export type EditorDesignDetail = z.infer<typeof editorDesignResponseSchema>;

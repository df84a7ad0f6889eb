import { z } from 'zod';
import { designDocumentSchema } from '@/domain/design/schema';

import { designSummarySchema, revisionMetaSchema } from '@/domain/contracts';

export const editorDesignSummarySchema = designSummarySchema;

/** A revision with its document, validated against the design-document schema. */
export const editorRevisionSchema = revisionMetaSchema.extend({ document: designDocumentSchema });
export type EditorRevision = z.infer<typeof editorRevisionSchema>;

export const editorDesignResponseSchema = z.object({ design: editorDesignSummarySchema, revision: editorRevisionSchema });
export type EditorDesignDetail = z.infer<typeof editorDesignResponseSchema>;

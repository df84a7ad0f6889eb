import { z } from 'zod';
import { storedDesignDocumentSchema } from '@/domain/design/migrations';

import { designSummarySchema, revisionMetaSchema } from '@/domain/contracts';

export const editorDesignSummarySchema = designSummarySchema;

/** A revision with its document, validated against the design-document schema. */
export const editorRevisionSchema = revisionMetaSchema.extend({ document: storedDesignDocumentSchema });
export type EditorRevision = z.infer<typeof editorRevisionSchema>;

export { savedRevisionSchema, type SavedRevision } from '@/domain/contracts';

export const editorDesignResponseSchema = z.object({ design: editorDesignSummarySchema, revision: editorRevisionSchema });
export type EditorDesignDetail = z.infer<typeof editorDesignResponseSchema>;

import { z } from 'zod';

/** Who did something: enough to show a name. */
export const personRefSchema = z.object({ id: z.number(), displayName: z.string() });
export type PersonRef = z.infer<typeof personRefSchema>;

/**
 * A design in lists and detail answers. `systemId` is plain text here: a stored design keeps the id
 * it was saved with even if the catalogue later drops it. Dates are ISO 8601 text.
 */
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
    .default(null),
});
export type ApprovalSummary = NonNullable<z.infer<typeof designSummarySchema>['approval']>;
export type DesignSummary = z.infer<typeof designSummarySchema>;

/** A revision without its document (lists, and answers where the document is not needed). */
export const revisionMetaSchema = z.object({
  number: z.number(),
  createdAt: z.string(),
  createdBy: personRefSchema,
  message: z.string().nullable(),
  thumbnailUrl: z.string().nullable(),
});
export type RevisionMeta = z.infer<typeof revisionMetaSchema>;
/** What a save answers: the new revision's details, without the document the client sent. */
export const savedRevisionSchema = revisionMetaSchema.extend({ profileCount: z.number() });
export type SavedRevision = z.infer<typeof savedRevisionSchema>;

export const designsListResponseSchema = z.object({ designs: z.array(designSummarySchema) });
export type DesignsListResponse = z.infer<typeof designsListResponseSchema>;
export const revisionsListResponseSchema = z.object({ revisions: z.array(revisionMetaSchema) });
export type RevisionsListResponse = z.infer<typeof revisionsListResponseSchema>;
export const createDesignResponseSchema = z.object({ design: designSummarySchema, revision: revisionMetaSchema });
export type CreateDesignResponse = z.infer<typeof createDesignResponseSchema>;

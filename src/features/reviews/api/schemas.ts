import { z } from 'zod';
import { storedDesignDocumentSchema } from '@/domain/design/migrations';
import { personRefSchema } from '@/domain/contracts';

export const decisionSchema = z.object({
  id: z.number(),
  revision: z.number(),
  decision: z.enum(['approved', 'changes_requested']),
  note: z.string(),
  decidedBy: personRefSchema,
  decidedAt: z.string(),
});
export type Decision = z.infer<typeof decisionSchema>;

export const commentSchema = z.object({
  id: z.number(),
  revision: z.number(),
  partId: z.string().nullable(),
  position: z.tuple([z.number(), z.number(), z.number()]).nullable(),
  body: z.string(),
  parentId: z.number().nullable(),
  author: personRefSchema.extend({ role: z.string() }),
  createdAt: z.string(),
});
export type ReviewComment = z.infer<typeof commentSchema>;

export const sharedDesignSchema = z.object({
  designId: z.number(),
  name: z.string(),
  latestRevision: z.number(),
  updatedAt: z.string(),
  lastDecision: decisionSchema.nullable(),
  commentCount: z.number(),
});
export type SharedDesignSummary = z.infer<typeof sharedDesignSchema>;

export const reviewSchema = z.object({
  design: z.object({ id: z.number(), name: z.string(), latestRevision: z.number() }),
  comments: z.array(commentSchema),
  decisions: z.array(decisionSchema),
  revision: z.object({ number: z.number(), createdAt: z.string(), document: storedDesignDocumentSchema }),
});
export type Review = z.infer<typeof reviewSchema>;

export const reviewKeys = {
  all: ['reviews'] as const,
  list: () => [...reviewKeys.all, 'list'] as const,
  detail: (designId: number) => [...reviewKeys.all, 'detail', designId] as const,
};

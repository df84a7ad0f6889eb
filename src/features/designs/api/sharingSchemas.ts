import { z } from 'zod';
import { personRefSchema } from '@/domain/contracts';

export const historyRevisionSchema = z.object({
  number: z.number(),
  createdAt: z.string(),
  createdBy: personRefSchema,
  message: z.string().nullable(),
  approval: z.object({ state: z.enum(['approved', 'changes_requested', 'not_reviewed']), by: z.string().nullable(), at: z.string().nullable() }),
});
export type HistoryRevision = z.infer<typeof historyRevisionSchema>;

export const diffSchema = z.object({
  from: z.number(),
  to: z.number(),
  bom: z.array(z.object({ code: z.string(), description: z.string(), unit: z.string(), before: z.number(), after: z.number(), change: z.number() })),
  cutList: z.array(z.object({ variantId: z.string(), length: z.number(), before: z.number(), after: z.number(), change: z.number() })),
});
export type RevisionDiff = z.infer<typeof diffSchema>;

export const uploadSchema = z.object({
  id: z.number(),
  designId: z.number(),
  name: z.string(),
  mimeType: z.string(),
  sizeBytes: z.number(),
  kind: z.string(),
  fileUrl: z.string(),
  thumbnailUrl: z.string().nullable(),
  uploadedBy: personRefSchema,
  createdAt: z.string(),
});
export type Upload = z.infer<typeof uploadSchema>;


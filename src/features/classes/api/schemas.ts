import { z } from 'zod';

export const linkSchema = z.object({
  id: z.number(),
  designId: z.number(),
  designName: z.string(),
  revision: z.number().nullable(),
  label: z.string(),
  expiresAt: z.string().nullable(),
  revokedAt: z.string().nullable(),
  openCount: z.number(),
  classId: z.number().nullable(),
  createdAt: z.string(),
  active: z.boolean(),
});
export type ShareLink = z.infer<typeof linkSchema>;

export const classSchema = z.object({
  id: z.number(),
  name: z.string(),
  description: z.string(),
  expiresAt: z.string().nullable(),
  revokedAt: z.string().nullable(),
  createdAt: z.string(),
  active: z.boolean(),
  links: z.array(linkSchema),
  openCount: z.number(),
});
export type ClassView = z.infer<typeof classSchema>;

export const classResponseSchema = z.object({ class: classSchema });
export const createdLinkSchema = z.object({ link: linkSchema, token: z.string(), url: z.string() });
export type CreatedLink = z.infer<typeof createdLinkSchema>;

export const classKeys = {
  all: ['classes'] as const,
  list: () => [...classKeys.all, 'list'] as const,
  designs: () => [...classKeys.all, 'designs'] as const,
};

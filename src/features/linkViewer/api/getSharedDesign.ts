import { queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { apiFetch } from '@/lib/apiClient';
import { storedDesignDocumentSchema } from '@/domain/design/migrations';

export const sharedDesignSchema = z.object({
  link: z.object({ label: z.string(), pinnedRevision: z.number().nullable(), expiresAt: z.string().nullable() }),
  design: z.object({ name: z.string(), systemId: z.string(), latestRevision: z.number() }),
  revision: z.object({ number: z.number(), createdAt: z.string(), document: storedDesignDocumentSchema }),
});
export type SharedDesign = z.infer<typeof sharedDesignSchema>;

export const sharedKeys = {
  all: ['shared'] as const,
  design: (token: string) => [...sharedKeys.all, token] as const,
};

/** What a read-only link shows (no session). */
export async function getSharedDesign(token: string, signal?: AbortSignal): Promise<SharedDesign> {
  return apiFetch(`/api/shared/${encodeURIComponent(token)}`, { schema: sharedDesignSchema, signal });
}

export const sharedDesignQueryOptions = (token: string) =>
  queryOptions({ queryKey: sharedKeys.design(token), queryFn: ({ signal }) => getSharedDesign(token, signal), retry: false, staleTime: 60_000 });

export function useSharedDesign(token: string) {
  return useQuery(sharedDesignQueryOptions(token));
}

import { queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { apiFetch } from '@/lib/apiClient';
import { classKeys } from './schemas';

const linkDesignSchema = z.object({ id: z.number(), name: z.string(), systemId: z.string(), latestRevision: z.number() });
export type LinkDesign = z.infer<typeof linkDesignSchema>;

/** The designs a class link can show. */
export async function listLinkDesigns(signal?: AbortSignal): Promise<LinkDesign[]> {
  const { designs } = await apiFetch('/api/links/designs', { schema: z.object({ designs: z.array(linkDesignSchema) }), signal });
  return designs;
}

export const linkDesignsQueryOptions = () => queryOptions({ queryKey: classKeys.designs(), queryFn: ({ signal }) => listLinkDesigns(signal) });

export function useLinkDesigns() {
  return useQuery(linkDesignsQueryOptions());
}

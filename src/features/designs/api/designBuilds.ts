import { queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { apiFetch } from '@/lib/apiClient';
import { buildKeys } from '@/lib/queryKeys';
import { buildSummarySchema, type BuildSummary } from '@/domain/contracts/builds';


const responseSchema = z.object({ builds: z.array(buildSummarySchema) });

/** GET /api/builds — every build in the shop, with progress, for the designs list. */
export async function listAllBuilds(signal?: AbortSignal): Promise<BuildSummary[]> {
  return (await apiFetch('/api/builds', { schema: responseSchema, signal })).builds;
}

export const allBuildsQueryOptions = () => queryOptions({ queryKey: buildKeys.everyone(), queryFn: ({ signal }) => listAllBuilds(signal), staleTime: 0 });

export function useAllBuilds() {
  return useQuery(allBuildsQueryOptions());
}

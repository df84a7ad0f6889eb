import { queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { apiFetch } from '@/lib/apiClient';
import { buildSummarySchema, type BuildSummary } from '@/domain/contracts/builds';

/** Builds live under the ['builds'] root shared with the workbench, so either side's changes refresh the other. */
export const designBuildKeys = {
  all: ['builds'] as const,
  lists: () => [...designBuildKeys.all, 'list'] as const,
  allBuilds: () => [...designBuildKeys.lists(), 'all'] as const,
  builders: () => [...designBuildKeys.all, 'builders'] as const,
};

const responseSchema = z.object({ builds: z.array(buildSummarySchema) });

/** GET /api/builds — every build in the shop, with progress, for the designs list. */
export async function listAllBuilds(signal?: AbortSignal): Promise<BuildSummary[]> {
  return (await apiFetch('/api/builds', { schema: responseSchema, signal })).builds;
}

export const allBuildsQueryOptions = () => queryOptions({ queryKey: designBuildKeys.allBuilds(), queryFn: ({ signal }) => listAllBuilds(signal), staleTime: 0 });

export function useAllBuilds() {
  return useQuery(allBuildsQueryOptions());
}

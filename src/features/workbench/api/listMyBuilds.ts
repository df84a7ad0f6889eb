import { queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { apiFetch } from '@/lib/apiClient';
import { buildSummarySchema, type BuildSummary } from '@/domain/contracts/builds';
import { buildKeys } from '@/lib/queryKeys';

const responseSchema = z.object({ builds: z.array(buildSummarySchema) });

/** GET /api/builds — for a builder, the builds assigned to them, open work first by due date. */
export async function listMyBuilds(signal?: AbortSignal): Promise<BuildSummary[]> {
  return (await apiFetch('/api/builds', { schema: responseSchema, signal })).builds;
}

export const myBuildsQueryOptions = () => queryOptions({ queryKey: buildKeys.mine(), queryFn: ({ signal }) => listMyBuilds(signal), staleTime: 0 });

export function useMyBuilds() {
  return useQuery(myBuildsQueryOptions());
}

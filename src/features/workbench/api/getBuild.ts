import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiFetch } from '@/lib/apiClient';
import { buildDetailSchema, type BuildDetail } from '@/domain/contracts/builds';
import { buildKeys } from '@/lib/queryKeys';

/** GET /api/builds/:id — the build, its state history and every progress record on its revision. */
export async function getBuild(buildId: number, signal?: AbortSignal): Promise<BuildDetail> {
  return apiFetch(`/api/builds/${buildId}`, { schema: buildDetailSchema, signal });
}

export const buildQueryOptions = (buildId: number) =>
  queryOptions({ queryKey: buildKeys.detail(buildId), queryFn: ({ signal }) => getBuild(buildId, signal), staleTime: 10_000 });

export function useBuild(buildId: number) {
  return useQuery(buildQueryOptions(buildId));
}

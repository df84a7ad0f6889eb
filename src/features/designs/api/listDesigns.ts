import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiFetch } from '@/lib/apiClient';
import { designKeys } from '@/lib/queryKeys';
import { designsListResponseSchema, type DesignSummary } from './schemas';

export async function listDesigns(signal?: AbortSignal): Promise<DesignSummary[]> {
  const { designs } = await apiFetch('/api/designs', { schema: designsListResponseSchema, signal });
  return designs;
}

export const designsListQueryOptions = () =>
  queryOptions({
    queryKey: designKeys.list(),
    queryFn: ({ signal }) => listDesigns(signal),
    // Saves happen in the editor's own cache, so the list asks again whenever it is shown.
    staleTime: 0,
  });

export function useDesigns() {
  return useQuery(designsListQueryOptions());
}

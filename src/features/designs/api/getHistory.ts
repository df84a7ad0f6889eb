import { queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { apiFetch } from '@/lib/apiClient';
import { historyRevisionSchema, type HistoryRevision } from './sharingSchemas';
import { designKeys } from '@/lib/queryKeys';

/** Revisions newest first, with author, time and approval state. */
export async function getHistory(designId: number, signal?: AbortSignal): Promise<HistoryRevision[]> {
  return (await apiFetch(`/api/designs/${designId}/history`, { schema: z.object({ revisions: z.array(historyRevisionSchema) }), signal })).revisions;
}

export const historyQueryOptions = (designId: number) => queryOptions({ queryKey: designKeys.history(designId), queryFn: ({ signal }) => getHistory(designId, signal) });

export function useHistory(designId: number) {
  return useQuery(historyQueryOptions(designId));
}

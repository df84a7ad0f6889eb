import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiFetch } from '@/lib/apiClient';
import { diffSchema, type RevisionDiff } from './sharingSchemas';
import { designKeys } from '@/lib/queryKeys';

/** Bill-of-materials and cut-list lines that differ between two revisions. */
export async function getDiff(designId: number, from: number, to: number, signal?: AbortSignal): Promise<RevisionDiff> {
  return apiFetch(`/api/designs/${designId}/diff?from=${from}&to=${to}`, { schema: diffSchema, signal });
}

export const diffQueryOptions = (designId: number, from: number, to: number) =>
  queryOptions({ queryKey: designKeys.diff(designId, from, to), queryFn: ({ signal }) => getDiff(designId, from, to, signal), enabled: from !== to });

export function useDiff(designId: number, from: number, to: number) {
  return useQuery(diffQueryOptions(designId, from, to));
}

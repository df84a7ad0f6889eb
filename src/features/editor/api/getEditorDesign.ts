import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiFetch } from '@/lib/apiClient';
import { designKeys } from '@/lib/queryKeys';
import { editorDesignResponseSchema, type EditorDesignDetail } from './schemas';

/** GET /api/designs/:id — the design and its latest revision, document validated. */
export function getEditorDesign(designId: number, signal?: AbortSignal): Promise<EditorDesignDetail> {
  return apiFetch(`/api/designs/${designId}`, { schema: editorDesignResponseSchema, signal });
}

export const editorDesignQueryOptions = (designId: number) =>
  queryOptions({
    queryKey: designKeys.detail(designId),
    queryFn: ({ signal }) => getEditorDesign(designId, signal),
    // The store owns the document once loaded; a background refetch must not look like news.
    staleTime: Infinity,
  });

export function useEditorDesign(designId: number) {
  return useQuery({ ...editorDesignQueryOptions(designId), enabled: Number.isInteger(designId) && designId > 0 });
}

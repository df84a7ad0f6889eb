import { queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { storedDesignDocumentSchema } from '@/domain/design/migrations';
import { apiFetch } from '@/lib/apiClient';
import { designSummarySchema, revisionMetaSchema } from '@/domain/contracts';
import { designKeys } from '@/lib/queryKeys';

export const viewerDesignResponseSchema = z.object({
  design: designSummarySchema,
  revision: revisionMetaSchema.extend({ document: storedDesignDocumentSchema }),
});
export type ViewerDesignDetail = z.infer<typeof viewerDesignResponseSchema>;

/** GET /api/designs/:id — the design and its latest revision, document validated (read only). */
export function getViewerDesign(designId: number, signal?: AbortSignal): Promise<ViewerDesignDetail> {
  return apiFetch(`/api/designs/${designId}`, { schema: viewerDesignResponseSchema, signal });
}

export const viewerDesignQueryOptions = (designId: number) =>
  queryOptions({ queryKey: designKeys.detail(designId), queryFn: ({ signal }) => getViewerDesign(designId, signal) });

export function useViewerDesign(designId: number) {
  return useQuery({ ...viewerDesignQueryOptions(designId), enabled: Number.isInteger(designId) && designId > 0 });
}

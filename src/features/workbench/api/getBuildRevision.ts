import { queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { parseDesignDocument } from '@/domain/design/parse';
import type { DesignDocument } from '@/domain/design/schema';
import { ApiError, apiFetch } from '@/lib/apiClient';
import { designKeys } from '@/lib/queryKeys';

const responseSchema = z.object({ revision: z.object({ number: z.number(), document: z.unknown() }) });

/** GET /api/designs/:id/revisions/:number — the revision a build follows (assigned builders may read it). */
export async function getBuildRevision(designId: number, revision: number, signal?: AbortSignal): Promise<DesignDocument> {
  const { revision: body } = await apiFetch(`/api/designs/${designId}/revisions/${revision}`, { schema: responseSchema, signal });
  const parsed = parseDesignDocument(body.document);
  if (!parsed.ok) throw new ApiError({ status: 200, code: 'invalid_document', message: `The design revision could not be read: ${parsed.errors[0]?.message ?? 'unknown problem'}.` });
  return parsed.design;
}

export const buildRevisionQueryOptions = (designId: number, revision: number) =>
  queryOptions({
    queryKey: designKeys.revision(designId, revision),
    queryFn: ({ signal }) => getBuildRevision(designId, revision, signal),
    // A revision never changes.
    staleTime: Infinity,
  });

export function useBuildRevision(designId: number | undefined, revision: number | undefined) {
  return useQuery({ ...buildRevisionQueryOptions(designId ?? 0, revision ?? 0), enabled: designId !== undefined && revision !== undefined });
}

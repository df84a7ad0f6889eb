import { useMutation, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import type { DesignDocument } from '@/domain/design/schema';
import { apiFetch } from '@/lib/apiClient';
import { designKeys } from '@/lib/queryKeys';
import { savedRevisionSchema, type EditorDesignDetail, type EditorRevision } from './schemas';

export interface SaveDesignRevisionInput {
  designId: number;
  /** The revision the edits started from; a moved-on server answers 409 'stale_revision'. */
  baseRevision: number;
  document: DesignDocument;
  /** data:image/png;base64,… (≤ 400 KB). */
  thumbnail?: string;
  message?: string;
}

const saveResponseSchema = z.object({ revision: savedRevisionSchema });

/**
 * POST /api/designs/:id/revisions — every save is a new revision. The server answers with the
 * revision's details only; the document is the one just sent.
 */
export async function saveDesignRevision({ designId, ...body }: SaveDesignRevisionInput): Promise<EditorRevision> {
  const { revision } = await apiFetch(`/api/designs/${designId}/revisions`, { method: 'POST', body, schema: saveResponseSchema });
  return { number: revision.number, createdAt: revision.createdAt, createdBy: revision.createdBy, message: revision.message, thumbnailUrl: revision.thumbnailUrl, document: body.document };
}

/** Saves and moves the cached design to the new revision; the designs list refreshes its "updated" line. */
export function useSaveDesignRevision() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: saveDesignRevision,
    onSuccess: (revision, { designId }) => {
      queryClient.setQueryData<EditorDesignDetail>(designKeys.detail(designId), (detail) =>
        detail
          ? {
              design: { ...detail.design, latestRevision: revision.number, updatedAt: revision.createdAt, updatedBy: revision.createdBy },
              revision,
            }
          : detail,
      );
      // The list's "updated" line and the design's history change; the detail was just set above.
      void queryClient.invalidateQueries({ queryKey: designKeys.lists() });
      void queryClient.invalidateQueries({ queryKey: designKeys.history(designId) });
    },
  });
}

import { useMutation, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { apiFetch } from '@/lib/apiClient';
import { commentSchema, reviewKeys, type ReviewComment } from './schemas';

export interface NewComment {
  designId: number;
  revision: number;
  partId?: string | null;
  /** The pin, design coordinates in mm. */
  position?: [number, number, number] | null;
  body: string;
}

export async function postComment({ designId, ...body }: NewComment): Promise<ReviewComment> {
  return (await apiFetch(`/api/reviews/${designId}/comments`, { method: 'POST', body, schema: z.object({ comment: commentSchema }) })).comment;
}

export function usePostComment() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: postComment, onSuccess: (_comment, input) => queryClient.invalidateQueries({ queryKey: reviewKeys.detail(input.designId) }) });
}

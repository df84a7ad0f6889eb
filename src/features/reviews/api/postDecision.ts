import { useMutation, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { apiFetch } from '@/lib/apiClient';
import { decisionSchema, reviewKeys, type Decision } from './schemas';

export interface NewDecision {
  designId: number;
  revision: number;
  decision: 'approved' | 'changes_requested';
  note?: string;
}

export async function postDecision({ designId, ...body }: NewDecision): Promise<Decision> {
  return (await apiFetch(`/api/reviews/${designId}/decisions`, { method: 'POST', body, schema: z.object({ decision: decisionSchema }) })).decision;
}

export function usePostDecision() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: postDecision, onSuccess: () => queryClient.invalidateQueries({ queryKey: reviewKeys.all }) });
}

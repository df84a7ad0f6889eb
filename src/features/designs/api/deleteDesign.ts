import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiFetch } from '@/lib/apiClient';
import { designKeys } from '@/lib/queryKeys';
import type { DesignSummary } from './schemas';

export function deleteDesign(designId: number): Promise<void> {
  return apiFetch(`/api/designs/${designId}`, { method: 'DELETE' });
}

/** Removes the card at once; puts it back if the server refuses. */
export function useDeleteDesign() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: deleteDesign,
    onMutate: async (designId) => {
      await queryClient.cancelQueries({ queryKey: designKeys.list() });
      const snapshot = queryClient.getQueryData<DesignSummary[]>(designKeys.list());
      queryClient.setQueryData<DesignSummary[]>(designKeys.list(), (designs) => designs?.filter((design) => design.id !== designId));
      return { snapshot };
    },
    onError: (_error, _designId, context) => {
      if (context?.snapshot) queryClient.setQueryData(designKeys.list(), context.snapshot);
    },
    onSettled: (_data, _error, designId) => {
      queryClient.removeQueries({ queryKey: designKeys.detail(designId) });
      return queryClient.invalidateQueries({ queryKey: designKeys.lists() });
    },
  });
}

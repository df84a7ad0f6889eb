import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiFetch } from '@/lib/apiClient';
import { designKeys } from '@/lib/queryKeys';

export async function deleteUpload({ id }: { id: number; designId: number }): Promise<void> {
  await apiFetch(`/api/uploads/${id}`, { method: 'DELETE' });
}

export function useDeleteUpload() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: deleteUpload, onSuccess: (_result, input) => queryClient.invalidateQueries({ queryKey: designKeys.uploads(input.designId) }) });
}

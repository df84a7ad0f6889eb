import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiFetch } from '@/lib/apiClient';
import { buildDetailSchema } from '@/domain/contracts/builds';
import { buildKeys } from '@/lib/queryKeys';

export interface CreateBuildInput {
  designId: number;
  builderIds: number[];
  dueDate?: string | null;
  note?: string;
}

/** POST /api/builds — assigns the design's latest revision to builders. */
export async function createBuild(input: CreateBuildInput) {
  return apiFetch('/api/builds', { method: 'POST', body: input, schema: buildDetailSchema });
}

export function useCreateBuild() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: createBuild, onSuccess: () => queryClient.invalidateQueries({ queryKey: buildKeys.all }) });
}

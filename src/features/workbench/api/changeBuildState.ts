import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiFetch } from '@/lib/apiClient';
import { buildDetailSchema, type BuildState } from '@/domain/contracts/builds';
import { buildKeys } from '@/lib/queryKeys';

/** POST /api/builds/:id/state — records the change with who and when. */
export async function changeBuildState(input: { buildId: number; state: BuildState }) {
  return apiFetch(`/api/builds/${input.buildId}/state`, { method: 'POST', body: { state: input.state }, schema: buildDetailSchema });
}

export function useChangeBuildState() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: changeBuildState,
    onSuccess: (detail) => {
      queryClient.setQueryData(buildKeys.detail(detail.build.id), detail);
      void queryClient.invalidateQueries({ queryKey: buildKeys.lists() });
    },
  });
}

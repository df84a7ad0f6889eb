import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiFetch } from '@/lib/apiClient';
import { designKeys } from '@/lib/queryKeys';
import type { LengthUnit } from '@/domain/contracts';
import { createDesignResponseSchema, type DesignSummary } from './schemas';

export interface CreateDesignInput {
  name: string;
  systemId: string;
  units?: LengthUnit;
}

// The new revision's document is not needed here (the editor loads it), so only its metadata is read.
export async function createDesign(input: CreateDesignInput): Promise<DesignSummary> {
  const { design } = await apiFetch('/api/designs', { method: 'POST', body: input, schema: createDesignResponseSchema });
  return design;
}

export function useCreateDesign() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createDesign,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: designKeys.lists() }),
  });
}

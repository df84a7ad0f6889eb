import { useMutation, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { apiFetch } from '@/lib/apiClient';
import { designKeys } from '@/lib/queryKeys';
import { designSummarySchema } from './schemas';

/** A new design from a design document file; the server checks it in full and writes nothing on a bad file. */
export async function importDesign(document: unknown) {
  return apiFetch('/api/designs/import', { method: 'POST', body: { document }, schema: z.object({ design: designSummarySchema }) });
}

export function useImportDesign() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: importDesign, onSuccess: () => queryClient.invalidateQueries({ queryKey: designKeys.all }) });
}

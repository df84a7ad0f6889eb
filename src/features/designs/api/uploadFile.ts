import { useMutation, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { apiFetch } from '@/lib/apiClient';
import { uploadSchema, type Upload } from './sharingSchemas';
import { designKeys } from '@/lib/queryKeys';

/** Attaches a photo or PDF to a design (multipart, field "file"). */
export async function uploadFile({ designId, file }: { designId: number; file: File }): Promise<Upload> {
  const form = new FormData();
  form.append('file', file, file.name);
  return (await apiFetch(`/api/designs/${designId}/uploads`, { method: 'POST', body: form, schema: z.object({ upload: uploadSchema }) })).upload;
}

export function useUploadFile() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: uploadFile, onSuccess: (_upload, input) => queryClient.invalidateQueries({ queryKey: designKeys.uploads(input.designId) }) });
}

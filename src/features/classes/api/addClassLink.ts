import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiFetch } from '@/lib/apiClient';
import { classKeys, createdLinkSchema, type CreatedLink } from './schemas';

export interface AddClassLinkInput {
  classId: number;
  designId: number;
  /** A revision to pin, or null to follow the latest. */
  revision?: number | null;
  label?: string;
}

export async function addClassLink({ classId, ...body }: AddClassLinkInput): Promise<CreatedLink> {
  return apiFetch(`/api/classes/${classId}/links`, { method: 'POST', body, schema: createdLinkSchema });
}

export function useAddClassLink() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: addClassLink, onSuccess: () => queryClient.invalidateQueries({ queryKey: classKeys.list() }) });
}

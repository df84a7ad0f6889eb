import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiFetch } from '@/lib/apiClient';
import { classKeys, classResponseSchema, type ClassView } from './schemas';

/** Revokes the class and every link in it. */
export async function revokeClass(classId: number): Promise<ClassView> {
  return (await apiFetch(`/api/classes/${classId}`, { method: 'DELETE', schema: classResponseSchema })).class;
}

export function useRevokeClass() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: revokeClass, onSuccess: () => queryClient.invalidateQueries({ queryKey: classKeys.list() }) });
}

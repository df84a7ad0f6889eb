import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiFetch } from '@/lib/apiClient';
import { classKeys, classResponseSchema, type ClassView } from './schemas';

export interface CreateClassInput {
  name: string;
  description?: string;
  expiresAt?: string | null;
}

export async function createClass(input: CreateClassInput): Promise<ClassView> {
  return (await apiFetch('/api/classes', { method: 'POST', body: input, schema: classResponseSchema })).class;
}

export function useCreateClass() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: createClass, onSuccess: () => queryClient.invalidateQueries({ queryKey: classKeys.list() }) });
}

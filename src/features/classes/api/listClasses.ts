import { queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { apiFetch } from '@/lib/apiClient';
import { classKeys, classSchema, type ClassView } from './schemas';

export async function listClasses(signal?: AbortSignal): Promise<ClassView[]> {
  const { classes } = await apiFetch('/api/classes', { schema: z.object({ classes: z.array(classSchema) }), signal });
  return classes;
}

export const classesQueryOptions = () => queryOptions({ queryKey: classKeys.list(), queryFn: ({ signal }) => listClasses(signal) });

export function useClasses() {
  return useQuery(classesQueryOptions());
}

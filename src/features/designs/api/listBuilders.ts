import { queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { apiFetch } from '@/lib/apiClient';
import { personRefSchema } from '@/domain/contracts/designs';
import { buildKeys } from '@/lib/queryKeys';

const responseSchema = z.object({ builders: z.array(personRefSchema) });

/** GET /api/builds/builders — active builders a build can be assigned to. */
export async function listBuilders(signal?: AbortSignal) {
  return (await apiFetch('/api/builds/builders', { schema: responseSchema, signal })).builders;
}

export const buildersQueryOptions = () => queryOptions({ queryKey: buildKeys.builders(), queryFn: ({ signal }) => listBuilders(signal) });

export function useBuilders(enabled: boolean) {
  return useQuery({ ...buildersQueryOptions(), enabled });
}

import { queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { apiFetch } from '@/lib/apiClient';

const messageSchema = z.object({ id: z.number(), from: z.string(), to: z.array(z.string()), subject: z.string(), text: z.string(), receivedAt: z.string() });
const outboxSchema = z.object({ mode: z.enum(['fake', 'smtp', 'none']), messages: z.array(messageSchema) });
export type Outbox = z.infer<typeof outboxSchema>;

export const outboxKeys = { all: ['outbox'] as const };

/** Messages the local mail catcher received (owner only). */
export async function listOutbox(signal?: AbortSignal): Promise<Outbox> {
  return apiFetch('/api/outbox', { schema: outboxSchema, signal });
}

export const outboxQueryOptions = () => queryOptions({ queryKey: outboxKeys.all, queryFn: ({ signal }) => listOutbox(signal), refetchInterval: 5000 });

export function useOutbox() {
  return useQuery(outboxQueryOptions());
}

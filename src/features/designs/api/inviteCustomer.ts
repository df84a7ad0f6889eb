import { useMutation } from '@tanstack/react-query';
import { z } from 'zod';
import { apiFetch } from '@/lib/apiClient';

const inviteResponseSchema = z.object({ accountCreated: z.boolean(), share: z.object({ customer: z.object({ id: z.number(), displayName: z.string(), email: z.string() }) }) });

/** Shares a design with a customer by e-mail (the account is made when the address is new). */
export async function inviteCustomer({ designId, ...body }: { designId: number; email: string; displayName?: string }) {
  return apiFetch(`/api/designs/${designId}/shares`, { method: 'POST', body, schema: inviteResponseSchema });
}

export function useInviteCustomer() {
  return useMutation({ mutationFn: inviteCustomer });
}

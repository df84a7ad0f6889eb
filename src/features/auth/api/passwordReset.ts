import { useMutation } from '@tanstack/react-query';
import { z } from 'zod';
import { apiFetch } from '@/lib/apiClient';

/** Asks for a reset link; the answer is the same whether or not the account exists. */
export async function requestPasswordReset(email: string): Promise<string> {
  return (await apiFetch('/api/auth/password-reset', { method: 'POST', body: { email }, schema: z.object({ message: z.string() }) })).message;
}

export function useRequestPasswordReset() {
  return useMutation({ mutationFn: requestPasswordReset });
}

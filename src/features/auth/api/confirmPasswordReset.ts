import { useMutation } from '@tanstack/react-query';
import { apiFetch } from '@/lib/apiClient';

/** Sets a new password with the e-mailed one-time token. */
export async function confirmPasswordReset(input: { token: string; newPassword: string }): Promise<void> {
  await apiFetch('/api/auth/password-reset/confirm', { method: 'POST', body: input });
}

export function useConfirmPasswordReset() {
  return useMutation({ mutationFn: confirmPasswordReset });
}

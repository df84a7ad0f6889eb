import { useMutation } from '@tanstack/react-query';
import { apiFetch } from '@/lib/apiClient';

export interface ChangePasswordInput {
  currentPassword: string;
  newPassword: string;
}

export function changePassword(input: ChangePasswordInput): Promise<void> {
  return apiFetch('/api/auth/me/password', { method: 'POST', body: input });
}

export function useChangePassword() {
  return useMutation({ mutationFn: changePassword });
}

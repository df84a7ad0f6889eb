import { useMutation, useQueryClient } from '@tanstack/react-query';
import { useNavigate } from 'react-router';
import { apiFetch, ApiError } from '@/lib/apiClient';
import { authKeys } from '@/lib/session/authKeys';

/** Ends the session; an already-ended session (401) counts as signed out. */
export async function signOut(): Promise<void> {
  try {
    await apiFetch('/api/auth/sign-out', { method: 'POST' });
  } catch (error) {
    if (error instanceof ApiError && error.status === 401) return;
    throw error;
  }
}

/** Signs out, forgets every cached answer and returns to the sign-in page. */
export function useSignOut() {
  const queryClient = useQueryClient();
  const navigate = useNavigate();
  return useMutation({
    mutationFn: signOut,
    onSuccess: () => {
      queryClient.clear();
      queryClient.setQueryData(authKeys.me(), null);
      navigate('/sign-in', { replace: true });
    },
  });
}

import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiFetch } from '@/lib/apiClient';
import { authKeys } from '@/lib/session/authKeys';
import { userResponseSchema, type User } from '@/domain/contracts';

export interface SignInInput {
  email: string;
  password: string;
}

export async function signIn(input: SignInInput): Promise<User> {
  const { user } = await apiFetch('/api/auth/sign-in', { method: 'POST', body: input, schema: userResponseSchema });
  return user;
}

/** Signs in and starts from a clean cache, so nothing of a previous session leaks into this one. */
export function useSignIn() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: signIn,
    onSuccess: (user) => {
      queryClient.clear();
      queryClient.setQueryData(authKeys.me(), user);
    },
  });
}

import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiFetch } from '@/lib/apiClient';
import { authKeys } from './authKeys';
import { userResponseSchema, type LengthUnit, type User } from '@/domain/contracts';

export interface UpdateMeInput {
  displayName?: string;
  preferences?: { units: LengthUnit };
}

export async function updateMe(input: UpdateMeInput): Promise<User> {
  const { user } = await apiFetch('/api/auth/me', { method: 'PATCH', body: input, schema: userResponseSchema });
  return user;
}

/** Changes the signed-in person's name or preferences; shows the change at once and rolls back if refused. */
export function useUpdateMe() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateMe,
    onMutate: async (input) => {
      await queryClient.cancelQueries({ queryKey: authKeys.me() });
      const snapshot = queryClient.getQueryData<User | null>(authKeys.me());
      if (snapshot) {
        queryClient.setQueryData<User>(authKeys.me(), {
          ...snapshot,
          displayName: input.displayName ?? snapshot.displayName,
          preferences: { ...snapshot.preferences, ...input.preferences },
        });
      }
      return { snapshot };
    },
    onError: (_error, _input, context) => {
      if (context?.snapshot) queryClient.setQueryData(authKeys.me(), context.snapshot);
    },
    onSuccess: (user) => queryClient.setQueryData(authKeys.me(), user),
  });
}

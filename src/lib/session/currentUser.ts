import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiFetch } from '@/lib/apiClient';
import { authKeys } from './authKeys';
import { currentUserResponseSchema, type User } from '@/domain/contracts';

/** The signed-in person, or null for an anonymous visitor (the server answers 200 `{ user: null }`). */
export async function getCurrentUser(signal?: AbortSignal): Promise<User | null> {
  const { user } = await apiFetch('/api/auth/me', { schema: currentUserResponseSchema, signal });
  return user;
}

export const currentUserQueryOptions = () =>
  queryOptions({
    queryKey: authKeys.me(),
    queryFn: ({ signal }) => getCurrentUser(signal),
    staleTime: 5 * 60_000,
  });

export function useCurrentUser() {
  return useQuery(currentUserQueryOptions());
}

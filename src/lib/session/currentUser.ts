import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiFetch, ApiError } from '@/lib/apiClient';
import { authKeys } from './authKeys';
import { userResponseSchema, type User } from '@/domain/contracts';

/** The signed-in person, or null for an anonymous visitor (401 is an answer here, not a failure). */
export async function getCurrentUser(signal?: AbortSignal): Promise<User | null> {
  try {
    const { user } = await apiFetch('/api/auth/me', { schema: userResponseSchema, signal });
    return user;
  } catch (error) {
    if (error instanceof ApiError && error.status === 401) return null;
    throw error;
  }
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

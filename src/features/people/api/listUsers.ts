import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiFetch } from '@/lib/apiClient';
import { usersResponseSchema, type User } from '@/domain/contracts';
import { peopleKeys } from './peopleKeys';

export async function listUsers(signal?: AbortSignal): Promise<User[]> {
  const { users } = await apiFetch('/api/users', { schema: usersResponseSchema, signal });
  return users;
}

export const usersQueryOptions = () => queryOptions({ queryKey: peopleKeys.list(), queryFn: ({ signal }) => listUsers(signal) });

export function useUsers() {
  return useQuery(usersQueryOptions());
}

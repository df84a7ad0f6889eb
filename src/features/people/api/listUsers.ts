import { queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { apiFetch } from '@/lib/apiClient';
import { userSchema, type User } from '@/features/auth/api/schemas';
import { peopleKeys } from './peopleKeys';

const usersResponseSchema = z.object({ users: z.array(userSchema) });

export async function listUsers(signal?: AbortSignal): Promise<User[]> {
  const { users } = await apiFetch('/api/users', { schema: usersResponseSchema, signal });
  return users;
}

export const usersQueryOptions = () => queryOptions({ queryKey: peopleKeys.list(), queryFn: ({ signal }) => listUsers(signal) });

export function useUsers() {
  return useQuery(usersQueryOptions());
}

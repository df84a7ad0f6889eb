import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiFetch } from '@/lib/apiClient';
import { userResponseSchema, type Role, type User } from '@/domain/contracts';
import { peopleKeys } from './peopleKeys';

export interface CreateUserInput {
  email: string;
  displayName: string;
  role: Role;
  password: string;
}

export async function createUser(input: CreateUserInput): Promise<User> {
  const { user } = await apiFetch('/api/users', { method: 'POST', body: input, schema: userResponseSchema });
  return user;
}

export function useCreateUser() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createUser,
    onSuccess: (user) => {
      queryClient.setQueryData<User[]>(peopleKeys.list(), (users) => (users ? [...users, user] : users));
      return queryClient.invalidateQueries({ queryKey: peopleKeys.list() });
    },
  });
}

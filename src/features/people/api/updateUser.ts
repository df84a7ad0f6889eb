import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiFetch } from '@/lib/apiClient';
import { authKeys } from '@/lib/session/authKeys';
import { userResponseSchema, type Role, type User } from '@/domain/contracts';
import { peopleKeys } from './peopleKeys';

export interface UpdateUserInput {
  id: number;
  displayName?: string;
  role?: Role;
  active?: boolean;
}

export async function updateUser({ id, ...changes }: UpdateUserInput): Promise<User> {
  const { user } = await apiFetch(`/api/users/${id}`, { method: 'PATCH', body: changes, schema: userResponseSchema });
  return user;
}

const replaceUser = (users: User[] | undefined, id: number, change: (user: User) => User) =>
  users?.map((user) => (user.id === id ? change(user) : user));

/** Changes a person's role, name or active state; the table shows it at once and rolls back if refused. */
export function useUpdateUser() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateUser,
    onMutate: async ({ id, ...changes }) => {
      await queryClient.cancelQueries({ queryKey: peopleKeys.list() });
      const snapshot = queryClient.getQueryData<User[]>(peopleKeys.list());
      queryClient.setQueryData<User[]>(peopleKeys.list(), (users) => replaceUser(users, id, (user) => ({ ...user, ...changes })));
      return { snapshot };
    },
    onError: (_error, _input, context) => {
      if (context?.snapshot) queryClient.setQueryData(peopleKeys.list(), context.snapshot);
    },
    onSuccess: (saved) => {
      queryClient.setQueryData<User[]>(peopleKeys.list(), (users) => replaceUser(users, saved.id, () => saved));
      const me = queryClient.getQueryData<User | null>(authKeys.me());
      if (me?.id === saved.id) queryClient.setQueryData(authKeys.me(), saved);
    },
  });
}

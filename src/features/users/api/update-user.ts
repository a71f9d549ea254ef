import { useMutation, useQueryClient } from '@tanstack/react-query';
import {
  userResponseSchema,
  type UpdateUserBody,
  type User,
} from '#shared/schemas/users.ts';
import { api } from '#src/lib/api-client.ts';
import { usersQueryKey } from './get-users.ts';

export interface UpdateUserInput {
  id: string;
  changes: UpdateUserBody;
}

/** PATCH /api/admin/users/:id with { role?, active? }. */
export async function updateUser({ id, changes }: UpdateUserInput): Promise<User> {
  const { user } = await api.patch(
    `/api/admin/users/${encodeURIComponent(id)}`,
    changes,
    userResponseSchema,
  );
  return user;
}

/** Applies the change to the list at once and rolls it back if the server refuses. */
export function useUpdateUser() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateUser,
    onMutate: async ({ id, changes }) => {
      await queryClient.cancelQueries({ queryKey: usersQueryKey });
      const previous = queryClient.getQueryData<User[]>(usersQueryKey);
      queryClient.setQueryData<User[]>(usersQueryKey, (old) =>
        old?.map((u) => (u.id === id ? { ...u, ...changes } : u)),
      );
      return { previous };
    },
    onError: (_error, _input, context) => {
      if (context?.previous) queryClient.setQueryData(usersQueryKey, context.previous);
    },
    onSuccess: (user) => {
      queryClient.setQueryData<User[]>(usersQueryKey, (old) => old?.map((u) => (u.id === user.id ? user : u)));
    },
    onSettled: () => queryClient.invalidateQueries({ queryKey: usersQueryKey }),
  });
}

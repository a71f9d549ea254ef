import { useMutation, useQueryClient } from '@tanstack/react-query';
import {
  userResponseSchema,
  type CreateUserBody,
  type User,
} from '#shared/schemas/users.ts';
import { api } from '#src/lib/api-client.ts';
import { usersQueryKey } from './get-users.ts';

/** POST /api/admin/users: 201 { user } | 409 email_taken | 422 validation_failed. */
export async function createUser(body: CreateUserBody): Promise<User> {
  const { user } = await api.post('/api/admin/users', body, userResponseSchema);
  return user;
}

export function useCreateUser() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createUser,
    onSuccess: (user) => {
      queryClient.setQueryData<User[]>(usersQueryKey, (old) => (old ? [...old, user] : old));
      return queryClient.invalidateQueries({ queryKey: usersQueryKey });
    },
  });
}

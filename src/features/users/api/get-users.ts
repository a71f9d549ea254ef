import { queryOptions, useQuery } from '@tanstack/react-query';
import { userListResponseSchema, type User } from '#shared/schemas/users.ts';
import { api } from '#src/lib/api-client.ts';

export const usersQueryKey = ['admin', 'users'] as const;

/** GET /api/admin/users (admin only). */
export async function getUsers(signal?: AbortSignal): Promise<User[]> {
  const { users } = await api.get('/api/admin/users', userListResponseSchema, signal);
  return users;
}

export function usersQueryOptions() {
  return queryOptions({
    queryKey: usersQueryKey,
    queryFn: ({ signal }) => getUsers(signal),
  });
}

export function useUsers() {
  return useQuery(usersQueryOptions());
}

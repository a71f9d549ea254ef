import { queryOptions, useQuery } from '@tanstack/react-query';
import { meResponseSchema, type MeResponse } from '#shared/schemas/users.ts';
import { api } from '#src/lib/api-client.ts';

export const meQueryKey = ['auth', 'me'] as const;

/** GET /api/me: the signed-in member of staff, or null. */
export function getMe(signal?: AbortSignal): Promise<MeResponse> {
  return api.get('/api/me', meResponseSchema, signal);
}

export function meQueryOptions() {
  return queryOptions({
    queryKey: meQueryKey,
    queryFn: ({ signal }) => getMe(signal),
    staleTime: 60_000,
  });
}

export function useMe() {
  return useQuery(meQueryOptions());
}

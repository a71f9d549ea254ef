import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { readerPreferencesResponseSchema, type ReaderPreferences, type UpdatePreferencesBody } from '#shared/schemas/subscriptions.ts';
import { api } from '#src/lib/api-client.ts';

const preferencesKey = (token: string) => ['reader-preferences', token] as const;

/** POST /api/public/subscriptions/preferences { token }: the token stays out of the URL of the API call. */
export async function getPreferences(token: string): Promise<ReaderPreferences> {
  return (await api.post('/api/public/subscriptions/preferences', { token }, readerPreferencesResponseSchema)).preferences;
}

export function preferencesQueryOptions(token: string) {
  return queryOptions({ queryKey: preferencesKey(token), queryFn: () => getPreferences(token), retry: false });
}

export function usePreferences(token: string) {
  return useQuery(preferencesQueryOptions(token));
}

/** PATCH /api/public/subscriptions/preferences { token, topics?, corrections?, voteNotify? }. */
export async function updatePreferences(body: UpdatePreferencesBody): Promise<ReaderPreferences> {
  return (await api.patch('/api/public/subscriptions/preferences', body, readerPreferencesResponseSchema)).preferences;
}

export function useUpdatePreferences() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updatePreferences,
    onSuccess: (prefs, body) => queryClient.setQueryData(preferencesKey(body.token), prefs),
  });
}

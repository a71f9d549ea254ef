import type { DefaultOptions, QueryClient } from '@tanstack/react-query';
import { meQueryKey } from '../features/auth/api/get-me.ts';
import { createQueryClient } from '../lib/query-client.ts';

/**
 * The app's query client: when any request learns the session has ended, `me` becomes null and the
 * lab shell sends the user to sign in (coming back to where they were).
 */
export function createAppQueryClient(overrides?: DefaultOptions): QueryClient {
  const client: QueryClient = createQueryClient({
    overrides,
    onUnauthenticated: () => client.setQueryData(meQueryKey, { user: null }),
  });
  return client;
}

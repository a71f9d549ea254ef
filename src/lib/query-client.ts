import { QueryClient, type DefaultOptions } from '@tanstack/react-query';
import { isApiError } from './api-client.ts';

/** Retry only what may pass on a second try: no answer, or a 5xx. Never a 4xx. */
function shouldRetry(failureCount: number, error: unknown): boolean {
  if (failureCount >= 2) return false;
  if (!isApiError(error)) return false;
  return error.status === 0 || error.status >= 500;
}

export const queryConfig = {
  queries: {
    retry: shouldRetry,
    staleTime: 30_000,
    refetchOnWindowFocus: false,
  },
  mutations: {
    retry: false,
  },
} satisfies DefaultOptions;

export function createQueryClient(overrides?: DefaultOptions): QueryClient {
  return new QueryClient({
    defaultOptions: {
      queries: { ...queryConfig.queries, ...overrides?.queries },
      mutations: { ...queryConfig.mutations, ...overrides?.mutations },
    },
  });
}

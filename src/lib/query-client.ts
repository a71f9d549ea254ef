import { MutationCache, QueryCache, QueryClient, type DefaultOptions } from '@tanstack/react-query';
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
    retryDelay: (attempt: number) => Math.min(500 * 2 ** attempt, 4000),
    staleTime: 30_000,
    refetchOnWindowFocus: false,
  },
  mutations: {
    retry: false,
  },
} satisfies DefaultOptions;

export interface QueryClientSetup {
  overrides?: DefaultOptions;
  /** Called when any query or mutation is answered 401 unauthenticated (the session ended). */
  onUnauthenticated?: () => void;
}

export function createQueryClient({ overrides, onUnauthenticated }: QueryClientSetup = {}): QueryClient {
  const onError = (error: unknown) => {
    if (isApiError(error) && error.code === 'unauthenticated') onUnauthenticated?.();
  };
  return new QueryClient({
    queryCache: new QueryCache({ onError }),
    mutationCache: new MutationCache({ onError }),
    defaultOptions: {
      queries: { ...queryConfig.queries, ...overrides?.queries },
      mutations: { ...queryConfig.mutations, ...overrides?.mutations },
    },
  });
}

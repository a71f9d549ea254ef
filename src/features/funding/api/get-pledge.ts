import { queryOptions, useQuery, useQueryClient } from '@tanstack/react-query';
import { publicPledgeResponseSchema, type PublicPledge } from '#shared/schemas/funding.ts';
import { api } from '#src/lib/api-client.ts';

/** How often the "we are confirming your payment" page asks, and for how long at most. */
export const PLEDGE_POLL_MS = 1500;
export const PLEDGE_POLL_LIMIT = 80;

/** GET /api/public/pledges/:id: the pledge's state, as the provider's webhook left it. */
export async function getPledge(id: string, signal?: AbortSignal): Promise<PublicPledge> {
  return (await api.get(`/api/public/pledges/${encodeURIComponent(id)}`, publicPledgeResponseSchema, signal)).pledge;
}

export function pledgeQueryOptions(id: string) {
  return queryOptions({ queryKey: ['public', 'pledges', id], queryFn: ({ signal }) => getPledge(id, signal) });
}

/**
 * Asks again while the payment is not confirmed (the reader may be back before the webhook),
 * about two minutes at most; then the page says to look again later.
 */
export function usePledge(id: string) {
  const options = pledgeQueryOptions(id);
  const asked = useQueryClient().getQueryState(options.queryKey)?.dataUpdateCount ?? 0;
  const query = useQuery({
    ...options,
    refetchInterval: (query) => {
      const status = query.state.data?.status;
      const waiting = status === undefined || status === 'pending' || status === 'failed';
      return waiting && query.state.dataUpdateCount < PLEDGE_POLL_LIMIT ? PLEDGE_POLL_MS : false;
    },
  });
  return { ...query, gaveUp: asked >= PLEDGE_POLL_LIMIT };
}

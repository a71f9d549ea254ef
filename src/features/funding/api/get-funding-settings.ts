import { queryOptions, useQuery } from '@tanstack/react-query';
import { fundingSettingsSchema, type FundingSettings } from '#shared/schemas/funding.ts';
import { api } from '#src/lib/api-client.ts';

/** GET /api/public/funding: the currency, one bench day, the smallest pledge, the refund deadline. */
export function getFundingSettings(signal?: AbortSignal): Promise<FundingSettings> {
  return api.get('/api/public/funding', fundingSettingsSchema, signal);
}

export function fundingSettingsQueryOptions() {
  return queryOptions({ queryKey: ['public', 'funding-settings'], queryFn: ({ signal }) => getFundingSettings(signal), staleTime: 5 * 60_000 });
}

export function useFundingSettings() {
  return useQuery(fundingSettingsQueryOptions());
}

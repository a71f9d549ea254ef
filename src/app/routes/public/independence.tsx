import type { QueryClient } from '@tanstack/react-query';
import { PageHeader } from '#src/components/page-header.tsx';
import { fundingSettingsQueryOptions, useFundingSettings } from '#src/features/funding/api/get-funding-settings.ts';
import { IndependenceStatement } from '#src/features/public-site/components/independence.tsx';

export const clientLoader = (queryClient: QueryClient) => async () => {
  void queryClient.prefetchQuery(fundingSettingsQueryOptions());
  return null;
};

/** Who pays for the tests, what the lab never accepts, and what happens to readers' money. */
export default function IndependenceRoute() {
  const settings = useFundingSettings();
  return (
    <>
      <PageHeader
        eyebrow="Independence"
        title="Who pays for our tests"
        description="Readers fund the tests they ask for. Makers pay for nothing, and nothing they offer changes what we publish."
      />
      <IndependenceStatement settings={settings.data} />
    </>
  );
}

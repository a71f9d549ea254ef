import { useQueryClient, type QueryClient } from '@tanstack/react-query';
import { useCallback } from 'react';
import { Link, useParams, useSearchParams, type LoaderFunctionArgs } from 'react-router-dom';
import { ErrorState } from '#src/components/error-state.tsx';
import { PageHeader } from '#src/components/page-header.tsx';
import { Spinner } from '#src/components/spinner.tsx';
import { fundingSettingsQueryOptions, useFundingSettings } from '#src/features/funding/api/get-funding-settings.ts';
import { FundingProgress } from '#src/features/funding/components/funding-progress.tsx';
import { PledgeForm } from '#src/features/funding/components/pledge-form.tsx';
import { PledgeStatusNotice } from '#src/features/funding/components/pledge-status.tsx';
import { testRequestQueryKey, testRequestQueryOptions, useTestRequest } from '#src/features/test-requests/api/get-test-request.ts';
import { RequestDetail } from '#src/features/test-requests/components/request-detail.tsx';
import { isApiError } from '#src/lib/api-client.ts';

export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ params }: LoaderFunctionArgs) => {
    if (params.id) void queryClient.prefetchQuery(testRequestQueryOptions(params.id));
    void queryClient.prefetchQuery(fundingSettingsQueryOptions());
    return null;
  };

/**
 * One request's page: what was asked, its funding against the goal, the pledge form while it
 * takes pledges, and — back from the payment page with ?pledge= — the pledge's confirmation.
 */
export default function RequestDetailRoute() {
  const { id = '' } = useParams();
  const [search] = useSearchParams();
  const pledgeId = search.get('pledge');
  const cancelled = search.get('cancelled') === '1';
  const request = useTestRequest(id);
  const settings = useFundingSettings();
  const queryClient = useQueryClient();
  // Once the webhook has settled the pledge, the amount raised is read again.
  const refresh = useCallback(() => void queryClient.invalidateQueries({ queryKey: testRequestQueryKey(id) }), [queryClient, id]);

  if (request.isPending) return <Spinner label="Loading the request…" />;
  if (request.isError) {
    if (isApiError(request.error) && request.error.status === 404) {
      return (
        <>
          <PageHeader title="Request not found" description="No listed request has this address: it may not be confirmed yet, or it was merged into another." />
          <p>
            <Link to="/request">All test requests</Link>
          </p>
        </>
      );
    }
    return <ErrorState error={request.error} onRetry={() => void request.refetch()} />;
  }
  const r = request.data;
  const device = `${r.maker} ${r.model}`;
  return (
    <>
      <PageHeader eyebrow="Test request" title={device} description="Readers asked us to measure this device. Vote for it, or help pay for the unit and the bench time." />
      {pledgeId ? (
        <div className="mb-8 max-w-measure">
          <PledgeStatusNotice pledgeId={pledgeId} cancelled={cancelled} onSettled={refresh} />
        </div>
      ) : null}
      <RequestDetail request={r}>
        <section aria-labelledby="funding-heading" className="max-w-measure space-y-3">
          <h2 id="funding-heading" className="text-xl font-semibold">
            Funding
          </h2>
          <FundingProgress funding={r.funding} />
        </section>
        {r.funding.open && r.funding.goal && settings.data ? <PledgeForm requestId={r.id} device={device} settings={settings.data} currency={r.funding.goal.currency} /> : null}
      </RequestDetail>
      <p className="mt-section font-sans text-sm">
        <Link to="/request">All test requests</Link> · <Link to="/independence">Who pays for our tests</Link>
      </p>
    </>
  );
}

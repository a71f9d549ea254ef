import type { QueryClient } from '@tanstack/react-query';
import { ErrorState } from '#src/components/error-state.tsx';
import { PageHeader } from '#src/components/page-header.tsx';
import { Spinner } from '#src/components/spinner.tsx';
import { testRequestsQueryOptions, useTestRequests } from '#src/features/test-requests/api/get-test-requests.ts';
import { RequestForm } from '#src/features/test-requests/components/request-form.tsx';
import { RequestList } from '#src/features/test-requests/components/request-list.tsx';
import { FundingProgress } from '#src/features/funding/components/funding-progress.tsx';
import { Link } from 'react-router-dom';

export const clientLoader = (queryClient: QueryClient) => async () => {
  void queryClient.prefetchQuery(testRequestsQueryOptions());
  return null;
};

export default function RequestRoute() {
  const requests = useTestRequests();
  return (
    <>
      <PageHeader
        eyebrow="Request a test"
        title="Which device should we test next?"
        description={
          <>
            Ask for a device, or vote for one already asked for. Votes count once confirmed by e-mail, one per address. Readers pay for the tests they ask for,
            never makers: <Link to="/independence">who pays for our tests</Link>.
          </>
        }
      />
      <div className="grid gap-section lg:grid-cols-[3fr_2fr]">
        <section aria-labelledby="requests-heading">
          <h2 id="requests-heading" className="mb-4 text-xl font-semibold">
            Requests, most votes first
          </h2>
          {requests.isPending ? (
            <Spinner label="Loading the requests…" />
          ) : requests.isError ? (
            <ErrorState inline title="The requests could not be loaded" error={requests.error} onRetry={() => void requests.refetch()} />
          ) : (
            <RequestList requests={requests.data} funding={(r) => <FundingProgress funding={r.funding} compact />} />
          )}
        </section>
        <div>
          <RequestForm />
        </div>
      </div>
    </>
  );
}

import type { QueryClient } from '@tanstack/react-query';
import { Link } from 'react-router-dom';
import { ErrorState } from '#src/components/error-state.tsx';
import { PageHeader } from '#src/components/page-header.tsx';
import { Spinner } from '#src/components/spinner.tsx';
import { approvedRunsQueryOptions, useApprovedRuns } from '#src/features/lab-reports/api/get-approved-runs.ts';
import { NewReportForm } from '#src/features/lab-reports/components/new-report-form.tsx';

export const clientLoader = (queryClient: QueryClient) => async () => {
  void queryClient.prefetchQuery(approvedRunsQueryOptions());
  return null;
};

/** A new report, as a draft over approved runs of one model. */
export default function NewReportRoute() {
  const runs = useApprovedRuns();
  return (
    <>
      <PageHeader
        eyebrow="Lab · Reports"
        title="New report"
        description="Choose the approved runs it covers, give it a title and a summary, and write it up. It stays a private draft until you publish it."
      />
      <h2 id="new-report-heading" className="sr-only">
        The report
      </h2>
      {runs.isPending ? (
        <Spinner label="Loading approved runs…" />
      ) : runs.isError ? (
        <ErrorState inline title="The approved runs could not be loaded" error={runs.error} onRetry={() => void runs.refetch()} />
      ) : runs.data.length === 0 ? (
        <p className="font-sans text-sm text-ink-soft">
          No run is approved and waiting for a report. A run needs an editor's approval first: see <Link to="/lab/review">Review</Link>.
        </p>
      ) : (
        <div className="max-w-3xl">
          <NewReportForm runs={runs.data} />
        </div>
      )}
    </>
  );
}

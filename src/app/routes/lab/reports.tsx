import type { QueryClient } from '@tanstack/react-query';
import { Link } from 'react-router-dom';
import { can } from '#shared/auth/capabilities.ts';
import { buttonClasses } from '#src/components/button.tsx';
import { ErrorState } from '#src/components/error-state.tsx';
import { PageHeader } from '#src/components/page-header.tsx';
import { Spinner } from '#src/components/spinner.tsx';
import { useMe } from '#src/features/auth/api/get-me.ts';
import { labReportsQueryOptions, useLabReports } from '#src/features/lab-reports/api/get-lab-reports.ts';
import { LabReportsTable } from '#src/features/lab-reports/components/lab-reports-table.tsx';

export const clientLoader = (queryClient: QueryClient) => async () => {
  void queryClient.prefetchQuery(labReportsQueryOptions());
  return null;
};

/** The lab's reports: drafts, published and retracted, with their versions. */
export default function LabReportsRoute() {
  const me = useMe().data?.user;
  const canPublish = Boolean(me && can(me.role, 'reports.publish'));
  const reports = useLabReports();
  return (
    <>
      <PageHeader
        eyebrow="Lab"
        title="Reports"
        description="A report is the public account of one or more approved runs of a model. Drafts are private; publishing freezes the figures, a correction publishes a new version with a note, and a retraction keeps the page with the reason."
        actions={
          canPublish ? (
            <Link to="/lab/reports/new" className={buttonClasses('primary')}>
              New report
            </Link>
          ) : null
        }
      />
      {reports.isPending ? (
        <Spinner label="Loading reports…" />
      ) : reports.isError ? (
        <ErrorState error={reports.error} onRetry={() => void reports.refetch()} />
      ) : reports.data.length === 0 ? (
        <p className="font-sans text-sm text-ink-soft">
          No reports yet.{' '}
          {canPublish ? (
            <>
              <Link to="/lab/reports/new">Make the first</Link> from an approved run.
            </>
          ) : (
            'An editor makes them from approved runs.'
          )}
        </p>
      ) : (
        <LabReportsTable reports={reports.data} canPublish={canPublish} />
      )}
    </>
  );
}

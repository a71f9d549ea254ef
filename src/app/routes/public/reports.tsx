import type { QueryClient } from '@tanstack/react-query';
import { Link } from 'react-router-dom';
import { ErrorState } from '#src/components/error-state.tsx';
import { PageHeader } from '#src/components/page-header.tsx';
import { Spinner } from '#src/components/spinner.tsx';
import { UnitsToggle } from '#src/components/units-toggle.tsx';
import { publicReportsQueryOptions, usePublicReports } from '#src/features/public-reports/api/get-public-reports.ts';
import { ColumnNotes } from '#src/features/public-reports/components/column-notes.tsx';
import { MeasurementsNote } from '#src/features/public-reports/components/measurements-note.tsx';
import { ReportsFilters } from '#src/features/public-reports/components/reports-filters.tsx';
import { ReportsTable } from '#src/features/public-reports/components/reports-table.tsx';
import { useReportsIndexSearch } from '#src/features/public-reports/hooks/use-reports-index-search.ts';

export const clientLoader = (queryClient: QueryClient) => async () => {
  void queryClient.prefetchQuery(publicReportsQueryOptions());
  return null;
};

/** Every published report in one table: sort, filter and search, all kept in the address. */
export default function ReportsRoute() {
  const reports = usePublicReports();
  const list = useReportsIndexSearch();
  return (
    <>
      <PageHeader
        title="Reports"
        description={
          <>
            Every unit we have published, with its key figures side by side. Sort by any column, narrow the list, or pick two to
            four reports to <Link to="/compare">compare</Link> on the same scales.
          </>
        }
      />
      <div className="space-y-8">
        <UnitsToggle />
        {reports.isPending ? (
          <Spinner label="Loading the reports…" />
        ) : reports.isError ? (
          <ErrorState inline title="The reports could not be loaded" error={reports.error} onRetry={() => void reports.refetch()} />
        ) : reports.data.length === 0 ? (
          <p className="text-lg">
            No reports are published yet. <Link to="/subscribe">Get an e-mail</Link> when the first one is out.
          </p>
        ) : (
          <div className="space-y-4">
            <ReportsFilters reports={reports.data} list={list} />
            <ReportsTable reports={reports.data} list={list} />
          </div>
        )}
        <MeasurementsNote />
        <ColumnNotes />
      </div>
    </>
  );
}

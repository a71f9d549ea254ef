import type { QueryClient } from '@tanstack/react-query';
import { useLocation, useParams, type LoaderFunctionArgs } from 'react-router-dom';
import { can } from '#shared/auth/capabilities.ts';
import { ErrorState } from '#src/components/error-state.tsx';
import { PageHeader } from '#src/components/page-header.tsx';
import { Spinner } from '#src/components/spinner.tsx';
import { useMe } from '#src/features/auth/api/get-me.ts';
import { labReportQueryOptions, useLabReport } from '#src/features/lab-reports/api/get-lab-reports.ts';
import { ReportManager } from '#src/features/lab-reports/components/report-manager.tsx';

export const clientLoader = (queryClient: QueryClient) => async ({ params }: LoaderFunctionArgs) => {
  void queryClient.prefetchQuery(labReportQueryOptions(params.reportId!));
  return null;
};

/** One report for staff: its state, and the steps its state allows. */
export default function LabReportRoute() {
  const reportId = useParams().reportId!;
  const me = useMe().data?.user;
  const location = useLocation();
  const report = useLabReport(reportId);
  if (report.isPending) return <Spinner label="Loading the report…" />;
  if (report.isError) return <ErrorState error={report.error} onRetry={() => void report.refetch()} />;
  const created = Boolean((location.state as { created?: boolean } | null)?.created);
  return (
    <>
      <PageHeader eyebrow={`Lab · Report of ${report.data.makerName} ${report.data.modelName}`} title={report.data.title} />
      <ReportManager report={report.data} canPublish={Boolean(me && can(me.role, 'reports.publish'))} created={created} />
    </>
  );
}

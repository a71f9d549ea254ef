import type { QueryClient } from '@tanstack/react-query';
import { useParams, type LoaderFunctionArgs } from 'react-router-dom';
import { ErrorState } from '#src/components/error-state.tsx';
import { Spinner } from '#src/components/spinner.tsx';
import { reportQueryOptions, useReport } from '#src/features/report/api/get-report.ts';
import { ReportNotFound } from '#src/features/report/components/report-not-found.tsx';
import { ReportView } from '#src/features/report/components/report-view.tsx';
import { ReportPlanner } from '#src/app/compose/report-planner.tsx';
import { parseVersionParam } from '#src/features/report/utils/report-urls.ts';
import { isApiError } from '#src/lib/api-client.ts';

/** `/reports/:slug` is the latest version; `/reports/:slug/versions/:n` one version, forever. */
function versionFrom(n: string | undefined): { version: number | null; valid: boolean } {
  if (n === undefined) return { version: null, valid: true };
  const version = parseVersionParam(n);
  return { version, valid: version !== null };
}

export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ params }: LoaderFunctionArgs) => {
    const { version, valid } = versionFrom(params.n);
    if (!params.slug || !valid) return null;
    // The page draws whole once the report is here; a failure (404 included) is the page's to show.
    await queryClient.ensureQueryData(reportQueryOptions(params.slug, version)).catch(() => undefined);
    return null;
  };

function ReportPage({ slug, version }: { slug: string; version: number | null }) {
  const report = useReport(slug, version);
  if (report.isPending) return <Spinner label="Loading the report…" />;
  if (report.isError) {
    if (isApiError(report.error) && report.error.status === 404) return <ReportNotFound version={version} />;
    return <ErrorState error={report.error} onRetry={() => void report.refetch()} />;
  }
  return <ReportView key={`${slug}/${report.data.version}`} report={report.data} planner={<ReportPlanner report={report.data} />} />;
}

export default function ReportRoute() {
  const { slug = '', n } = useParams();
  const { version, valid } = versionFrom(n);
  if (!valid) return <ReportNotFound version={null} />;
  return <ReportPage slug={slug} version={version} />;
}

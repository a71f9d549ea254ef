import type { QueryClient } from '@tanstack/react-query';
import { useMemo } from 'react';
import { useParams, type LoaderFunctionArgs } from 'react-router-dom';
import { can } from '#shared/auth/capabilities.ts';
import { ErrorState } from '#src/components/error-state.tsx';
import { PageHeader } from '#src/components/page-header.tsx';
import { Spinner } from '#src/components/spinner.tsx';
import { meQueryOptions } from '#src/features/auth/api/get-me.ts';
import { previewQueryOptions, usePreview } from '#src/features/report/api/get-preview.ts';
import { ReportView } from '#src/features/report/components/report-view.tsx';
import { ReportPlanner } from '#src/app/compose/report-planner.tsx';
import { isApiError } from '#src/lib/api-client.ts';

export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ params }: LoaderFunctionArgs) => {
    // Only an editor may ask; the guard explains the refusal to anyone else.
    const me = await queryClient.ensureQueryData(meQueryOptions()).catch(() => null);
    if (params.id && me?.user && can(me.user.role, 'reports.publish')) {
      await queryClient.ensureQueryData(previewQueryOptions(params.id)).catch(() => undefined);
    }
    return null;
  };

/** Staff: exactly what the public will see once this draft (or correction) is published. */
export default function ReportPreviewRoute() {
  const id = useParams().id ?? '';
  const preview = usePreview(id);
  // The server marks a preview; marked here too, so the banner can never go missing.
  const report = useMemo(() => (preview.data ? { ...preview.data, preview: true } : null), [preview.data]);
  if (preview.isPending) return <Spinner label="Computing the preview…" />;
  if (preview.isError) {
    if (isApiError(preview.error) && preview.error.status === 404) {
      return (
        <>
          <PageHeader title="No such report" />
          <p className="text-lg text-ink-soft">There is no report with this id to preview.</p>
        </>
      );
    }
    return <ErrorState error={preview.error} onRetry={() => void preview.refetch()} />;
  }
  return report ? <ReportView report={report} planner={<ReportPlanner report={report} />} /> : null;
}

import { useQueryClient, type QueryClient } from '@tanstack/react-query';
import { useEffect, useState } from 'react';
import { Link, useParams, type LoaderFunctionArgs } from 'react-router-dom';
import { can } from '#shared/auth/capabilities.ts';
import { runIsEditable } from '#shared/lab/run-workflow.ts';
import { Cautions } from '#src/components/cautions.tsx';
import { ErrorState } from '#src/components/error-state.tsx';
import { PageHeader } from '#src/components/page-header.tsx';
import { SegmentedChoice } from '#src/components/segmented-choice.tsx';
import { Spinner } from '#src/components/spinner.tsx';
import { useMe } from '#src/features/auth/api/get-me.ts';
import { useAnalysis } from '#src/features/runs/api/get-analysis.ts';
import { useAudit } from '#src/features/runs/api/get-audit.ts';
import { useReadings } from '#src/features/runs/api/get-readings.ts';
import { runIsBusy, runQueryOptions, useRun } from '#src/features/runs/api/get-run.ts';
import { AuditTrail } from '#src/features/runs/components/audit-trail.tsx';
import { CommentsPanel } from '#src/features/runs/components/comments-panel.tsx';
import { FlagsList } from '#src/features/runs/components/flags-list.tsx';
import { ReadingDetail } from '#src/features/runs/components/reading-detail.tsx';
import { ReadingsGrid } from '#src/features/runs/components/readings-grid.tsx';
import { ReviewActions } from '#src/features/runs/components/review-actions.tsx';
import { RunFigures } from '#src/features/runs/components/run-figures.tsx';
import { RunStatusBadge } from '#src/features/runs/components/run-status-badge.tsx';
import { RunSummary } from '#src/features/runs/components/run-summary.tsx';
import { UploadPanel } from '#src/features/runs/components/upload-panel.tsx';
import { formatLength } from '#src/lib/format.ts';

export const clientLoader = (queryClient: QueryClient) => async ({ params }: LoaderFunctionArgs) => {
  void queryClient.prefetchQuery(runQueryOptions(params.runId!));
  return null;
};

/** One run for staff: its files and progress, readings, flags, figures, review, comments and audit trail. */
export default function RunRoute() {
  const runId = useParams().runId!;
  const me = useMe().data?.user;
  const run = useRun(runId);
  const busy = runIsBusy(run.data);
  const readings = useReadings(runId, busy);
  const analysis = useAnalysis(runId, busy);
  const audit = useAudit(runId, `${run.data?.status}-${run.data?.updatedAt}-${run.data?.progress.received}`);
  const [selectedId, setSelectedId] = useState<string | null>(null);
  const [picked, setPicked] = useState<number | null>(null);
  const queryClient = useQueryClient();
  const p = run.data?.progress;
  const progressKey = p ? `${p.received}-${p.analysed}-${p.failed}-${p.excluded}-${p.analysing}-${run.data?.status}` : '';
  // Whenever the run's progress moves, the readings and figures follow (one last fetch after polling stops too).
  useEffect(() => {
    if (!progressKey) return;
    void queryClient.invalidateQueries({ queryKey: ['lab', 'runs', runId, 'readings'] });
    void queryClient.invalidateQueries({ queryKey: ['lab', 'runs', runId, 'analysis'] });
  }, [progressKey, queryClient, runId]);

  if (run.isPending) return <Spinner label="Loading the run…" />;
  if (run.isError) return <ErrorState error={run.error} onRetry={() => void run.refetch()} />;
  const r = run.data;
  const distances = [...r.grid.distancesCm].sort((a, b) => a - b);
  const distance = picked !== null && distances.includes(picked) ? picked : distances[0];
  const selected = readings.data?.find((x) => x.id === selectedId) ?? null;
  const flaggedIds = new Set(
    (analysis.data?.flags ?? [])
      .filter((f) => f.point)
      .flatMap((f) =>
        (readings.data ?? [])
          .filter((x) => f.point && Math.abs(x.distanceCm - f.point.distanceCm) < 1e-6 && Math.abs(x.xCm - f.point.xCm) < 1e-6 && Math.abs(x.yCm - f.point.yCm) < 1e-6)
          .map((x) => x.id),
      ),
  );
  const editable = runIsEditable(r.status) && Boolean(me && can(me.role, 'runs.upload'));

  return (
    <>
      <PageHeader
        eyebrow="Lab · Run"
        title={`${r.unit.makerName} ${r.unit.modelName}`}
        description={
          <span className="flex flex-wrap items-center gap-3 font-sans text-base">
            <RunStatusBadge status={r.status} /> serial {r.unit.serial} · {r.instrument.kind === 'irradiance_meter' ? 'meter run' : 'spectroradiometer run'}
          </span>
        }
        actions={
          <Link to="/lab/runs" className="font-sans text-sm font-semibold">
            All runs
          </Link>
        }
      />
      <div className="space-y-section">
        <RunSummary run={r} />
        {me ? <ReviewActions run={r} me={me} /> : null}
        {editable ? <UploadPanel run={r} /> : null}
        <section aria-labelledby="flags-heading" className="space-y-3">
          <h2 id="flags-heading" className="text-xl font-semibold">
            Flags
          </h2>
          {analysis.data ? <FlagsList flags={analysis.data.flags} /> : <Spinner label="Loading the flags…" />}
        </section>
        <section aria-labelledby="figures-heading" className="space-y-4">
          <h2 id="figures-heading" className="text-xl font-semibold">
            Figures
          </h2>
          <Cautions headingLevel={3} title="Cautions for these figures" />
          {analysis.data && readings.data ? <RunFigures run={r} readings={readings.data} analysis={analysis.data} /> : <Spinner label="Loading the figures…" />}
        </section>
        <section aria-labelledby="readings-heading" className="space-y-4">
          <h2 id="readings-heading" className="text-xl font-semibold">
            Readings
          </h2>
          <SegmentedChoice legend="Plane (distance)" options={distances.map((d) => ({ value: d, label: `${formatLength(d)} cm` }))} value={distance} onChange={setPicked} />
          {readings.data ? (
            <ReadingsGrid readings={readings.data} distanceCm={distance} selectedId={selectedId} flagged={flaggedIds} onSelect={setSelectedId} />
          ) : (
            <Spinner label="Loading the readings…" />
          )}
          {selected ? <ReadingDetail runId={runId} reading={selected} editable={editable} /> : <p className="font-sans text-sm text-ink-soft">Choose a reading to see its file, spectrum and history.</p>}
        </section>
        <CommentsPanel runId={runId} selected={selected} />
        {audit.data ? <AuditTrail events={audit.data} /> : null}
      </div>
    </>
  );
}

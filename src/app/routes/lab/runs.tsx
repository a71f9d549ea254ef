import { Link, useSearchParams } from 'react-router-dom';
import { can } from '#shared/auth/capabilities.ts';
import { RUN_STATUSES, RUN_STATUS_LABELS } from '#shared/lab/run-workflow.ts';
import { buttonClasses } from '#src/components/button.tsx';
import { ErrorState } from '#src/components/error-state.tsx';
import { PageHeader } from '#src/components/page-header.tsx';
import { Select } from '#src/components/select-field.tsx';
import { Spinner } from '#src/components/spinner.tsx';
import { useMe } from '#src/features/auth/api/get-me.ts';
import { useRuns } from '#src/features/runs/api/get-runs.ts';
import { RunsTable } from '#src/features/runs/components/runs-table.tsx';
import { formatCount } from '#src/lib/format.ts';

const PAGE_SIZE = 25;

/** Every run of the lab, newest first; the state filter and the page live in the URL. */
export default function RunsRoute() {
  const me = useMe().data?.user;
  const [params, setParams] = useSearchParams();
  const status = params.get('status') ?? '';
  const page = Math.max(1, Number(params.get('page') ?? 1) || 1);
  const runs = useRuns({ status, sort: 'createdAt', dir: 'desc', page, pageSize: PAGE_SIZE });
  const set = (next: Record<string, string>) => {
    const p = new URLSearchParams(params);
    for (const [k, v] of Object.entries(next)) (v ? p.set(k, v) : p.delete(k));
    setParams(p);
  };
  const total = runs.data?.total ?? 0;
  const pages = Math.max(1, Math.ceil(total / PAGE_SIZE));
  return (
    <>
      <PageHeader
        eyebrow="Lab"
        title="Runs"
        description="Each run is one unit measured with one instrument on one grid. Open a run to upload its files, follow the analysis and take it through review."
        actions={
          me && can(me.role, 'runs.create') ? (
            <Link to="/lab/runs/new" className={buttonClasses('primary')}>
              New run
            </Link>
          ) : null
        }
      />
      <div className="mb-4 flex flex-wrap items-end gap-4">
        <label className="font-sans text-sm font-semibold">
          State
          <Select
            className="ml-2 min-w-48"
            value={status}
            onChange={(e) => set({ status: e.target.value, page: '' })}
            options={[{ value: '', label: 'All states' }, ...RUN_STATUSES.map((s) => ({ value: s, label: RUN_STATUS_LABELS[s] }))]}
          />
        </label>
        <p className="font-sans text-sm text-ink-soft" aria-live="polite">
          {runs.data ? `${formatCount(total)} ${total === 1 ? 'run' : 'runs'}` : ''}
        </p>
      </div>
      {runs.isPending ? (
        <Spinner label="Loading runs…" />
      ) : runs.isError ? (
        <ErrorState error={runs.error} onRetry={() => void runs.refetch()} />
      ) : (
        <RunsTable runs={runs.data.items} caption="Runs" meId={me?.id} />
      )}
      {pages > 1 ? (
        <nav aria-label="Pages" className="mt-4 flex items-center gap-3 font-sans text-sm">
          <button type="button" className={buttonClasses('secondary', 'sm')} disabled={page <= 1} onClick={() => set({ page: String(page - 1) })}>
            Previous
          </button>
          <span>
            Page {page} of {pages}
          </span>
          <button type="button" className={buttonClasses('secondary', 'sm')} disabled={page >= pages} onClick={() => set({ page: String(page + 1) })}>
            Next
          </button>
        </nav>
      ) : null}
    </>
  );
}

import { PageHeader } from '#src/components/page-header.tsx';
import { Spinner } from '#src/components/spinner.tsx';
import { ErrorState } from '#src/components/error-state.tsx';
import { useMe } from '#src/features/auth/api/get-me.ts';
import { useRuns } from '#src/features/runs/api/get-runs.ts';
import { RunsTable } from '#src/features/runs/components/runs-table.tsx';

/** What waits for an editor: submitted runs, oldest first. */
export default function ReviewRoute() {
  const me = useMe().data?.user;
  const queue = useRuns({ sort: 'createdAt', dir: 'asc', pageSize: 100 }, 'review');
  const mine = queue.data?.items.filter((r) => r.measuredBy.id !== me?.id) ?? [];
  const own = queue.data?.items.filter((r) => r.measuredBy.id === me?.id) ?? [];
  return (
    <>
      <PageHeader
        eyebrow="Lab"
        title="Review"
        description="Runs submitted for review, oldest first. Check the readings, the flags and the figures; request changes with a note, or approve. A run you measured goes to another editor."
      />
      {queue.isPending ? (
        <Spinner label="Loading the queue…" />
      ) : queue.isError ? (
        <ErrorState error={queue.error} onRetry={() => void queue.refetch()} />
      ) : (
        <div className="space-y-section">
          <section className="space-y-3">
            <h2 className="text-xl font-semibold">Waiting for you ({mine.length})</h2>
            <RunsTable runs={mine} caption="Runs waiting for your review" meId={me?.id} />
          </section>
          {own.length ? (
            <section className="space-y-3">
              <h2 className="text-xl font-semibold">Your own runs under review ({own.length})</h2>
              <RunsTable runs={own} caption="Your runs waiting for another editor" meId={me?.id} />
            </section>
          ) : null}
        </div>
      )}
    </>
  );
}

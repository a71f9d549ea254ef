import type { ReactNode } from 'react';
import { Link } from 'react-router-dom';
import { TEST_REQUEST_STATUS_LABELS, type PublicTestRequest } from '#shared/schemas/test-requests.ts';
import { formatCount, formatDate } from '#src/lib/format.ts';
import { VoteForm } from './vote-form.tsx';

/**
 * One request on its own page: what was asked and why, its state, the votes, and a slot for what
 * the page composes around it (the funding, the pledge form).
 */
export function RequestDetail({ request: r, children }: { request: PublicTestRequest; children?: ReactNode }) {
  const device = `${r.maker} ${r.model}`;
  const votable = r.status === 'open' || r.status === 'planned';
  return (
    <div className="space-y-8">
      <dl className="grid max-w-measure grid-cols-[minmax(8rem,auto)_1fr] gap-x-4 gap-y-1.5 font-sans text-sm">
        <dt className="font-semibold text-ink-soft">State</dt>
        <dd>{TEST_REQUEST_STATUS_LABELS[r.status]}</dd>
        <dt className="font-semibold text-ink-soft">Votes</dt>
        <dd>{formatCount(r.votes)}</dd>
        <dt className="font-semibold text-ink-soft">Asked</dt>
        <dd>{formatDate(r.createdAt)}</dd>
        <dt className="font-semibold text-ink-soft">Where it is sold</dt>
        <dd>
          <a href={r.link} rel="noopener noreferrer nofollow">
            maker’s or shop page
          </a>
        </dd>
      </dl>
      <section aria-labelledby="why-heading" className="max-w-measure space-y-2">
        <h2 id="why-heading" className="text-xl font-semibold">
          Why readers asked
        </h2>
        <p>{r.reason}</p>
        {r.status === 'declined' && r.declineReason ? <p className="font-sans text-sm">Not planned: {r.declineReason}</p> : null}
        {r.report ? (
          <p className="font-sans text-sm">
            Tested: <Link to={`/reports/${r.report.slug}`}>{r.report.title}</Link>
          </p>
        ) : null}
      </section>
      {children}
      {votable ? (
        <section aria-labelledby="vote-heading" className="max-w-measure space-y-3">
          <h2 id="vote-heading" className="text-xl font-semibold">
            Vote for it
          </h2>
          <p className="font-sans text-sm text-ink-soft">A vote costs nothing: it tells us how many readers want this test.</p>
          <VoteForm requestId={r.id} device={device} />
        </section>
      ) : null}
    </div>
  );
}

import { useState, type ReactNode } from 'react';
import { Link } from 'react-router-dom';
import { TEST_REQUEST_STATUS_LABELS, type PublicTestRequest } from '#shared/schemas/test-requests.ts';
import { Button } from '#src/components/button.tsx';
import { formatCount, formatDate } from '#src/lib/format.ts';
import { VoteForm } from './vote-form.tsx';

/**
 * Requests by votes; each open or planned one can be voted for in place, and each has its own
 * page. `funding` draws a request's money (composed by the page).
 */
export function RequestList({ requests, funding }: { requests: readonly PublicTestRequest[]; funding?: (r: PublicTestRequest) => ReactNode }) {
  const [votingFor, setVotingFor] = useState<string | null>(null);
  if (requests.length === 0) return <p className="text-ink-soft">No requests yet. Be the first to ask.</p>;
  return (
    <ol className="space-y-4" aria-label="Test requests, most votes first">
      {requests.map((r) => {
        const device = `${r.maker} ${r.model}`;
        const votable = r.status === 'open' || r.status === 'planned';
        return (
          <li key={r.id} className="rounded-md border border-rule bg-paper-raised px-5 py-4 shadow-sheet">
            <div className="flex flex-wrap items-baseline justify-between gap-3">
              <h3 className="text-lg font-semibold">
                <Link to={`/requests/${r.id}`}>{device}</Link>
              </h3>
              <p className="font-sans text-sm">
                <strong>{formatCount(r.votes)}</strong> {r.votes === 1 ? 'vote' : 'votes'} · <span className="bl-label">{TEST_REQUEST_STATUS_LABELS[r.status]}</span>
              </p>
            </div>
            <p className="mt-2 text-ink-soft">{r.reason}</p>
            {funding && r.funding.goal ? <div className="mt-3">{funding(r)}</div> : null}
            <p className="mt-2 font-sans text-xs text-ink-muted">
              Asked {formatDate(r.createdAt)} ·{' '}
              <a href={r.link} rel="noopener noreferrer nofollow">
                maker’s or shop page
              </a>
            </p>
            {r.status === 'declined' && r.declineReason ? <p className="mt-2 font-sans text-sm">Not planned: {r.declineReason}</p> : null}
            {r.report ? (
              <p className="mt-2 font-sans text-sm">
                Tested: <Link to={`/reports/${r.report.slug}`}>{r.report.title}</Link>
              </p>
            ) : null}
            {votable ? (
              <div className="mt-3">
                {votingFor === r.id ? (
                  <VoteForm requestId={r.id} device={device} />
                ) : (
                  <Button variant="secondary" size="sm" onClick={() => setVotingFor(r.id)} aria-label={`Vote for the ${device}`}>
                    Vote
                  </Button>
                )}
              </div>
            ) : null}
          </li>
        );
      })}
    </ol>
  );
}

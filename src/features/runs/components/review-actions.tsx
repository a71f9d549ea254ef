import { useState } from 'react';
import { can } from '#shared/auth/capabilities.ts';
import { canTransition } from '#shared/lab/run-workflow.ts';
import type { Run } from '#shared/schemas/runs.ts';
import type { SessionUser } from '#shared/schemas/users.ts';
import { Alert } from '#src/components/alert.tsx';
import { Button } from '#src/components/button.tsx';
import { TextField } from '#src/components/text-field.tsx';
import { isApiError } from '#src/lib/api-client.ts';
import { useRunAction, type RunAction } from '../api/run-actions.ts';

/**
 * The workflow steps this person may take now. The server decides (capability, state, and never
 * approving a run one measured); the page shows only what would pass, and says why not otherwise.
 */
export function ReviewActions({ run, me }: { run: Run; me: SessionUser }) {
  const action = useRunAction(run.id);
  const [note, setNote] = useState('');
  const [noteError, setNoteError] = useState<string | undefined>();
  const [outcome, setOutcome] = useState<{ tone: 'success' | 'error'; text: string } | null>(null);
  const reviewer = can(me.role, 'runs.review');
  const measurer = run.measuredBy.id === me.id;

  const go = (name: RunAction) => {
    if (name === 'request-changes' && !note.trim()) {
      setNoteError('Say what needs changing.');
      return;
    }
    setNoteError(undefined);
    action.mutate(
      { action: name, note: note.trim() || undefined },
      {
        onSuccess: (r) => {
          setNote('');
          setOutcome({ tone: 'success', text: name === 'submit' ? 'Submitted for review.' : name === 'approve' ? 'Approved.' : 'Sent back to the tester with your note.' });
          void r;
        },
        onError: (err) => setOutcome({ tone: 'error', text: isApiError(err) ? err.message : 'That step did not go through.' }),
      },
    );
  };

  const canSubmit = can(me.role, 'runs.upload') && canTransition('submit', run.status);
  const canReview = reviewer && canTransition('approve', run.status);
  return (
    <section aria-labelledby="review-heading" className="space-y-3">
      <h2 id="review-heading" className="text-xl font-semibold">
        Review
      </h2>
      <div aria-live="polite" className="empty:hidden">
        {outcome ? (
          <Alert tone={outcome.tone} live={false}>
            {outcome.text}
          </Alert>
        ) : null}
      </div>
      {canSubmit ? (
        <div className="flex flex-wrap items-center gap-3">
          <Button onClick={() => go('submit')} pending={action.isPending}>
            Submit for review
          </Button>
          <span className="font-sans text-xs text-ink-soft">Every grid point needs an analysed reading, or an exclusion with a reason.</span>
        </div>
      ) : null}
      {canReview ? (
        measurer ? (
          <p className="font-sans text-sm text-ink-soft">You measured this run, so another editor reviews it.</p>
        ) : (
          <div className="space-y-3">
            <TextField label="Note (needed to send it back)" value={note} error={noteError} onChange={(e) => setNote(e.target.value)} className="max-w-xl" />
            <div className="flex flex-wrap gap-3">
              <Button onClick={() => go('approve')} pending={action.isPending}>
                Approve
              </Button>
              <Button variant="secondary" onClick={() => go('request-changes')} pending={action.isPending}>
                Request changes
              </Button>
            </div>
          </div>
        )
      ) : null}
      {!canSubmit && !canReview ? (
        <p className="font-sans text-sm text-ink-soft">
          {run.status === 'submitted' ? 'Waiting for an editor’s review.' : run.status === 'approved' ? 'Approved: ready to publish.' : 'No step to take now.'}
        </p>
      ) : null}
    </section>
  );
}

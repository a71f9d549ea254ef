import { Link } from 'react-router-dom';
import { Alert } from '#src/components/alert.tsx';
import { Button } from '#src/components/button.tsx';
import { LinkProblem } from '#src/components/link-problem.tsx';
import { useConfirmVote } from '../api/confirm-vote.ts';

/** Confirms a vote (or a new request) only when the reader presses the button: one POST. */
export function ConfirmVote({ token }: { token: string }) {
  const confirm = useConfirmVote();
  if (confirm.isSuccess) {
    return (
      <Alert tone="success" title="Your vote counts">
        <p>Thank you. The list of requests is sorted by votes; editors look at it when planning the next tests.</p>
        <p className="mt-2">
          <Link to="/request">See the requests</Link>
        </p>
      </Alert>
    );
  }
  return (
    <div className="max-w-measure space-y-5">
      {confirm.isError ? <LinkProblem error={confirm.error} again={<Link to="/request">Vote again to get a new link.</Link>} /> : null}
      <p>Press the button to confirm your vote.</p>
      <Button onClick={() => confirm.mutate(token)} pending={confirm.isPending} disabled={!token}>
        Confirm my vote
      </Button>
    </div>
  );
}

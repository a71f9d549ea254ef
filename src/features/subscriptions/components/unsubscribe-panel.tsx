import { Link } from 'react-router-dom';
import { Alert } from '#src/components/alert.tsx';
import { Button } from '#src/components/button.tsx';
import { LinkProblem } from '#src/components/link-problem.tsx';
import { useUnsubscribe } from '../api/unsubscribe.ts';

/** One button: every e-mail to this address stops (reports, corrections, news of voted requests). */
export function UnsubscribePanel({ token }: { token: string }) {
  const unsubscribe = useUnsubscribe();
  if (unsubscribe.isSuccess) {
    return (
      <Alert tone="success" title="You are unsubscribed">
        <p>We will not e-mail this address again unless you subscribe or vote again.</p>
        <p className="mt-2">
          <Link to={`/subscribe/preferences?token=${encodeURIComponent(token)}`}>Your e-mail preferences</Link>
        </p>
      </Alert>
    );
  }
  return (
    <div className="max-w-measure space-y-5">
      {unsubscribe.isError ? <LinkProblem error={unsubscribe.error} again="Use the unsubscribe link of a more recent e-mail." /> : null}
      <p>Stop every e-mail from Benchlight to this address: new reports, corrections, and news of requests you voted for.</p>
      <Button variant="danger" onClick={() => unsubscribe.mutate(token)} pending={unsubscribe.isPending} disabled={!token}>
        Unsubscribe
      </Button>
      <p className="font-sans text-sm">
        Or <Link to={`/subscribe/preferences?token=${encodeURIComponent(token)}`}>change what you receive</Link> instead.
      </p>
    </div>
  );
}

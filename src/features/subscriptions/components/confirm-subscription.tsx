import { Link } from 'react-router-dom';
import { Alert } from '#src/components/alert.tsx';
import { Button } from '#src/components/button.tsx';
import { LinkProblem } from '#src/components/link-problem.tsx';
import { useConfirmSubscription } from '../api/confirm-subscription.ts';

/**
 * Confirms only when the reader presses the button (one POST): a mail scanner that opens the
 * link, or a browser that prefetches it, confirms nothing.
 */
export function ConfirmSubscription({ token }: { token: string }) {
  const confirm = useConfirmSubscription();
  if (confirm.isSuccess) {
    return (
      <Alert tone="success" title="You are subscribed">
        <p>We will e-mail you when a report matching your choices is published. Every e-mail links to your preferences and to a one-click unsubscribe.</p>
        <p className="mt-2">
          <Link to="/reports">Browse the reports already published</Link>
        </p>
      </Alert>
    );
  }
  return (
    <div className="max-w-measure space-y-5">
      {confirm.isError ? <LinkProblem error={confirm.error} again={<Link to="/subscribe">Subscribe again to get a new link.</Link>} /> : null}
      <p>Press the button to confirm that you want Benchlight’s report e-mails at this address.</p>
      <Button onClick={() => confirm.mutate(token)} pending={confirm.isPending} disabled={!token}>
        Confirm my subscription
      </Button>
    </div>
  );
}

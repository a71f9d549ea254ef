import { useEffect, useRef } from 'react';
import type { PledgeStatus } from '#shared/funding/pledge-workflow.ts';
import { Alert } from '#src/components/alert.tsx';
import { Spinner } from '#src/components/spinner.tsx';
import { formatMoney } from '#src/lib/format.ts';
import { usePledge } from '../api/get-pledge.ts';

/**
 * Where the payment page sends a reader back: thanks, and the pledge's state as the provider's
 * webhook decides it (the return itself proves nothing), asked again until it is known.
 */
export function PledgeStatusNotice({ pledgeId, cancelled, onSettled }: { pledgeId: string; cancelled: boolean; onSettled?: (status: PledgeStatus) => void }) {
  const pledge = usePledge(pledgeId);
  const status = pledge.data?.status;
  const told = useRef<PledgeStatus | null>(null);
  useEffect(() => {
    if (status && status !== 'pending' && told.current !== status) {
      told.current = status;
      onSettled?.(status);
    }
  }, [status, onSettled]);

  if (pledge.isError) return <Alert tone="warning" title="We could not look up your pledge">Reload the page in a moment to see whether your payment went through.</Alert>;
  if (!pledge.data) return <Spinner label="Looking up your pledge…" />;
  const amount = formatMoney(pledge.data.amountMinor, pledge.data.currency);
  switch (pledge.data.status) {
    case 'paid':
      return (
        <Alert tone="success" title="Thank you: your pledge is confirmed">
          The payment provider confirmed your payment of {amount}. It now counts toward the goal below.
        </Alert>
      );
    case 'refund_pending':
    case 'refunded':
      return <Alert tone="info" title="Your pledge has been refunded">{`Your ${amount} ${pledge.data.status === 'refunded' ? 'has gone back' : 'is on its way back'} to your card: this test will not take place.`}</Alert>;
    case 'expired':
      return <Alert tone="info" title="Nothing was paid">This checkout closed without a payment. You can pledge again below.</Alert>;
    default: {
      if (cancelled) return <Alert tone="info" title="You left the payment page">Nothing was paid. You can pledge again whenever you like.</Alert>;
      if (pledge.gaveUp) {
        return (
          <Alert tone="warning" title="Still waiting for the payment provider">
            Confirmation can take a few minutes. Reload this page later; if your card was charged and the pledge still is not confirmed, reply to the e-mail from the payment provider.
          </Alert>
        );
      }
      return (
        <div role="status" className="rounded border-l-4 border-signal bg-signal-tint px-4 py-3">
          <p className="font-semibold">Thank you! We are confirming your payment of {amount}.</p>
          <p className="font-sans text-sm">
            {pledge.data.status === 'failed' ? 'The last attempt was declined; if you paid again, its confirmation is on its way.' : 'The payment provider tells us directly; this takes a few seconds.'}
          </p>
          <span aria-hidden="true" className="mt-2 inline-block size-4 animate-spin rounded-full border-2 border-signal border-r-transparent" />
        </div>
      );
    }
  }
}

import { useSearchParams } from 'react-router-dom';
import { PageHeader } from '#src/components/page-header.tsx';
import { ConfirmSubscription } from '#src/features/subscriptions/components/confirm-subscription.tsx';

export default function SubscribeConfirmRoute() {
  const [params] = useSearchParams();
  return (
    <>
      <PageHeader eyebrow="Subscribe" title="Confirm your subscription" />
      <ConfirmSubscription token={params.get('token') ?? ''} />
    </>
  );
}

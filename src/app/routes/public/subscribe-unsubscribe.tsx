import { useSearchParams } from 'react-router-dom';
import { PageHeader } from '#src/components/page-header.tsx';
import { UnsubscribePanel } from '#src/features/subscriptions/components/unsubscribe-panel.tsx';

export default function SubscribeUnsubscribeRoute() {
  const [params] = useSearchParams();
  return (
    <>
      <PageHeader eyebrow="Subscribe" title="Unsubscribe" />
      <UnsubscribePanel token={params.get('token') ?? ''} />
    </>
  );
}

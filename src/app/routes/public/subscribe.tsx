import { PageHeader } from '#src/components/page-header.tsx';
import { SubscribeForm } from '#src/features/subscriptions/components/subscribe-form.tsx';

export default function SubscribeRoute() {
  return (
    <>
      <PageHeader
        eyebrow="Subscribe"
        title="New reports by e-mail"
        description="One e-mail when we publish a report: its key figures, a small coverage map and the link to the whole report."
      />
      <SubscribeForm />
    </>
  );
}

import { useSearchParams } from 'react-router-dom';
import { PageHeader } from '#src/components/page-header.tsx';
import { ConfirmVote } from '#src/features/test-requests/components/confirm-vote.tsx';

export default function RequestConfirmRoute() {
  const [params] = useSearchParams();
  return (
    <>
      <PageHeader eyebrow="Request a test" title="Confirm your vote" />
      <ConfirmVote token={params.get('token') ?? ''} />
    </>
  );
}

import { PageHeader } from '#src/components/page-header.tsx';
import { LedgerView } from '#src/features/ledger/components/ledger-view.tsx';

export default function LedgerRoute() {
  return (
    <>
      <PageHeader
        eyebrow="Lab · Admin"
        title="Ledger"
        description="Readers’ money, entry by entry: every payment, the provider’s fee on it and every refund, by month and by request, checked against the payment provider’s own balance."
      />
      <LedgerView />
    </>
  );
}

import { Alert } from '#src/components/alert.tsx';
import { PageHeader } from '#src/components/page-header.tsx';
import { Spinner } from '#src/components/spinner.tsx';
import { useLabSettings } from '#src/features/mail/api/lab-settings.ts';
import { MailboxView } from '#src/features/mail/components/mailbox-view.tsx';

export default function MailboxRoute() {
  const settings = useLabSettings();
  return (
    <>
      <PageHeader
        eyebrow="Lab · Admin · Demo"
        title="Mailbox"
        description="This server sends its e-mail to a local stand-in mail server that keeps every message here (and as .eml files) instead of delivering it. In production, mail goes to a real provider and this page does not exist."
      />
      {settings.isPending ? <Spinner /> : settings.data?.fakeMailbox ? <MailboxView /> : <Alert tone="info">Mail goes to a real SMTP server: there is no local mailbox to show.</Alert>}
    </>
  );
}

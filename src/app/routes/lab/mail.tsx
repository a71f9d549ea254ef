import { PageHeader } from '#src/components/page-header.tsx';
import { SendLog } from '#src/features/mail/components/send-log.tsx';

export default function MailRoute() {
  return (
    <>
      <PageHeader
        eyebrow="Lab · Admin"
        title="Send log"
        description="Every e-mail the site recorded, from confirmations to new-report e-mails: sent, waiting for a retry, or failed with the reason. A failed one can be sent again."
      />
      <SendLog />
    </>
  );
}

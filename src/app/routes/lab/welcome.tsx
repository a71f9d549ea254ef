import { Link, useSearchParams } from 'react-router-dom';
import { LinkProblem } from '#src/components/link-problem.tsx';
import { MinimalShell } from '#src/components/minimal-shell.tsx';
import { PageHeader } from '#src/components/page-header.tsx';
import { Spinner } from '#src/components/spinner.tsx';
import { useInvitationPreview } from '#src/features/invitations/api/accept-invitation.ts';
import { AcceptInvitationForm } from '#src/features/invitations/components/accept-invitation-form.tsx';

/** Where an invitation e-mail leads: the invitee chooses their own password. */
export default function WelcomeRoute() {
  const [params] = useSearchParams();
  const token = params.get('token') ?? '';
  const preview = useInvitationPreview(token);
  return (
    <MinimalShell>
      <div className="mx-auto max-w-md">
        <PageHeader eyebrow="Benchlight Lab" title="Welcome to the lab" />
        {preview.isPending ? (
          <Spinner label="Checking your invitation…" />
        ) : preview.isError ? (
          <LinkProblem error={preview.error} again={<>Ask an admin for a new invitation, or <Link to="/lab/sign-in">sign in</Link> if your account is set up.</>} />
        ) : (
          <AcceptInvitationForm token={token} invitation={preview.data} />
        )}
      </div>
    </MinimalShell>
  );
}

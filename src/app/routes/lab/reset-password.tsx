import { useSearchParams } from 'react-router-dom';
import { MinimalShell } from '#src/components/minimal-shell.tsx';
import { PageHeader } from '#src/components/page-header.tsx';
import { ResetPasswordForm } from '#src/features/password-reset/components/reset-password-form.tsx';

export default function ResetPasswordRoute() {
  const [params] = useSearchParams();
  return (
    <MinimalShell>
      <div className="mx-auto max-w-md">
        <PageHeader eyebrow="Benchlight Lab" title="Choose a new password" />
        <ResetPasswordForm token={params.get('token') ?? ''} />
      </div>
    </MinimalShell>
  );
}

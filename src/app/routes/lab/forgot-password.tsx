import { Link } from 'react-router-dom';
import { MinimalShell } from '#src/components/minimal-shell.tsx';
import { PageHeader } from '#src/components/page-header.tsx';
import { ForgotPasswordForm } from '#src/features/password-reset/components/forgot-password-form.tsx';

export default function ForgotPasswordRoute() {
  return (
    <MinimalShell>
      <div className="mx-auto max-w-md">
        <PageHeader eyebrow="Benchlight Lab" title="Forgot your password?" description="We e-mail a link to choose a new one to the address of your staff account." />
        <ForgotPasswordForm />
        <p className="mt-6 font-sans text-sm">
          <Link to="/lab/sign-in">Back to sign-in</Link>
        </p>
      </div>
    </MinimalShell>
  );
}

import { Link, useNavigate } from 'react-router-dom';
import { Cautions } from '#src/components/cautions.tsx';
import { MinimalShell } from '#src/components/minimal-shell.tsx';
import { PageHeader } from '#src/components/page-header.tsx';
import { SignInForm } from '#src/features/auth/components/sign-in-form.tsx';
import { useSafeNext } from '#src/features/auth/hooks/use-safe-next.ts';

export default function SignInRoute() {
  const navigate = useNavigate();
  const next = useSafeNext();
  return (
    <MinimalShell>
      <div className="mx-auto max-w-md">
        <PageHeader eyebrow="Benchlight Lab" title="Staff sign-in" />
        <SignInForm onSignedIn={() => void navigate(next, { replace: true })} />
        <p className="mt-6 font-sans text-sm">
          <Link to="/lab/forgot-password">Forgot your password?</Link>
        </p>
      </div>
      <div className="mx-auto mt-section max-w-page">
        <Cautions headingLevel={2} title="The cautions we print beside every figure" />
      </div>
    </MinimalShell>
  );
}

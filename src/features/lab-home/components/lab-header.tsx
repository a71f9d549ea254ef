import { Link } from 'react-router-dom';
import { ROLE_LABELS, type Role } from '#shared/auth/capabilities.ts';
import { Button } from '#src/components/button.tsx';

/** The staff shell's header: who is signed in, and the way out. */
export function LabHeader({
  displayName,
  role,
  onSignOut,
  signingOut,
}: {
  displayName: string;
  role: Role;
  onSignOut: () => void;
  signingOut: boolean;
}) {
  return (
    <header className="bg-ink text-paper">
      <div className="mx-auto flex max-w-page flex-wrap items-center justify-between gap-4 px-gutter py-3">
        <div className="flex items-baseline gap-3">
          <Link to="/lab" className="text-xl font-bold tracking-tight text-paper no-underline hover:text-paper">
            Benchlight <span className="font-sans text-sm font-semibold tracking-label uppercase">Lab</span>
          </Link>
          <Link to="/" className="font-sans text-xs text-paper underline hover:text-paper">
            Public site
          </Link>
        </div>
        <div className="flex items-center gap-4 font-sans text-sm">
          <p>
            <span className="sr-only">Signed in as </span>
            <span className="font-semibold">{displayName}</span>
            <span aria-hidden="true"> · </span>
            <span className="sr-only">, role: </span>
            <span>{ROLE_LABELS[role]}</span>
          </p>
          <Button
            variant="inverse"
            size="sm"
            onClick={onSignOut}
            pending={signingOut}
          >
            Sign out
          </Button>
        </div>
      </div>
    </header>
  );
}

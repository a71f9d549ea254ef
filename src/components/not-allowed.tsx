import { Link } from 'react-router-dom';
import { PageHeader } from './page-header.tsx';

/** What a signed-in member of staff sees on a page their role may not use. */
export function NotAllowed({ roleLabel, action }: { roleLabel: string; action: string }) {
  return (
    <>
      <PageHeader title="Not allowed" />
      <div className="max-w-measure space-y-3">
        <p className="text-lg">
          Your role ({roleLabel}) cannot {action}.
        </p>
        <p className="text-ink-soft">If you need this, ask the lab's admin to change your role.</p>
        <p className="font-sans text-sm">
          <Link to="/lab">Back to lab home</Link>
        </p>
      </div>
    </>
  );
}

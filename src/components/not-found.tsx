import { Link, useLocation } from 'react-router-dom';
import { PageHeader } from './page-header.tsx';

export function NotFound({ homeTo = '/', homeLabel = 'Go to the home page' }: { homeTo?: string; homeLabel?: string }) {
  const { pathname } = useLocation();
  return (
    <>
      <PageHeader title="Page not found" />
      <div className="max-w-measure space-y-3">
        <p className="text-lg">
          There is no page at <code className="rounded bg-paper-sunk px-1.5 py-0.5 font-mono text-base">{pathname}</code>.
        </p>
        <p className="text-ink-soft">The address may be mistyped, or the page may have moved.</p>
        <p className="font-sans text-sm">
          <Link to={homeTo}>{homeLabel}</Link>
        </p>
      </div>
    </>
  );
}

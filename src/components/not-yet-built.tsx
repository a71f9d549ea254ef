import type { ReactNode } from 'react';
import { Link } from 'react-router-dom';
import { PageHeader } from './page-header.tsx';

/** Honest placeholder for a page that exists in the plan but not yet in the code. */
export function NotYetBuilt({
  title,
  eyebrow,
  willHold,
  backTo = '/',
  backLabel = 'Back to the home page',
}: {
  title: string;
  eyebrow?: string;
  willHold: ReactNode;
  backTo?: string;
  backLabel?: string;
}) {
  return (
    <>
      <PageHeader title={title} eyebrow={eyebrow} />
      <div className="max-w-measure rounded-md border border-dashed border-rule-strong bg-paper-raised px-6 py-5">
        <p className="text-lg font-semibold">This page is not built yet.</p>
        <p className="mt-2 text-ink-soft">
          <span className="font-semibold text-ink">It will hold: </span>
          {willHold}
        </p>
        <p className="mt-4 font-sans text-sm">
          <Link to={backTo}>{backLabel}</Link>
        </p>
      </div>
    </>
  );
}

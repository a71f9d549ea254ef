import type { ReactNode } from 'react';
import { Link } from 'react-router-dom';
import { SkipLink } from './skip-link.tsx';

/** A bare frame (brand, main, nothing else) for sign-in and for pages shown when a shell cannot load. */
export function MinimalShell({ children, brandTo = '/' }: { children: ReactNode; brandTo?: string }) {
  return (
    <div className="flex min-h-screen flex-col">
      <SkipLink />
      <header className="border-b border-rule">
        <div className="mx-auto max-w-page px-gutter py-4">
          <Link to={brandTo} className="text-2xl font-bold tracking-tight text-ink no-underline hover:text-ink">
            Benchlight
          </Link>
        </div>
      </header>
      <main id="main" tabIndex={-1} className="mx-auto w-full max-w-page flex-1 px-gutter py-10">
        {children}
      </main>
    </div>
  );
}

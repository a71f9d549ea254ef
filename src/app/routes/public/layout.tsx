import { Outlet } from 'react-router-dom';
import { SkipLink } from '#src/components/skip-link.tsx';
import { PublicFooter } from '#src/features/public-site/components/public-footer.tsx';
import { PublicHeader } from '#src/features/public-site/components/public-header.tsx';
import { useFocusMainOnNavigate } from '#src/hooks/use-focus-main-on-navigate.ts';

export default function PublicLayout() {
  useFocusMainOnNavigate();
  return (
    <div className="flex min-h-screen flex-col">
      <SkipLink />
      <PublicHeader />
      <main id="main" tabIndex={-1} className="mx-auto w-full max-w-page flex-1 px-gutter py-10">
        <Outlet />
      </main>
      <PublicFooter />
    </div>
  );
}

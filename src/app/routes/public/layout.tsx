import { Outlet } from 'react-router-dom';
import { SkipLink } from '../../../components/skip-link.tsx';
import { PublicFooter } from '../../../features/public-site/components/public-footer.tsx';
import { PublicHeader } from '../../../features/public-site/components/public-header.tsx';
import { useFocusMainOnNavigate } from '../../../hooks/use-focus-main-on-navigate.ts';

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

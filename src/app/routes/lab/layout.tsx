import { useQueryClient, type QueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import {
  Navigate,
  Outlet,
  redirect,
  useLocation,
  useNavigate,
  useRevalidator,
  useRouteError,
  type LoaderFunctionArgs,
} from 'react-router-dom';
import { Alert } from '#src/components/alert.tsx';
import { ErrorState } from '#src/components/error-state.tsx';
import { MinimalShell } from '#src/components/minimal-shell.tsx';
import { SkipLink } from '#src/components/skip-link.tsx';
import { Spinner } from '#src/components/spinner.tsx';
import { meQueryOptions, useMe } from '#src/features/auth/api/get-me.ts';
import { useSignOut } from '#src/features/auth/api/sign-out.ts';
import { LabHeader } from '#src/features/lab-home/components/lab-header.tsx';
import { LabNav } from '#src/features/lab-home/components/lab-nav.tsx';
import { labSettingsQueryOptions, useLabSettings } from '#src/features/mail/api/lab-settings.ts';
import { labNavFor } from '#src/app/lab-sections.ts';
import { useFocusMainOnNavigate } from '#src/hooks/use-focus-main-on-navigate.ts';
import { isApiError } from '#src/lib/api-client.ts';

function signInPath(pathname: string, search: string): string {
  return `/lab/sign-in?next=${encodeURIComponent(pathname + search)}`;
}

/** Sign-in required: fetch `me` before the shell renders; no user → sign-in page, coming back here. */
export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    const { user } = await queryClient.ensureQueryData(meQueryOptions());
    if (!user) {
      const url = new URL(request.url);
      throw redirect(signInPath(url.pathname, url.search));
    }
    // The navigation depends on it (the Mailbox): fetched once before the first render, not
    // on every navigation; without it the lab still works.
    const settings = labSettingsQueryOptions();
    if (!queryClient.getQueryState(settings.queryKey)) await queryClient.ensureQueryData(settings).catch(() => null);
    return null;
  };

export default function LabLayout() {
  useFocusMainOnNavigate();
  const me = useMe();
  const settings = useLabSettings();
  const location = useLocation();
  const navigate = useNavigate();
  const queryClient = useQueryClient();
  const signOut = useSignOut();
  const [leaving, setLeaving] = useState(false);

  const user = me.data?.user;
  if (!user) {
    if (leaving) return null;
    if (me.isPending) return <Spinner />;
    if (me.isError) {
      return (
        <MinimalShell>
          <ErrorState error={me.error} onRetry={() => void me.refetch()} />
        </MinimalShell>
      );
    }
    return <Navigate to={signInPath(location.pathname, location.search)} replace />;
  }

  const onSignOut = () =>
    signOut.mutate(undefined, {
      onSuccess: async () => {
        setLeaving(true);
        await navigate('/lab/sign-in', { replace: true });
        queryClient.clear();
      },
    });

  return (
    <div className="flex min-h-screen flex-col">
      <SkipLink />
      <LabHeader
        displayName={user.displayName}
        role={user.role}
        onSignOut={onSignOut}
        signingOut={signOut.isPending}
      />
      <LabNav items={labNavFor(user.role, { fakeMailbox: settings.data?.fakeMailbox })} />
      <main id="main" tabIndex={-1} className="mx-auto w-full max-w-page flex-1 px-gutter py-10">
        {signOut.isError ? (
          <Alert tone="error" className="mb-6">
            {isApiError(signOut.error) && signOut.error.isUnreachable
              ? "Signing out failed: can't reach the server. You are still signed in; try again."
              : 'Signing out failed. You are still signed in; try again.'}
          </Alert>
        ) : null}
        <Outlet />
      </main>
    </div>
  );
}

/** The shell could not load (most often: the server is down while checking the session). */
export function ErrorBoundary() {
  const error = useRouteError();
  const revalidator = useRevalidator();
  return (
    <MinimalShell>
      <ErrorState error={error} onRetry={() => void revalidator.revalidate()} />
    </MinimalShell>
  );
}

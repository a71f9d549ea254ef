import type { QueryClient } from '@tanstack/react-query';
import type { ComponentType } from 'react';
import {
  Outlet,
  ScrollRestoration,
  createBrowserRouter,
  type LoaderFunction,
  useRouteError,
  type RouteObject,
} from 'react-router-dom';
import { ErrorState } from '../components/error-state.tsx';
import { MinimalShell } from '../components/minimal-shell.tsx';
import { Spinner } from '../components/spinner.tsx';
import { LAB_SECTIONS, type LabSection } from './lab-sections.ts';
import { RequireCapability } from './require-capability.tsx';

/** What a lazily loaded route module may export. */
interface RouteModule {
  default: ComponentType;
  clientLoader?: (queryClient: QueryClient) => LoaderFunction;
  ErrorBoundary?: ComponentType;
}

/** Turns a route module into the pieces react-router wants, giving loaders the query client. */
const convert =
  (queryClient: QueryClient) =>
  ({ default: Component, clientLoader, ErrorBoundary }: RouteModule) => ({
    Component,
    ...(clientLoader ? { loader: clientLoader(queryClient) } : {}),
    ...(ErrorBoundary ? { ErrorBoundary } : {}),
  });

/** A lab section's page behind its capability: the same list drives the nav and this guard. */
function guarded<T extends { Component: ComponentType }>(route: T, section: LabSection): T {
  const Page = route.Component;
  function GuardedPage() {
    return (
      <RequireCapability capability={section.capability} action={section.action}>
        <Page />
      </RequireCapability>
    );
  }
  return { ...route, Component: GuardedPage };
}

function Root() {
  return (
    <>
      <ScrollRestoration />
      <Outlet />
    </>
  );
}

function RootError() {
  const error = useRouteError();
  return (
    <MinimalShell>
      <ErrorState error={error} onRetry={() => window.location.reload()} />
    </MinimalShell>
  );
}

function RootFallback() {
  return (
    <div className="mx-auto max-w-page px-gutter py-10">
      <Spinner label="Loading Benchlight…" />
    </div>
  );
}

export function createRoutes(queryClient: QueryClient): RouteObject[] {
  const c = convert(queryClient);
  return [
    {
      id: 'root',
      Component: Root,
      ErrorBoundary: RootError,
      HydrateFallback: RootFallback,
      children: [
        {
          // Public site: a pathless layout around the reader's pages.
          lazy: () => import('./routes/public/layout.tsx').then(c),
          children: [
            { index: true, lazy: () => import('./routes/public/home.tsx').then(c) },
            { path: 'reports', lazy: () => import('./routes/public/reports.tsx').then(c) },
            { path: 'reports/:slug', lazy: () => import('./routes/public/report.tsx').then(c) },
            { path: 'reports/:slug/versions/:n', lazy: () => import('./routes/public/report.tsx').then(c) },
            { path: 'compare', lazy: () => import('./routes/public/compare.tsx').then(c) },
            { path: 'methodology', lazy: () => import('./routes/public/methodology.tsx').then(c) },
            { path: 'request', lazy: () => import('./routes/public/request.tsx').then(c) },
            { path: 'requests/:id', lazy: () => import('./routes/public/request-detail.tsx').then(c) },
            { path: 'independence', lazy: () => import('./routes/public/independence.tsx').then(c) },
            { path: 'subscribe', lazy: () => import('./routes/public/subscribe.tsx').then(c) },
            { path: 'subscribe/confirm', lazy: () => import('./routes/public/subscribe-confirm.tsx').then(c) },
            { path: 'subscribe/preferences', lazy: () => import('./routes/public/subscribe-preferences.tsx').then(c) },
            { path: 'subscribe/unsubscribe', lazy: () => import('./routes/public/subscribe-unsubscribe.tsx').then(c) },
            { path: 'request/confirm', lazy: () => import('./routes/public/request-confirm.tsx').then(c) },
            { path: '*', lazy: () => import('./routes/public/not-found.tsx').then(c) },
          ],
        },
        { path: 'lab/sign-in', lazy: () => import('./routes/lab/sign-in.tsx').then(c) },
        // Reached from e-mails, without a session: outside the signed-in lab layout.
        { path: 'lab/welcome', lazy: () => import('./routes/lab/welcome.tsx').then(c) },
        { path: 'lab/forgot-password', lazy: () => import('./routes/lab/forgot-password.tsx').then(c) },
        { path: 'lab/reset-password', lazy: () => import('./routes/lab/reset-password.tsx').then(c) },
        {
          // Staff area: the layout's loader sends signed-out visitors to sign in.
          path: 'lab',
          lazy: () => import('./routes/lab/layout.tsx').then(c),
          children: [
            ...LAB_SECTIONS.map((s) => ({
              ...(s.path === '' ? { index: true as const } : { path: s.path }),
              lazy: () => s.load().then((m) => guarded(c(m as RouteModule), s)),
            })),
            { path: '*', lazy: () => import('./routes/lab/not-found.tsx').then(c) },
          ],
        },
      ],
    },
  ];
}

export function createAppRouter(queryClient: QueryClient) {
  return createBrowserRouter(createRoutes(queryClient));
}

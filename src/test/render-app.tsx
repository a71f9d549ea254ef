import { render } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { RouterProvider, createMemoryRouter } from 'react-router-dom';
import { AppProvider } from '../app/provider.tsx';
import { createAppQueryClient } from '../app/query-client.ts';
import { createRoutes } from '../app/router.tsx';

/** Renders the real route tree at `path` with a fresh query client (no retries, no caching across tests). */
export function renderApp(path: string) {
  const queryClient = createAppQueryClient({ queries: { retry: false, gcTime: Infinity } });
  const router = createMemoryRouter(createRoutes(queryClient), { initialEntries: [path] });
  const user = userEvent.setup();
  const utils = render(
    <AppProvider queryClient={queryClient}>
      <RouterProvider router={router} />
    </AppProvider>,
  );
  return { ...utils, router, queryClient, user };
}

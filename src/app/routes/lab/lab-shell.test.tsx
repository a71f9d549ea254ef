import { screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import type { SessionUser } from '#shared/schemas/users.ts';
import { renderApp } from '#src/test/render-app.tsx';
import { meAnswer, people, stubFetch } from '#src/test/fetch-stub.ts';

async function labNavItems(user: SessionUser, settings = { fakeMailbox: false }) {
  stubFetch({ 'GET /api/me': meAnswer(user), 'GET /api/lab/settings': { body: settings } });
  renderApp('/lab');
  const nav = await screen.findByRole('navigation', { name: 'Lab' });
  return within(nav)
    .getAllByRole('link')
    .map((a) => a.textContent);
}

describe('lab shell', () => {
  it('shows a tester Overview, Runs, File check, Catalog and Reports', async () => {
    expect(await labNavItems(people.tester)).toEqual(['Overview', 'Runs', 'File check', 'Catalog', 'Reports']);
  });

  it('shows an editor Review and Test requests as well', async () => {
    expect(await labNavItems(people.editor)).toEqual(['Overview', 'Runs', 'File check', 'Catalog', 'Review', 'Reports', 'Test requests']);
  });

  it('shows an admin Users, the Ledger and the Send log as well', async () => {
    expect(await labNavItems(people.admin)).toEqual(['Overview', 'Runs', 'File check', 'Catalog', 'Review', 'Reports', 'Test requests', 'Users', 'Ledger', 'Send log']);
  });

  it('shows an admin the Mailbox only while the server says mail goes to the local fake', async () => {
    stubFetch({ 'GET /api/me': meAnswer(people.admin), 'GET /api/lab/settings': { body: { fakeMailbox: true } } });
    renderApp('/lab');
    const nav = await screen.findByRole('navigation', { name: 'Lab' });
    await within(nav).findByRole('link', { name: 'Mailbox' });
    expect(within(nav).getAllByRole('link').map((a) => a.textContent).slice(-2)).toEqual(['Send log', 'Mailbox']);
  });

  it('names the signed-in user and role and offers to sign out', async () => {
    stubFetch({ 'GET /api/me': meAnswer(people.editor) });
    renderApp('/lab');
    const banner = await screen.findByRole('banner');
    expect(banner.textContent).toContain('Eddy Marlowe');
    expect(banner.textContent).toContain('Editor');
    expect(within(banner).getByRole('button', { name: 'Sign out' })).toBeTruthy();
    expect(screen.getByRole('heading', { level: 1 }).textContent).toBe('Welcome, Eddy Marlowe');
  });

  it('sends a signed-out visitor to sign in, remembering where they were going', async () => {
    stubFetch({ 'GET /api/me': meAnswer(null) });
    const { router } = renderApp('/lab/catalog');
    expect((await screen.findByRole('heading', { level: 1 })).textContent).toBe('Staff sign-in');
    expect(router.state.location.pathname).toBe('/lab/sign-in');
    expect(router.state.location.search).toBe('?next=%2Flab%2Fcatalog');
  });

  it("says it can't reach the server when /api/me fails", async () => {
    stubFetch({ 'GET /api/me': 'network-error' });
    renderApp('/lab');
    expect((await screen.findByRole('heading', { level: 1 })).textContent).toBe("Can't reach the server");
    expect(screen.getByRole('button', { name: 'Try again' })).toBeTruthy();
  });

  it('signs out: POSTs, then shows the sign-in page', async () => {
    const { calls } = stubFetch({
      'GET /api/me': meAnswer(people.tester),
      'POST /api/auth/sign-out': { status: 204 },
    });
    const { user, router } = renderApp('/lab');
    await user.click(await screen.findByRole('button', { name: 'Sign out' }));
    expect(await screen.findByRole('heading', { level: 1, name: 'Staff sign-in' })).toBeTruthy();
    expect(router.state.location.pathname).toBe('/lab/sign-in');
    expect(calls.some((c) => c.method === 'POST' && c.path === '/api/auth/sign-out')).toBe(true);
  });

  it('refuses the Review page to a tester', async () => {
    stubFetch({ 'GET /api/me': meAnswer(people.tester) });
    renderApp('/lab/review');
    expect((await screen.findByRole('heading', { level: 1 })).textContent).toBe('Not allowed');
    expect(screen.getByText('Your role (Tester) cannot review runs.')).toBeTruthy();
  });
});

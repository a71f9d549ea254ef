import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { DEMO_USERS } from '#seeds/data/demo-users.ts';
import { openBrowser, signIn } from './helpers/browser.ts';

const demo = (role: string) => DEMO_USERS.find((u) => u.role === role)!;

const EXPECTED_NAV: Record<string, string[]> = {
  tester: ['Overview', 'Runs', 'File check', 'Catalog', 'Reports'],
  editor: ['Overview', 'Runs', 'File check', 'Catalog', 'Review', 'Reports', 'Test requests'],
  // The browser tests send mail to the local fake SMTP server, so the Mailbox is there.
  admin: ['Overview', 'Runs', 'File check', 'Catalog', 'Review', 'Reports', 'Test requests', 'Users', 'Ledger', 'Send log', 'Mailbox'],
};

describe('staff area in Chromium, per role', () => {
  let b: Awaited<ReturnType<typeof openBrowser>>;
  beforeEach(async () => {
    b = await openBrowser();
  });
  afterEach(() => b.close());

  for (const role of ['tester', 'editor', 'admin'] as const) {
    it(`a signed-in ${role} sees the ${role}'s navigation`, async () => {
      await signIn(b.page, demo(role).email, demo(role).password);
      const links = await b.page.getByRole('navigation', { name: 'Lab' }).getByRole('link').allInnerTexts();
      expect(links.map((l) => l.trim())).toEqual(EXPECTED_NAV[role]);
    });
  }

  it('sends a signed-out visitor of /lab to the sign-in page', async () => {
    await b.page.goto('/lab');
    await b.page.waitForURL(/\/lab\/sign-in/);
    await b.page.getByRole('heading', { level: 1, name: 'Staff sign-in' }).waitFor();
    expect(await b.page.getByRole('button', { name: 'Sign in' }).count()).toBe(1);
  });

  it('shows a tester a refusal on the admin page, and the API answers 403', async () => {
    await signIn(b.page, demo('tester').email, demo('tester').password);
    await b.page.goto('/lab/admin/users');
    await b.page.getByRole('heading', { name: 'Not allowed' }).waitFor();
    expect(await b.page.locator('table').count()).toBe(0);
    const api = await b.page.request.get('/api/admin/users');
    expect(api.status()).toBe(403);
    expect((await api.json()).error.code).toBe('forbidden');
  });

  it('shows an admin the user list', async () => {
    await signIn(b.page, demo('admin').email, demo('admin').password);
    await b.page.getByRole('navigation', { name: 'Lab' }).getByRole('link', { name: 'Users' }).click();
    const table = b.page.getByRole('table', { name: 'Staff accounts' });
    await table.waitFor();
    const text = await table.innerText();
    for (const u of DEMO_USERS) expect(text).toContain(u.email);
  });

  it('ends the session on sign-out', async () => {
    await signIn(b.page, demo('editor').email, demo('editor').password);
    expect((await (await b.page.request.get('/api/me')).json()).user.role).toBe('editor');
    await b.page.getByRole('button', { name: 'Sign out' }).click();
    await b.page.waitForURL(/\/lab\/sign-in/);
    expect((await (await b.page.request.get('/api/me')).json()).user).toBeNull();
    await b.page.goto('/lab');
    await b.page.waitForURL(/\/lab\/sign-in/);
  });
});

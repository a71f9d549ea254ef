import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import request from 'supertest';
import type { Page } from 'playwright-core';
import { DEMO_USERS } from '#seeds/data/demo-users.ts';
import { linkIn, tokenOf, waitUntil } from '#tests/support/mail-folder.ts';
import { seriousAccessibilityViolations } from './helpers/axe.ts';
import { openBrowser, signIn } from './helpers/browser.ts';
import { mailsTo, waitForMail } from './helpers/mail.ts';

const demo = (role: string) => DEMO_USERS.find((u) => u.role === role)!;

describe('readers fund a request, an editor declines it, everyone is refunded (Chromium, real server, worker, fake SMTP and fake payments)', () => {
  let b: Awaited<ReturnType<typeof openBrowser>>;
  const stamp = Date.now().toString(36);
  const model = `Orrin 450 ${stamp}`;
  const device = `Tarrow Lightworks ${model}`;
  const backers = { first: `ada-${stamp}@example.test`, second: `bo-${stamp}@example.test` };
  let requestId = '';

  beforeAll(async () => {
    b = await openBrowser();
    // A reader's request, confirmed from the e-mail, as in the requests' own test.
    const origin = inject('baseUrl');
    const requester = `asker-${stamp}@example.test`;
    const asked = await request(origin)
      .post('/api/public/test-requests')
      .set('Origin', origin)
      .send({ maker: 'Tarrow Lightworks', model, link: 'https://tarrow.example/orrin-450', reason: 'Sold as a full-body panel; we would like to know how much of a body it really covers.', email: requester });
    expect(asked.status).toBe(202);
    const mail = await waitForMail(requester, 'Confirm your test request');
    const confirmed = await request(origin).post('/api/public/votes/confirm').set('Origin', origin).send({ token: tokenOf(linkIn(mail.text, '/request/confirm')) });
    expect(confirmed.status).toBe(200);
    requestId = confirmed.body.requestId;
  });
  afterAll(() => b.close());

  /** The reader's path: the request's page, the pledge form, the provider's page, and back. */
  async function pledge(page: Page, amount: string, email: string, name: string | null) {
    await page.goto(`/requests/${requestId}`);
    const form = page.getByRole('form', { name: `Pledge toward testing the ${device}` });
    await form.getByLabel('Amount (EUR)').fill(amount);
    await form.getByLabel('Your e-mail').fill(email);
    if (name) await form.getByLabel('Name to show (optional)').fill(name);
    await form.getByRole('button', { name: 'Pledge and go to payment' }).click();
    // The provider's hosted page (the local fake: no card is asked for).
    await page.waitForURL((url) => url.origin === inject('paymentsUrl'));
    await page.getByRole('heading', { name: 'Test payment' }).waitFor();
    await page.getByRole('button', { name: `Pay €${amount}` }).click();
    await page.waitForURL((url) => url.pathname === `/requests/${requestId}` && url.searchParams.has('pledge'));
    // The page waits for the provider's webhook, not for the redirect.
    await page.getByText('Thank you: your pledge is confirmed').waitFor({ timeout: 30_000 });
  }

  const raisedText = (page: Page) => page.getByText(/of €500\.00 raised/).first().innerText();

  it('an editor sets the goal: the unit price plus one bench day', async () => {
    await signIn(b.page, demo('editor').email, demo('editor').password);
    await b.page.getByRole('navigation', { name: 'Lab' }).getByRole('link', { name: 'Test requests' }).click();
    const goal = b.page.getByRole('form', { name: `Funding goal for the ${device}` });
    await goal.getByLabel('Unit price (retail, EUR)').fill('100');
    await goal.getByText('€100.00 unit + €400.00 one bench day = €500.00 goal').waitFor();
    await goal.getByRole('button', { name: 'Set the goal' }).click();
    await goal.getByText('Goal saved').waitFor();
    await b.page.getByRole('button', { name: 'Sign out' }).click();
    await b.page.waitForURL(/\/lab\/sign-in/);
  });

  it('a reader pledges, pays on the provider’s page, comes back and sees the amount raised grow', { timeout: 120_000 }, async () => {
    await b.page.goto('/request');
    await b.page.getByRole('link', { name: device }).click();
    await b.page.getByRole('heading', { level: 1, name: device }).waitFor();
    expect(await raisedText(b.page)).toContain('€0.00 of €500.00 raised (0 %)');
    // The request page and its pledge form, checked by axe-core: nothing serious or critical.
    expect(await seriousAccessibilityViolations(b.page)).toEqual([]);

    await pledge(b.page, '200.00', backers.first, 'Ada L.');
    await waitUntil('the total to include the pledge', async () => (await raisedText(b.page)).includes('€200.00 of €500.00 raised (40 %) from 1 backer'), 20_000, 250);
    await b.page.getByText('Backed by Ada L..').waitFor();
  });

  it('a second reader’s pledge reaches the goal', { timeout: 120_000 }, async () => {
    await pledge(b.page, '300.00', backers.second, null);
    await waitUntil('the goal to be reached', async () => (await raisedText(b.page)).includes('€500.00 of €500.00 raised (100 %) from 2 backers'), 20_000, 250);
    await b.page.getByText(/^Goal reached on /).waitFor();
    await b.page.getByText('Backed by Ada L. and 1 anonymous reader.').waitFor();
    // No more pledges once the goal is reached.
    expect(await b.page.getByRole('button', { name: 'Pledge and go to payment' }).count()).toBe(0);
    // Not one backer's address is on the page.
    const text = await b.page.locator('main').innerText();
    expect(text).not.toContain(backers.first);
    expect(text).not.toContain(backers.second);
  });

  it('an editor declines it: both pledges are refunded, each backer gets one e-mail, the ledger holds nothing and is reconciled', { timeout: 180_000 }, async () => {
    await signIn(b.page, demo('editor').email, demo('editor').password);
    await b.page.getByRole('navigation', { name: 'Lab' }).getByRole('link', { name: 'Test requests' }).click();
    const decision = b.page.getByRole('form', { name: `Decision on the ${device}` });
    await decision.getByLabel('Decision').selectOption('declined');
    await decision.getByText('Declining refunds every paid pledge automatically (2 backers)').waitFor();
    await decision.getByLabel('Reason readers will see').fill('The maker stopped selling this model in shops we can buy from.');
    await decision.getByRole('button', { name: 'Save the decision' }).click();
    await decision.getByText('Every paid pledge is being refunded').waitFor();
    await b.page.getByRole('button', { name: 'Sign out' }).click();
    await b.page.waitForURL(/\/lab\/sign-in/);

    const first = await waitForMail(backers.first, 'Your pledge of €200.00 has been refunded', 1, 90_000);
    const second = await waitForMail(backers.second, 'Your pledge of €300.00 has been refunded', 1, 90_000);
    for (const mail of [first, second]) expect(mail.text).toContain('The maker stopped selling this model');
    await new Promise((r) => setTimeout(r, 2000));
    expect(await mailsTo(backers.first, 'has been refunded')).toHaveLength(1);
    expect(await mailsTo(backers.second, 'has been refunded')).toHaveLength(1);

    await b.page.goto(`/requests/${requestId}`);
    await waitUntil('the request page to show nothing raised', async () => {
      await b.page.reload();
      return (await raisedText(b.page)).includes('€0.00 of €500.00 raised');
    }, 30_000, 1000);

    await signIn(b.page, demo('admin').email, demo('admin').password);
    await b.page.getByRole('navigation', { name: 'Lab' }).getByRole('link', { name: 'Ledger' }).click();
    await b.page.getByRole('heading', { level: 1, name: 'Ledger' }).waitFor();
    // The refunds and both payments' fees are recorded by the worker's jobs: look until they are.
    await waitUntil('the ledger to be reconciled', async () => {
      await b.page.reload();
      await b.page.getByRole('heading', { level: 2, name: 'Reconciliation with the provider' }).waitFor({ timeout: 15_000 });
      return (await b.page.getByText('Reconciled', { exact: true }).count()) > 0;
    }, 60_000, 1000);
    const held = b.page.locator('dt', { hasText: 'Held for readers’ tests' }).locator('xpath=following-sibling::dd[1]');
    expect(await held.innerText()).toBe('€0.00');
    const rows = b.page.getByRole('table', { name: 'By request' }).getByRole('row', { name: new RegExp(device) });
    expect(await rows.innerText()).toContain('€500.00');
  });

  it('the independence page has no serious or critical accessibility violation and is linked from the footer', async () => {
    await b.page.goto('/');
    await b.page.getByRole('contentinfo').getByRole('link', { name: 'Who pays for our tests' }).click();
    await b.page.getByRole('heading', { level: 1, name: 'Who pays for our tests' }).waitFor();
    await b.page.getByText(/a panel on sale at €329\.00/).waitFor();
    expect(await seriousAccessibilityViolations(b.page)).toEqual([]);
  });
});

import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { linkIn } from '#tests/support/mail-folder.ts';
import { openBrowser } from './helpers/browser.ts';
import { mailsTo, publishNewReport, waitForMail } from './helpers/mail.ts';

/** Subscribes on the public page and confirms from the e-mail, as a reader does. */
async function subscribeAndConfirm(b: Awaited<ReturnType<typeof openBrowser>>, email: string) {
  await b.page.goto('/subscribe');
  await b.page.getByRole('heading', { level: 1, name: 'New reports by e-mail' }).waitFor();
  await b.page.getByLabel('E-mail', { exact: true }).fill(email);
  await b.page.getByRole('radio', { name: 'Every report' }).check();
  await b.page.getByRole('button', { name: 'Subscribe' }).click();
  await b.page.getByText('Check your e-mail').waitFor();

  const mail = await waitForMail(email, 'Confirm your Benchlight subscription');
  const link = linkIn(mail.text, '/subscribe/confirm');
  expect(mail.html).toContain(link.replace(/&/g, '&amp;'));
  // Opening the link confirms nothing by itself: the reader presses the button.
  await b.page.goto(link);
  await b.page.getByRole('heading', { level: 1, name: 'Confirm your subscription' }).waitFor();
  await b.page.getByRole('button', { name: 'Confirm my subscription' }).click();
  await b.page.getByText('You are subscribed').waitFor();
}

describe('a reader subscribes, gets each new report once, and leaves in one click (Chromium, real server, worker and fake SMTP)', () => {
  let b: Awaited<ReturnType<typeof openBrowser>>;
  const stamp = Date.now().toString(36);
  const reader = `reader-${stamp}@example.test`;
  const other = `other-${stamp}@example.test`;

  beforeAll(async () => {
    b = await openBrowser();
  });
  afterAll(() => b.close());

  it('subscribes on the page, finds the confirmation in the mail folder, opens its link and is confirmed', async () => {
    await subscribeAndConfirm(b, reader);
    await subscribeAndConfirm(b, other);
  });

  it('gets the new-report e-mail exactly once when an editor publishes', { timeout: 120_000 }, async () => {
    const report = await publishNewReport(`Reader panel ${stamp}`, ` E2E ${stamp}`);
    const mail = await waitForMail(reader, `New report: Reader panel ${stamp}`);
    await waitForMail(other, `New report: Reader panel ${stamp}`);
    expect(mail.text).toContain(`/reports/${report.slug}`);
    expect(mail.text).toContain('Centre irradiance at 15 cm');
    expect(mail.text).toContain('not treatment advice');
    expect(mail.parsed.attachments.some((a) => a.contentType === 'image/png')).toBe(true);
    expect(mail.header('list-unsubscribe-post')).toBe('List-Unsubscribe=One-Click');
    // Wait past the worker's next polls: still one.
    await new Promise((r) => setTimeout(r, 3000));
    expect(await mailsTo(reader, `New report: Reader panel ${stamp}`)).toHaveLength(1);

    // The e-mail's preferences link opens the reader's page.
    await b.page.goto(linkIn(mail.text, '/subscribe/preferences'));
    await b.page.getByRole('heading', { name: `E-mail to ${reader}` }).waitFor();
  });

  it('unsubscribes in one click (a POST without session or Origin), and the next publication sends that address nothing', { timeout: 120_000 }, async () => {
    const [mail] = await mailsTo(reader, 'New report:');
    const url = mail.header('list-unsubscribe').replace(/^<|>$/g, '');
    expect(url.startsWith(`${inject('baseUrl')}/api/public/unsubscribe?token=`)).toBe(true);
    // What a mail provider does (RFC 8058): a POST from its own server, no cookie, no Origin.
    const res = await fetch(url, { method: 'POST', headers: { 'Content-Type': 'application/x-www-form-urlencoded' }, body: 'List-Unsubscribe=One-Click' });
    expect(res.status).toBe(200);

    await publishNewReport(`Second panel ${stamp}`, ` E2E2 ${stamp}`);
    await waitForMail(other, `New report: Second panel ${stamp}`);
    await new Promise((r) => setTimeout(r, 3000));
    expect(await mailsTo(reader, `Second panel ${stamp}`)).toHaveLength(0);

    // The visible link leads to the page, which says so.
    await b.page.goto(linkIn(mail.text, '/subscribe/preferences'));
    await b.page.getByText('unsubscribed: nothing is sent').waitFor();
  });
});

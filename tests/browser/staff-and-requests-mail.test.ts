import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEMO_USERS } from '#seeds/data/demo-users.ts';
import { linkIn } from '#tests/support/mail-folder.ts';
import { openBrowser, signIn } from './helpers/browser.ts';
import { mailsTo, publishNewReport, waitForMail } from './helpers/mail.ts';

const demo = (role: string) => DEMO_USERS.find((u) => u.role === role)!;

describe('staff invitations and test requests by e-mail (Chromium, real server, worker and fake SMTP)', () => {
  let b: Awaited<ReturnType<typeof openBrowser>>;
  const stamp = Date.now().toString(36);

  beforeAll(async () => {
    b = await openBrowser();
  });
  afterAll(() => b.close());

  it('an invited editor sets a password from the invitation e-mail and signs in', async () => {
    const invitee = `new-editor-${stamp}@lab.test`;
    await signIn(b.page, demo('admin').email, demo('admin').password);
    await b.page.goto('/lab/admin/users');
    const form = b.page.getByRole('form', { name: 'Invite a staff member' });
    await form.getByLabel('E-mail', { exact: true }).fill(invitee);
    await form.getByLabel('Name').fill('Nadia Invited');
    await form.getByLabel('Role').selectOption('editor');
    await form.getByRole('button', { name: 'Send the invitation' }).click();
    await b.page.getByText('Invitation sent').waitFor();

    // The admin reads it on the Mailbox page too (the fake SMTP server is in use).
    await b.page.getByRole('navigation', { name: 'Lab' }).getByRole('link', { name: 'Mailbox' }).click();
    await b.page.getByRole('button', { name: /Your invitation to the Benchlight lab/ }).first().click();
    await b.page.getByText('Plain-text part').waitFor();
    await b.page.getByRole('button', { name: 'Sign out' }).click();
    await b.page.waitForURL(/\/lab\/sign-in/);

    const mail = await waitForMail(invitee, 'Your invitation to the Benchlight lab');
    await b.page.goto(linkIn(mail.text, '/lab/welcome'));
    await b.page.getByText('You are invited as').waitFor();
    await b.page.getByLabel('Choose a password').fill('lantern meadow quartz');
    await b.page.getByLabel('Repeat the password').fill('lantern meadow quartz');
    await b.page.getByRole('button', { name: 'Create my account' }).click();
    await b.page.getByText('Your account is ready').waitFor();

    await signIn(b.page, invitee, 'lantern meadow quartz');
    const links = await b.page.getByRole('navigation', { name: 'Lab' }).getByRole('link').allInnerTexts();
    expect(links).toContain('Review');
    expect(links).not.toContain('Users');
    await b.page.getByRole('button', { name: 'Sign out' }).click();
    await b.page.waitForURL(/\/lab\/sign-in/);
  });

  it('a reader’s request, a confirmed vote and an editor’s “tested” send the voter one e-mail', { timeout: 150_000 }, async () => {
    const requester = `asker-${stamp}@example.test`;
    const voter = `voter-${stamp}@example.test`;
    const model = `Lumen wrap ${stamp}`;

    await b.page.goto('/request');
    const form = b.page.getByRole('form', { name: 'Ask for a device to be tested' });
    await form.getByLabel('Maker').fill('Tarrow Lightworks');
    await form.getByLabel('Model').fill(model);
    await form.getByLabel('Link').fill('https://tarrow.example/lumen-wrap');
    await form.getByLabel('Why should we test it?').fill('The box claims full-body coverage at 30 cm; nobody has measured it independently.');
    await form.getByLabel('Your e-mail').fill(requester);
    await form.getByRole('button', { name: 'Send the request' }).click();
    await b.page.getByText('Check your e-mail').waitFor();
    const asked = await waitForMail(requester, 'Confirm your test request');
    await b.page.goto(linkIn(asked.text, '/request/confirm'));
    await b.page.getByRole('button', { name: 'Confirm my vote' }).click();
    await b.page.getByText('Your vote counts').waitFor();

    await b.page.goto('/request');
    const device = `Tarrow Lightworks ${model}`;
    await b.page.getByRole('button', { name: `Vote for the ${device}` }).click();
    const vote = b.page.getByRole('form', { name: `Vote for the ${device}` });
    await vote.getByLabel('Your e-mail').fill(voter);
    await vote.getByRole('checkbox', { name: 'E-mail me when it has been tested' }).check();
    await vote.getByRole('button', { name: 'Send my vote' }).click();
    await b.page.getByText(`your vote for the ${device} counts once you confirm it`).waitFor();
    const voteMail = await waitForMail(voter, 'Confirm your vote');
    await b.page.goto(linkIn(voteMail.text, '/request/confirm'));
    await b.page.getByRole('button', { name: 'Confirm my vote' }).click();
    await b.page.getByText('Your vote counts').waitFor();
    await b.page.goto('/request');
    await b.page.getByRole('listitem').filter({ hasText: device }).getByText('2 votes').waitFor();

    const report = await publishNewReport(`Lumen wrap report ${stamp}`, ` E2E3 ${stamp}`);
    await signIn(b.page, demo('editor').email, demo('editor').password);
    await b.page.getByRole('navigation', { name: 'Lab' }).getByRole('link', { name: 'Test requests' }).click();
    const decision = b.page.getByRole('form', { name: `Decision on the ${device}` });
    await decision.getByLabel('Decision').selectOption('tested');
    await decision.getByLabel('Report').selectOption({ label: `Lumen wrap report ${stamp} (published, v1)` });
    await decision.getByRole('button', { name: 'Save the decision' }).click();
    await decision.getByText('Saved').waitFor();

    const tested = await waitForMail(voter, `Tested: ${device}`);
    expect(tested.text).toContain(`/reports/${report.slug}`);
    await new Promise((r) => setTimeout(r, 3000));
    expect(await mailsTo(voter, 'Tested:')).toHaveLength(1);
  });
});

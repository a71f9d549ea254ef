import { inject } from 'vitest';
import request from 'supertest';
import { DEMO_USERS } from '#seeds/data/demo-users.ts';
import { approvedRun, makeCatalog } from '#tests/server/helpers/lab-fixtures.ts';
import { readMailFolder, waitUntil, type ReceivedMail } from '#tests/support/mail-folder.ts';

/** Messages the local fake SMTP server received for an address whose subject contains `subject`. */
export async function mailsTo(to: string, subject: string): Promise<ReceivedMail[]> {
  return (await readMailFolder(inject('mailDir'))).filter((m) => m.to === to && m.subject.includes(subject));
}

/** Waits for the n-th such message in the mail folder (as a person checks their inbox). */
export async function waitForMail(to: string, subject: string, n = 1, timeoutMs = 30_000): Promise<ReceivedMail> {
  return waitUntil(`e-mail ${n} "${subject}" to ${to}`, async () => {
    const found = await mailsTo(to, subject);
    return found.length >= n ? found[n - 1] : undefined;
  }, timeoutMs, 250);
}

/** A supertest agent signed in as a demo account, against the running server. */
export async function demoAgent(role: 'tester' | 'editor' | 'admin') {
  const u = DEMO_USERS.find((d) => d.role === role)!;
  const origin = inject('baseUrl');
  const agent = request.agent(origin);
  const res = await agent.post('/api/auth/sign-in').set('Origin', origin).send({ email: u.email, password: u.password });
  if (res.status !== 200) throw new Error(`sign-in as ${role}: ${res.status}`);
  return agent;
}

/**
 * A published report over a new approved run, made through the lab API as the lab does: a tester
 * measures (catalogue, run, 18 files, submission), the editor approves, writes and publishes.
 */
export async function publishNewReport(title: string, suffix: string): Promise<{ id: string; slug: string }> {
  const origin = inject('baseUrl');
  const tester = await demoAgent('tester');
  const editor = await demoAgent('editor');
  const catalog = await makeCatalog(tester, origin, 0, suffix);
  const { runId } = await approvedRun({ origin }, tester, editor, { catalog });
  const created = await editor.post('/api/lab/reports').set('Origin', origin).send({ runIds: [runId], title, summary: `${title}: measured at 15 and 30 cm.`, bodyMarkdown: 'Measured on the bench.' });
  if (created.status !== 201) throw new Error(`report: ${created.status} ${JSON.stringify(created.body)}`);
  const published = await editor.post(`/api/lab/reports/${created.body.report.id}/publish`).set('Origin', origin).send({});
  if (published.status !== 200) throw new Error(`publish: ${published.status} ${JSON.stringify(published.body)}`);
  return { id: created.body.report.id, slug: created.body.report.slug };
}

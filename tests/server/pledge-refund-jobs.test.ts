import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { auditRepo } from '#server/db/repos/audit-repo.ts';
import { LAPSED_REASON } from '#server/services/pledges-service.ts';
import { waitUntil } from '#tests/support/mail-folder.ts';
import { fundingSteps } from './helpers/funding.ts';
import { approvedRun } from './helpers/lab-fixtures.ts';
import { insertUser, makeTestApp, signedInAgent } from './helpers/test-app.ts';

type App = Awaited<ReturnType<typeof makeTestApp>>;

const DAY_MS = 86_400_000;

describe('refund jobs through a provider outage, the 180-day sweep, and backers when the report is out', () => {
  let t: App;
  let steps: ReturnType<typeof fundingSteps>;
  let tester: Awaited<ReturnType<typeof signedInAgent>>;
  let editor: Awaited<ReturnType<typeof signedInAgent>>;
  // The app's clock: the sweep test moves it forward; payments and the provider keep real time.
  let offsetMs = 0;
  const clock = { now: () => new Date(Date.now() + offsetMs) };

  beforeAll(async () => {
    t = await makeTestApp({ READER_MAX_PER_IP: '1000', READER_MAX_PER_ADDRESS: '100', BENCH_DAY_COST_MINOR: '40000', PLEDGE_MIN_MINOR: '500' }, undefined, { worker: true, payments: true, clock });
    steps = fundingSteps(t);
    const users = { tester: await insertUser(t.db, 'tester'), editor: await insertUser(t.db, 'editor') };
    tester = await signedInAgent(t.origin, users.tester.email, users.tester.password);
    editor = await signedInAgent(t.origin, users.editor.email, users.editor.password);
  });
  afterAll(() => t.close());

  const fundedRequest = async (model: string, backers: { email: string; amountMinor: number; publicName?: string }[]) => {
    const id = await steps.openRequest(model);
    const goal = await editor.put(`/api/lab/test-requests/${id}/goal`).set('Origin', t.origin).send({ unitPriceMinor: 10000 });
    expect(goal.status).toBe(200);
    const pledges: string[] = [];
    for (const b of backers) pledges.push(await steps.pledgeAndPay(id, b));
    return { id, pledges };
  };

  /** The queue's own record of the refund job of a pledge (pg-boss keeps retries on the same row). */
  const refundJob = async (pledgeId: string) =>
    t.db.knex('pgboss.job').where({ name: 'refund-pledge' }).whereRaw("data->>'pledgeId' = ?", [pledgeId]).first('state', 'retry_count');

  it('a refund job that meets the provider down fails, is retried, and succeeds once it is back', { timeout: 180_000 }, async () => {
    const { id, pledges } = await fundedRequest('Outage 300', [{ email: 'eve@example.test', amountMinor: 12000 }]);
    const [pledgeId] = pledges;
    t.fake!.setDown(true);
    try {
      const declined = await editor.patch(`/api/lab/test-requests/${id}`).set('Origin', t.origin).send({ status: 'declined', reason: 'We cannot buy this model in any shop we trust.' });
      expect(declined.status).toBe(200);
      // The job ran against the outage and failed at least once: pg-boss holds it for a retry.
      const job = await waitUntil('the refund job to fail once', async () => {
        const j = await refundJob(pledgeId);
        return j && j.retry_count >= 1 ? j : undefined;
      }, 60_000, 200);
      expect(['retry', 'active', 'created']).toContain(job.state);
      expect(await steps.pledge(pledgeId)).toMatchObject({ status: 'refund_pending' });
      expect(steps.mailTo('eve@example.test', 'has been refunded')).toHaveLength(0);
    } finally {
      t.fake!.setDown(false);
    }
    await steps.pledgeBecomes(pledgeId, 'refunded');
    expect(await refundJob(pledgeId)).toMatchObject({ state: 'completed' });
    await waitUntil('the refund e-mail', () => steps.mailTo('eve@example.test', 'Your pledge of €120.00 has been refunded')[0], 30_000);
    // One refund at the provider, whatever the retries (the idempotency key is the pledge's).
    await t.fake!.whenIdle();
    const refunds = t.fake!.events().filter((e) => e.type === 'refund.created' && (e.event.data.object as { amount: number }).amount === 12000);
    expect(refunds).toHaveLength(1);
    expect(steps.mailTo('eve@example.test', 'has been refunded')).toHaveLength(1);
  });

  it('the daily sweep refunds a request not tested within 180 days of reaching its goal, once', { timeout: 180_000 }, async () => {
    const { id, pledges } = await fundedRequest('Sweep 500', [
      { email: 'fay@example.test', amountMinor: 25000, publicName: 'Fay' },
      { email: 'gus@example.test', amountMinor: 25000 },
    ]);
    const reachedAt = new Date((await steps.request(id)).funding.goalReachedAt);
    const sweepOnce = async () => {
      await t.queue.send([{ name: 'sweep-funding', data: {}, singletonKey: `test-${offsetMs}` }]);
      await waitUntil('the sweep job to finish', async () => (await t.queue.pending('sweep-funding')) === 0, 30_000, 200);
    };

    // 179 days on: still waiting for the test.
    offsetMs = reachedAt.getTime() + 179 * DAY_MS - Date.now();
    await sweepOnce();
    expect((await steps.request(id)).status).toBe('open');
    expect((await steps.pledge(pledges[0])).status).toBe('paid');

    // 180 days and a minute on: declined with the reason, every pledge refunded by a job.
    offsetMs = reachedAt.getTime() + 180 * DAY_MS + 60_000 - Date.now();
    await sweepOnce();
    for (const p of pledges) await steps.pledgeBecomes(p, 'refunded');
    const after = await steps.request(id);
    expect(after).toMatchObject({ status: 'declined', declineReason: LAPSED_REASON });
    expect(after.funding).toMatchObject({ raisedMinor: 0, goalReachedAt: null, open: false });
    for (const to of ['fay@example.test', 'gus@example.test']) {
      const mail = await waitUntil(`refund e-mail to ${to}`, () => steps.mailTo(to, 'Your pledge of €250.00 has been refunded')[0], 30_000);
      expect(mail.text).toContain('Not tested within 180 days');
    }
    const trail = await auditRepo.listFor(t.db.knex, 'test_request', id);
    expect(trail.filter((a) => a.action === 'test_request.funding_refunded')).toMatchObject([{ actor_label: 'system:worker', after: { refundsQueued: 2 } }]);

    // A second sweep finds nothing.
    await sweepOnce();
    expect((await auditRepo.listFor(t.db.knex, 'test_request', id)).filter((a) => a.action === 'test_request.funding_refunded')).toHaveLength(1);
    expect(steps.mailTo('fay@example.test', 'has been refunded')).toHaveLength(1);
    offsetMs = 0;
  });

  it('backers hear once when the report is out, and the report says it was funded by readers', { timeout: 240_000 }, async () => {
    const { id } = await fundedRequest('Report 700', [
      { email: 'hal@example.test', amountMinor: 30000, publicName: 'Hal' },
      { email: 'hal@example.test', amountMinor: 10000 },
      { email: 'ivy@example.test', amountMinor: 10000, notify: false } as { email: string; amountMinor: number },
    ]);
    // Funding is shown on a report only when a request is tested with it; before that, the lab paid.
    const { runId } = await approvedRun(t, tester, editor);
    const report = (await editor.post('/api/lab/reports').set('Origin', t.origin).send({ runIds: [runId], title: 'Report 700 at the bench', summary: 'As readers asked and paid for.', bodyMarkdown: '' })).body.report;
    expect((await editor.post(`/api/lab/reports/${report.id}/publish`).set('Origin', t.origin).send({})).status).toBe(200);
    expect((await t.api().get(`/api/public/reports/${report.slug}`)).body.report.funding).toEqual({ kind: 'lab' });

    expect((await editor.patch(`/api/lab/test-requests/${id}`).set('Origin', t.origin).send({ status: 'tested', reportId: report.id })).status).toBe(200);
    const mail = await waitUntil('the tested e-mail to the backer', () => steps.mailTo('hal@example.test', 'Tested: Quillon Lightworks Report 700')[0], 30_000);
    expect(mail.text).toContain('You helped pay for testing');
    expect(mail.text).toContain(`/reports/${report.slug}`);

    // Two readers (one pledged twice), €500.00 in all (30000 + 10000 + 10000, computed).
    const funded = { kind: 'readers', readers: 2, amounts: [{ amountMinor: 50000, currency: 'EUR' }] };
    await waitUntil('the report to show its funding', async () => {
      const r = (await t.api().get(`/api/public/reports/${report.slug}`)).body.report;
      return JSON.stringify(r.funding) === JSON.stringify(funded) ? r : undefined;
    }, 10_000, 200);
    expect((await t.api().get(`/api/public/reports/${report.slug}/figures.json`)).body.funding).toEqual(funded);

    // Marked tested again: still one e-mail; the reader who asked for none gets none.
    await editor.patch(`/api/lab/test-requests/${id}`).set('Origin', t.origin).send({ status: 'tested', reportId: report.id });
    await new Promise((r) => setTimeout(r, 1500));
    expect(steps.mailTo('hal@example.test', 'Tested:')).toHaveLength(1);
    expect(steps.mailTo('ivy@example.test', 'Tested:')).toHaveLength(0);
  });
});

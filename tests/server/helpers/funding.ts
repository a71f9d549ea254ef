import { expect } from 'vitest';
import { linkIn, tokenOf, waitUntil } from '#tests/support/mail-folder.ts';
import type { makeTestApp } from './test-app.ts';
import { submitHostedPage } from './payments.ts';

type App = Awaited<ReturnType<typeof makeTestApp>>;

/**
 * A reader's journey toward a funded request, through the public API and the fake provider's
 * hosted page, as a browser would take it. Every wait is bounded.
 */
export function fundingSteps(t: App) {
  const post = (path: string, body: object) => t.api().post(path).set('Origin', t.origin).send(body);
  const mailTo = (to: string, subject: string) => t.sent.filter((m) => m.to === to && m.subject.includes(subject));

  /** A request asked for and confirmed by its requester, so it is listed (open). */
  const openRequest = async (model: string, requester = `asker-${model.toLowerCase().replace(/\W+/g, '-')}@example.test`) => {
    const res = await post('/api/public/test-requests', {
      maker: 'Quillon Lightworks',
      model,
      link: 'https://quillon.example/products/panel',
      reason: 'A popular panel with a bold irradiance claim and no independent numbers yet.',
      email: requester,
    });
    expect(res.status).toBe(202);
    const mail = await waitUntil(`confirmation to ${requester}`, () => mailTo(requester, 'Confirm your test request')[0]);
    expect((await post('/api/public/votes/confirm', { token: tokenOf(linkIn(mail.text, '/request/confirm')) })).status).toBe(200);
    const list = (await t.api().get('/api/public/test-requests')).body.requests as { id: string; model: string }[];
    return list.find((r) => r.model === model)!.id;
  };

  const request = async (id: string) => (await t.api().get(`/api/public/test-requests/${id}`)).body.request;
  const pledge = async (id: string) => (await t.api().get(`/api/public/pledges/${id}`)).body.pledge;

  /** Waits until the pledge is in one of the states (the webhook decides). */
  const pledgeBecomes = (id: string, ...status: string[]) =>
    waitUntil(`pledge ${id} ${status.join('|')}`, async () => {
      const p = await pledge(id);
      return status.includes(p?.status) ? p : undefined;
    }, 60_000, 100);

  /** Pledges and goes through the hosted page ("Pay" or "Card declined"); answers the pledge's id. */
  const pledgeAndPay = async (requestId: string, body: { amountMinor: number; email: string; publicName?: string | null; notify?: boolean }, outcome: 'pay' | 'decline' = 'pay') => {
    const created = await post(`/api/public/test-requests/${requestId}/pledges`, body);
    expect(created.status, JSON.stringify(created.body)).toBe(201);
    const { pledgeId, checkoutUrl } = created.body as { pledgeId: string; checkoutUrl: string };
    const page = await submitHostedPage(checkoutUrl, outcome);
    if (outcome === 'pay') {
      // The provider sends the reader back to the request page, which waits for the webhook.
      expect(page.status).toBe(303);
      expect(page.location).toBe(`${t.origin}/requests/${requestId}?pledge=${pledgeId}`);
      await pledgeBecomes(pledgeId, 'paid');
    } else {
      expect(page.status).toBe(402);
      await pledgeBecomes(pledgeId, 'failed');
    }
    await t.fake!.whenIdle();
    return pledgeId;
  };

  return { post, mailTo, openRequest, request, pledge, pledgeBecomes, pledgeAndPay };
}

import { screen, within } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import type { PublicTestRequest } from '#shared/schemas/test-requests.ts';
import { stubFetch } from '#src/test/fetch-stub.ts';
import { renderApp } from '#src/test/render-app.tsx';

const SETTINGS = { currency: 'EUR', benchDayCostMinor: 40000, pledgeMinMinor: 500, refundAfterDays: 180 };

function aRequest(funding: Partial<PublicTestRequest['funding']> = {}): PublicTestRequest {
  return {
    id: 'req-1',
    maker: 'Quillon Lightworks',
    model: 'Aurel 600',
    link: 'https://quillon.example/aurel',
    reason: 'A popular panel with a bold claim and no independent numbers yet.',
    status: 'open',
    votes: 4,
    declineReason: null,
    report: null,
    createdAt: '2026-12-01T10:00:00.000Z',
    funding: {
      goal: { unitPriceMinor: 10000, benchDayMinor: 40000, totalMinor: 50000, currency: 'EUR' },
      raisedMinor: 20000,
      backers: 3,
      names: ['Ada L.', 'Bo'],
      anonymousBackers: 1,
      goalReachedAt: null,
      refundBy: null,
      refundsUnderWay: 0,
      open: true,
      ...funding,
    },
  };
}

afterEach(() => vi.restoreAllMocks());

describe('a request’s page', () => {
  it('shows raised against the goal in words, the goal’s arithmetic and the backers, named or counted', async () => {
    stubFetch({ 'GET /api/public/test-requests/req-1': { body: { request: aRequest() } }, 'GET /api/public/funding': { body: SETTINGS } });
    renderApp('/requests/req-1');
    await screen.findByRole('heading', { level: 1, name: 'Quillon Lightworks Aurel 600' });
    // 20000 / 50000 = 40 %; 50000 − 20000 = 30000 still needed (computed).
    expect((await screen.findByText(/of €500.00 raised/)).textContent).toBe('€200.00 of €500.00 raised (40 %) from 3 backers; €300.00 still needed.');
    expect(screen.getByText(/plus one day of bench time/).textContent).toContain('€100.00, plus one day of bench time, €400.00: €500.00');
    expect(screen.getByText('Backed by Ada L., Bo and 1 anonymous reader.')).toBeTruthy();
    expect(screen.getByRole('link', { name: 'How we buy units and handle readers’ money' }).getAttribute('href')).toBe('/independence');
  });

  it('checks the pledge on the page, sends integer minor units and goes to the provider’s page', async () => {
    const assign = vi.fn();
    vi.spyOn(window, 'location', 'get').mockReturnValue({ ...window.location, assign } as Location);
    const { calls } = stubFetch({
      'GET /api/public/test-requests/req-1': { body: { request: aRequest() } },
      'GET /api/public/funding': { body: SETTINGS },
      'POST /api/public/test-requests/req-1/pledges': { status: 201, body: { pledgeId: 'p-1', checkoutUrl: 'http://127.0.0.1:12111/pay/cs_test_1' } },
    });
    const { user } = renderApp('/requests/req-1');
    const form = await screen.findByRole('form', { name: 'Pledge toward testing the Quillon Lightworks Aurel 600' });
    const amount = within(form).getByLabelText('Amount (EUR)');
    await user.type(amount, '4.99');
    await user.type(within(form).getByLabelText('Your e-mail'), 'reader@example.test');
    await user.click(within(form).getByRole('button', { name: 'Pledge and go to payment' }));
    expect(await screen.findByText('The smallest pledge is €5.00.')).toBeTruthy();
    expect(calls.some((c) => c.method === 'POST')).toBe(false);

    await user.clear(amount);
    // 25.50 → 2550 minor units from the digits, never through a float (shared/money).
    await user.type(amount, '25.50');
    await user.type(within(form).getByLabelText('Name to show (optional)'), '  Ada L. ');
    await user.click(within(form).getByRole('button', { name: 'Pledge and go to payment' }));
    await vi.waitFor(() => expect(assign).toHaveBeenCalledWith('http://127.0.0.1:12111/pay/cs_test_1'));
    expect(calls.find((c) => c.method === 'POST')?.body).toEqual({ amountMinor: 2550, email: 'reader@example.test', publicName: 'Ada L.', notify: true });
  });

  it('takes no pledges once the goal is reached and says when the money goes back', async () => {
    stubFetch({
      'GET /api/public/test-requests/req-1': { body: { request: aRequest({ raisedMinor: 50000, goalReachedAt: '2026-12-02T10:00:00.000Z', refundBy: '2027-05-31T10:00:00.000Z', open: false }) } },
      'GET /api/public/funding': { body: SETTINGS },
    });
    renderApp('/requests/req-1');
    expect(await screen.findByText(/Goal reached on 2 Dec 2026/)).toBeTruthy();
    expect(screen.getByText(/has not been tested by 31 May 2027, every pledge is refunded automatically/)).toBeTruthy();
    expect(screen.queryByRole('button', { name: 'Pledge and go to payment' })).toBeNull();
  });

  it('back from the payment page, waits for the provider’s confirmation, then shows the new total', { timeout: 20_000 }, async () => {
    let asked = 0;
    let paid = false;
    stubFetch({
      'GET /api/public/test-requests/req-1': () => ({ body: { request: aRequest(paid ? { raisedMinor: 22550, backers: 4 } : {}) } }),
      'GET /api/public/funding': { body: SETTINGS },
      'GET /api/public/pledges/p-1': () => {
        asked += 1;
        paid = asked >= 2;
        return { body: { pledge: { id: 'p-1', requestId: 'req-1', status: paid ? 'paid' : 'pending', amountMinor: 2550, currency: 'EUR' } } };
      },
    });
    renderApp('/requests/req-1?pledge=p-1');
    expect(await screen.findByText('Thank you! We are confirming your payment of €25.50.')).toBeTruthy();
    expect(await screen.findByText('Thank you: your pledge is confirmed', {}, { timeout: 5000 })).toBeTruthy();
    // 20000 + 2550 = 22550 (computed), read again once the pledge was confirmed.
    await vi.waitFor(() => expect(screen.getByText(/of €500.00 raised/).textContent).toContain('€225.50 of €500.00 raised (45 %) from 4 backers'), { timeout: 5000 });
  });
});

describe('the independence page', () => {
  it('works the goal out from the lab’s settings', async () => {
    stubFetch({ 'GET /api/public/funding': { body: SETTINGS } });
    renderApp('/independence');
    await screen.findByRole('heading', { level: 1, name: 'Who pays for our tests' });
    // €329.00 + €400.00 = €729.00 (computed).
    expect((await screen.findByText(/a panel on sale at/)).textContent).toBe('For example, a panel on sale at €329.00: €329.00 + €400.00 = €729.00.');
    expect(screen.getByRole('heading', { level: 2, name: 'What we never take from makers or sellers' })).toBeTruthy();
    expect(screen.getByText(/within 180 days of the goal being reached/)).toBeTruthy();
  });
});

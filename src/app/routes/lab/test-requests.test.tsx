import { screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import type { LabTestRequest } from '#shared/schemas/test-requests.ts';
import { meAnswer, people, stubFetch } from '#src/test/fetch-stub.ts';
import { renderApp } from '#src/test/render-app.tsx';

const SETTINGS = { currency: 'EUR', benchDayCostMinor: 40000, pledgeMinMinor: 500, refundAfterDays: 180 };

const request = (goal: LabTestRequest['funding']['goal']): LabTestRequest => ({
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
  funding: { goal, raisedMinor: 0, backers: 0, names: [], anonymousBackers: 0, goalReachedAt: null, refundBy: null, refundsUnderWay: 0, open: goal !== null },
  pendingVotes: 0,
  notifyVotes: 2,
  mergedInto: null,
  reportId: null,
  triagedBy: null,
  triagedAt: null,
  updatedAt: '2026-12-01T10:00:00.000Z',
  pendingPledges: 0,
});

describe('the editors’ goal for a request', () => {
  it('shows price + bench day = goal as the price is typed, and saves the price in minor units', async () => {
    const goal = { unitPriceMinor: 12999, benchDayMinor: 40000, totalMinor: 52999, currency: 'EUR' };
    const { calls } = stubFetch({
      'GET /api/me': meAnswer(people.editor),
      'GET /api/lab/settings': { body: { fakeMailbox: false } },
      'GET /api/lab/test-requests': { body: { requests: [request(null)] } },
      'GET /api/lab/reports': { body: { reports: [] } },
      'GET /api/public/funding': { body: SETTINGS },
      'PUT /api/lab/test-requests/req-1/goal': { body: { request: request(goal) } },
    });
    const { user } = renderApp('/lab/requests');
    const price = await screen.findByLabelText('Unit price (retail, EUR)');
    expect(screen.getByText('Unit price + €400.00 one bench day = goal')).toBeTruthy();
    await user.type(price, '129.99');
    // 12999 + 40000 = 52999 minor units (computed).
    expect(screen.getByText('€129.99 unit + €400.00 one bench day = €529.99 goal')).toBeTruthy();
    await user.click(screen.getByRole('button', { name: 'Set the goal' }));
    expect(await screen.findByText('Goal saved: readers can pledge toward it now.')).toBeTruthy();
    expect(calls.find((c) => c.method === 'PUT')?.body).toEqual({ unitPriceMinor: 12999 });
  });
});

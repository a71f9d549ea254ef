import { describe, expect, it } from 'vitest';
import { fundingGoal, fundingLapsed, fundingProgress, refundDeadline, summarizeBackers } from './funding-math.ts';

describe('the goal: unit price + one bench day', () => {
  it('adds integer minor units exactly (computed)', () => {
    // €129.99 + €400.00 = €529.99, i.e. 12999 + 40000 = 52999 minor units.
    expect(fundingGoal(12999, 40000, 'eur')).toEqual({ unitPriceMinor: 12999, benchDayMinor: 40000, totalMinor: 52999, currency: 'EUR' });
    // A float sum would go wrong here: 0.1 + 0.2 = 0.30000000000000004; in cents 10 + 20 = 30.
    expect(fundingGoal(10, 20, 'EUR').totalMinor).toBe(30);
    expect(fundingGoal(1, 0, 'JPY').totalMinor).toBe(1);
  });

  it('refuses a zero, negative, fractional or unsafe amount', () => {
    expect(() => fundingGoal(0, 40000, 'EUR')).toThrow(RangeError);
    expect(() => fundingGoal(-1, 40000, 'EUR')).toThrow(RangeError);
    expect(() => fundingGoal(12.5, 40000, 'EUR')).toThrow(RangeError);
    expect(() => fundingGoal(100, -5, 'EUR')).toThrow(RangeError);
    expect(() => fundingGoal(Number.MAX_SAFE_INTEGER, 1, 'EUR')).toThrow('too large');
  });
});

describe('progress toward the goal', () => {
  it('rounds the percentage down, so a goal short by a cent is not shown as reached (computed)', () => {
    expect(fundingProgress(0, 50000)).toEqual({ percent: 0, barFraction: 0, remainingMinor: 50000, reached: false });
    expect(fundingProgress(20000, 50000)).toEqual({ percent: 40, barFraction: 0.4, remainingMinor: 30000, reached: false });
    // 49999 / 50000 = 99.998 % → 99.
    expect(fundingProgress(49999, 50000)).toMatchObject({ percent: 99, remainingMinor: 1, reached: false });
    expect(fundingProgress(50000, 50000)).toMatchObject({ percent: 100, barFraction: 1, remainingMinor: 0, reached: true });
    // Past the goal (two payments at the same moment): the true total, the bar full.
    expect(fundingProgress(60000, 50000)).toMatchObject({ percent: 120, barFraction: 1, remainingMinor: 0, reached: true });
  });

  it('refuses a zero goal', () => {
    expect(() => fundingProgress(1, 0)).toThrow(RangeError);
  });
});

describe('the refund deadline', () => {
  it('falls 180 days of 24 hours after the goal was reached (computed: 180 × 86 400 000 ms)', () => {
    const reached = new Date('2026-01-01T12:00:00Z');
    expect(refundDeadline(reached).toISOString()).toBe('2026-06-30T12:00:00.000Z');
    expect(fundingLapsed(reached, new Date('2026-06-30T11:59:59Z'))).toBe(false);
    expect(fundingLapsed(reached, new Date('2026-06-30T12:00:00Z'))).toBe(true);
    expect(fundingLapsed(reached, new Date('2026-01-11T12:00:00Z'), 10)).toBe(true);
  });
});

describe('backers as the request page shows them', () => {
  it('counts readers once, names those who chose a name, and only counts the anonymous', () => {
    const b = summarizeBackers([
      { backerKey: 'a', publicName: 'Ada', amountMinor: 2000 },
      { backerKey: 'b', publicName: null, amountMinor: 500 },
      { backerKey: 'a', publicName: 'Ada', amountMinor: 1000 },
      { backerKey: 'c', publicName: '  ', amountMinor: 700 },
      { backerKey: 'd', publicName: 'Bo', amountMinor: 800 },
    ]);
    // 2000 + 500 + 1000 + 700 + 800 = 5000 (computed).
    expect(b).toEqual({ raisedMinor: 5000, count: 4, names: ['Ada', 'Bo'], anonymous: 2 });
    expect(summarizeBackers([])).toEqual({ raisedMinor: 0, count: 0, names: [], anonymous: 0 });
  });

  it('refuses a fractional amount', () => {
    expect(() => summarizeBackers([{ backerKey: 'a', publicName: null, amountMinor: 0.5 }])).toThrow(RangeError);
  });
});

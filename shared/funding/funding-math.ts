/**
 * The arithmetic of a request's funding, in integer minor units (cents) only: the goal (the
 * unit's retail price plus one bench day), progress toward it, the backers shown, and when the
 * money goes back if the test does not happen.
 */

/** Days after its goal is reached within which a request must be tested, or every pledge is refunded. */
export const REFUND_AFTER_DAYS = 180;

const DAY_MS = 24 * 60 * 60 * 1000;

export interface FundingGoal {
  unitPriceMinor: number;
  benchDayMinor: number;
  totalMinor: number;
  currency: string;
}

const isMinor = (v: number) => Number.isSafeInteger(v) && v >= 0;

/** Unit price + one bench day = the goal. Throws on anything that is not a whole, non-negative amount. */
export function fundingGoal(unitPriceMinor: number, benchDayMinor: number, currency: string): FundingGoal {
  if (!isMinor(unitPriceMinor) || unitPriceMinor === 0) throw new RangeError(`The unit price must be a positive whole number of minor units, not ${unitPriceMinor}.`);
  if (!isMinor(benchDayMinor)) throw new RangeError(`The bench-day cost must be a whole, non-negative number of minor units, not ${benchDayMinor}.`);
  const totalMinor = unitPriceMinor + benchDayMinor;
  if (!Number.isSafeInteger(totalMinor)) throw new RangeError('The goal is too large.');
  return { unitPriceMinor, benchDayMinor, totalMinor, currency: currency.toUpperCase() };
}

export interface FundingProgress {
  /** Whole per cent raised, rounded down (99.9 % is not yet 100 %); may pass 100. */
  percent: number;
  /** 0…1 for drawing a bar. */
  barFraction: number;
  remainingMinor: number;
  reached: boolean;
}

export function fundingProgress(raisedMinor: number, goalMinor: number): FundingProgress {
  if (!isMinor(raisedMinor) || !isMinor(goalMinor) || goalMinor === 0) throw new RangeError('Raised and goal must be whole minor units, the goal above zero.');
  // Integer division: no float holds money, only the bar's width is a fraction.
  const percent = Math.floor((raisedMinor * 100) / goalMinor);
  return {
    percent,
    barFraction: Math.min(1, raisedMinor / goalMinor),
    remainingMinor: Math.max(0, goalMinor - raisedMinor),
    reached: raisedMinor >= goalMinor,
  };
}

/** When a request that reached its goal at `reachedAt` stops waiting: its pledges are refunded then. */
export function refundDeadline(reachedAt: Date, days = REFUND_AFTER_DAYS): Date {
  return new Date(reachedAt.getTime() + days * DAY_MS);
}

export function fundingLapsed(reachedAt: Date, now: Date, days = REFUND_AFTER_DAYS): boolean {
  return now.getTime() >= refundDeadline(reachedAt, days).getTime();
}

export interface BackerPledge {
  /** The same for every pledge of one reader (the server uses the lower-cased address; never sent out). */
  backerKey: string;
  /** The name the reader chose to show, or null for anonymous. */
  publicName: string | null;
  amountMinor: number;
}

export interface Backers {
  raisedMinor: number;
  /** Distinct readers. */
  count: number;
  /** Names readers chose to show, each once, in the order given. */
  names: string[];
  /** Readers who gave no name with any pledge: counted, never named. */
  anonymous: number;
}

/** Sums paid pledges into what the request page shows. */
export function summarizeBackers(pledges: readonly BackerPledge[]): Backers {
  const named = new Map<string, string[]>();
  let raisedMinor = 0;
  for (const p of pledges) {
    if (!isMinor(p.amountMinor)) throw new RangeError(`A pledge amount must be whole minor units, not ${p.amountMinor}.`);
    raisedMinor += p.amountMinor;
    const names = named.get(p.backerKey) ?? [];
    const name = p.publicName?.trim();
    if (name) names.push(name);
    named.set(p.backerKey, names);
  }
  const names: string[] = [];
  for (const list of named.values()) for (const n of list) if (!names.includes(n)) names.push(n);
  const anonymous = [...named.values()].filter((list) => list.length === 0).length;
  return { raisedMinor, count: named.size, names, anonymous };
}

import { z } from 'zod';
import { LEDGER_KINDS } from '../funding/ledger.ts';
import { PLEDGE_STATUSES } from '../funding/pledge-workflow.ts';
import { emailSchema } from './users.ts';

/**
 * Readers' funding of test requests: the goal an editor sets, readers' pledges, and the
 * admins' ledger. Every amount is an integer number of minor units with its currency beside it.
 */

/** The largest single amount the API takes (the provider's own ceiling for one payment is near this). */
export const MAX_AMOUNT_MINOR = 99_999_999;
export const PUBLIC_NAME_MAX = 60;

const minor = z.number().int();
const positiveMinor = (what: string) =>
  z
    .number({ message: `Enter the ${what}.` })
    .int({ message: `The ${what} must be whole minor units (cents).` })
    .positive({ message: `The ${what} must be above zero.` })
    .max(MAX_AMOUNT_MINOR, { message: `The ${what} is too large.` });

/** GET /api/public/funding: the lab's settings behind every goal and pledge. */
export const fundingSettingsSchema = z.object({
  currency: z.string(),
  /** One day of bench time: added to the unit's price to make a goal. */
  benchDayCostMinor: minor,
  /** The smallest pledge taken. */
  pledgeMinMinor: minor,
  /** Days after a goal is reached within which the test must happen, or every pledge is refunded. */
  refundAfterDays: z.number().int(),
});
export type FundingSettings = z.infer<typeof fundingSettingsSchema>;

export const fundingGoalSchema = z.object({ unitPriceMinor: minor, benchDayMinor: minor, totalMinor: minor, currency: z.string() });

/** What a request's page shows about its money; never who the backers are beyond the names they chose. */
export const requestFundingSchema = z.object({
  goal: fundingGoalSchema.nullable(),
  /** Paid pledges only (pending, refunded and failed ones count for nothing). */
  raisedMinor: minor,
  /** Distinct readers with a paid pledge. */
  backers: z.number().int(),
  /** Names backers chose to show. */
  names: z.array(z.string()),
  /** Backers who chose no name: counted, not named. */
  anonymousBackers: z.number().int(),
  goalReachedAt: z.string().nullable(),
  /** When pledges are refunded unless the request is tested before (goal reached + 180 days). */
  refundBy: z.string().nullable(),
  /** Pledges whose refund is under way. */
  refundsUnderWay: z.number().int(),
  /** Pledges are taken now (a goal, an open or planned request, the goal not yet reached). */
  open: z.boolean(),
});
export type RequestFunding = z.infer<typeof requestFundingSchema>;

/** PUT /api/lab/test-requests/:id/goal: the unit's retail price; the bench day is added from the settings. */
export const setGoalBodySchema = z.object({ unitPriceMinor: positiveMinor('unit price') });
export type SetGoalBody = z.infer<typeof setGoalBodySchema>;

/** POST /api/public/test-requests/:id/pledges. */
export const pledgeBodySchema = z.object({
  amountMinor: positiveMinor('amount'),
  email: emailSchema,
  /** Shown on the request page; absent or blank: anonymous (counted, not named). */
  publicName: z
    .string()
    .trim()
    .max(PUBLIC_NAME_MAX, { message: `Keep the name under ${PUBLIC_NAME_MAX} characters.` })
    .refine((s) => !s.includes('@'), { message: 'Leave your e-mail address out of the public name.' })
    .nullable()
    .optional()
    .transform((s) => (s ? s : null)),
  /** E-mail me when the report is out. */
  notify: z.boolean().optional().default(true),
});
export type PledgeBody = z.input<typeof pledgeBodySchema>;

export const pledgeCreatedSchema = z.object({ pledgeId: z.string(), checkoutUrl: z.string().url() });
export type PledgeCreated = z.infer<typeof pledgeCreatedSchema>;

/** GET /api/public/pledges/:id: enough for the "we are confirming your payment" page; no address. */
export const publicPledgeSchema = z.object({
  id: z.string(),
  requestId: z.string(),
  status: z.enum(PLEDGE_STATUSES),
  amountMinor: minor,
  currency: z.string(),
});
export type PublicPledge = z.infer<typeof publicPledgeSchema>;
export const publicPledgeResponseSchema = z.object({ pledge: publicPledgeSchema });

// The ledger (admins).
export const ledgerQuerySchema = z.object({
  /** One calendar month (UTC), "2026-12"; all time when absent. */
  month: z
    .string()
    .regex(/^\d{4}-(0[1-9]|1[0-2])$/, { message: 'A month as YYYY-MM.' })
    .optional(),
});
export type LedgerQuery = z.infer<typeof ledgerQuerySchema>;

export const ledgerEntrySchema = z.object({
  at: z.string(),
  kind: z.enum(LEDGER_KINDS),
  requestId: z.string(),
  device: z.string(),
  pledgeId: z.string(),
  amountMinor: minor,
  currency: z.string(),
  reference: z.string().nullable(),
});
const totals = z.object({
  currency: z.string(),
  paymentsMinor: minor,
  refundsMinor: minor,
  feesMinor: minor,
  heldMinor: minor,
  netMinor: minor,
  entries: z.number().int(),
});
export const ledgerSchema = z.object({
  period: z.object({ from: z.string(), to: z.string() }).nullable(),
  totals: z.array(totals),
  months: z.array(totals.extend({ month: z.string() })),
  requests: z.array(totals.extend({ requestId: z.string(), device: z.string() })),
  entries: z.array(ledgerEntrySchema),
});
export type Ledger = z.infer<typeof ledgerSchema>;

const side = z.object({ amountMinor: minor, feeMinor: minor }).nullable();
export const reconciliationSchema = z.object({
  period: z.object({ from: z.string(), to: z.string() }).nullable(),
  matched: z.boolean(),
  sums: z.array(z.object({ currency: z.string(), oursNetMinor: minor, providerNetMinor: minor })),
  providerTransactions: z.number().int(),
  differences: z.array(z.object({ reference: z.string(), currency: z.string(), ours: side, provider: side, note: z.string() })),
  checkedAt: z.string(),
});
export type ReconciliationView = z.infer<typeof reconciliationSchema>;

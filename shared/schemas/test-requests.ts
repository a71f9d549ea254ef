import { z } from 'zod';
import { requestFundingSchema } from './funding.ts';
import { emailSchema } from './users.ts';

export const TEST_REQUEST_STATUSES = ['unconfirmed', 'open', 'planned', 'declined', 'tested', 'merged'] as const;
export type TestRequestStatus = (typeof TEST_REQUEST_STATUSES)[number];

export const TEST_REQUEST_STATUS_LABELS: Readonly<Record<TestRequestStatus, string>> = {
  unconfirmed: 'Awaiting e-mail confirmation',
  open: 'Open',
  planned: 'Planned',
  declined: 'Declined',
  tested: 'Tested',
  merged: 'Merged',
};

export const MIN_REASON_LENGTH = 30;

const text = (what: string, max: number) =>
  z.string().trim().min(1, { message: `Enter the ${what}.` }).max(max, { message: `Keep the ${what} under ${max} characters.` });

export const createTestRequestBodySchema = z.object({
  maker: text('maker', 120),
  model: text('model', 160),
  link: z
    .string()
    .trim()
    .max(500)
    .url({ message: 'Enter a link that starts with https:// (the maker’s page or a shop).' })
    .refine((u) => /^https?:\/\//i.test(u), { message: 'Enter a link that starts with https://.' }),
  reason: z
    .string()
    .trim()
    .min(MIN_REASON_LENGTH, { message: `Tell us why in at least ${MIN_REASON_LENGTH} characters.` })
    .max(2000),
  email: emailSchema,
  notify: z.boolean().optional().default(true),
});
export type CreateTestRequestBody = z.input<typeof createTestRequestBodySchema>;

export const voteBodySchema = z.object({
  email: emailSchema,
  notify: z.boolean().optional().default(true),
});
export type VoteBody = z.input<typeof voteBodySchema>;

export const voteConfirmedSchema = z.object({ status: z.literal('confirmed'), requestId: z.string() });

export const publicTestRequestSchema = z.object({
  id: z.string(),
  maker: z.string(),
  model: z.string(),
  link: z.string(),
  reason: z.string(),
  status: z.enum(TEST_REQUEST_STATUSES),
  votes: z.number().int(),
  declineReason: z.string().nullable(),
  report: z.object({ slug: z.string(), title: z.string() }).nullable(),
  createdAt: z.string(),
  /** The goal, what readers have paid toward it and who chose to be named. */
  funding: requestFundingSchema,
});
export type PublicTestRequest = z.infer<typeof publicTestRequestSchema>;
export const publicTestRequestListSchema = z.object({ requests: z.array(publicTestRequestSchema) });
export const publicTestRequestResponseSchema = z.object({ request: publicTestRequestSchema });

export const labTestRequestSchema = publicTestRequestSchema.extend({
  pendingVotes: z.number().int(),
  notifyVotes: z.number().int(),
  mergedInto: z.string().nullable(),
  reportId: z.string().nullable(),
  triagedBy: z.string().nullable(),
  triagedAt: z.string().nullable(),
  updatedAt: z.string(),
  /** Pledges still waiting for their payment (checkouts open at the provider). */
  pendingPledges: z.number().int(),
});
export type LabTestRequest = z.infer<typeof labTestRequestSchema>;
export const labTestRequestListSchema = z.object({ requests: z.array(labTestRequestSchema) });
export const labTestRequestResponseSchema = z.object({ request: labTestRequestSchema });

export const labTestRequestQuerySchema = z.object({ status: z.enum(TEST_REQUEST_STATUSES).optional() });

export const triageBodySchema = z.discriminatedUnion('status', [
  z.object({ status: z.literal('open') }),
  z.object({ status: z.literal('planned') }),
  z.object({
    status: z.literal('declined'),
    reason: z.string().trim().min(10, { message: 'Give the reason readers will see (at least 10 characters).' }).max(2000),
  }),
  z.object({ status: z.literal('tested'), reportId: z.string().min(1, { message: 'Choose the report.' }).max(64) }),
]);
export type TriageBody = z.infer<typeof triageBodySchema>;

export const mergeBodySchema = z.object({ intoId: z.string().min(1, { message: 'Choose the request to keep.' }).max(64) });

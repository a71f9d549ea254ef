import { z } from 'zod';

/**
 * Stable error codes: clients branch on these, never on messages.
 * The HTTP status each one answers with lives beside it.
 */
export const ERROR_STATUS = {
  validation_failed: 422,
  bad_request: 400,
  /** A payment-provider webhook whose signature is missing, malformed or does not match. */
  bad_signature: 400,
  unauthenticated: 401,
  invalid_credentials: 401,
  forbidden: 403,
  origin_rejected: 403,
  not_found: 404,
  conflict: 409,
  /** A pledge toward a request that takes none now (no goal, goal reached, declined, tested or merged). */
  pledges_closed: 409,
  email_taken: 409,
  payload_too_large: 413,
  token_expired: 410,
  token_used: 410,
  rate_limited: 429,
  database_unavailable: 503,
  /** The payment provider could not be reached or answered with a server error; try again later. */
  payment_provider_unavailable: 503,
  /** The payment provider refused the request (details carry its own type and code). */
  payment_provider_error: 502,
  internal: 500,
} as const;
export type ErrorCode = keyof typeof ERROR_STATUS;

export const errorBodySchema = z.object({
  error: z.object({
    code: z.string(),
    message: z.string(),
    details: z.unknown().optional(),
  }),
});

/** The shape of `details` for validation_failed: one entry per offending field. */
export interface FieldIssue {
  path: string;
  message: string;
}

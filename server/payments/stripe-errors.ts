import Stripe from 'stripe';
import { AppError } from '../core/app-error.ts';

/**
 * Turns what the SDK throws into our AppError: the provider out of reach (connection errors,
 * time-outs, 5xx, rate limits — after the SDK's own retries) becomes 503
 * `payment_provider_unavailable`; a refusal (bad parameters, wrong key, an idempotency key reused
 * with other parameters, nothing to refund) becomes 502 `payment_provider_error` with the
 * provider's own type and code in `details`, for callers that branch on them.
 */
export function toAppError(err: unknown, action: string): unknown {
  if (!(err instanceof Stripe.errors.StripeError)) return err;
  const details = { providerType: err.rawType ?? err.type, providerCode: err.code ?? null, statusCode: err.statusCode ?? null, requestId: err.requestId ?? null };
  const unavailable =
    err instanceof Stripe.errors.StripeConnectionError ||
    err instanceof Stripe.errors.StripeRateLimitError ||
    (err.statusCode !== undefined && err.statusCode >= 500);
  if (unavailable) {
    return new AppError('payment_provider_unavailable', `The payment provider could not be reached to ${action}; try again shortly. (${err.message})`, details);
  }
  return new AppError('payment_provider_error', `The payment provider refused to ${action}: ${err.message}`, details);
}

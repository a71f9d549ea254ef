import type { Config } from '../config.ts';
import type { PaymentProvider } from './payment-provider.ts';
import { createStripePaymentProvider, type StripeProviderOptions } from './stripe-provider.ts';
import { createUnconfiguredPaymentProvider } from './unconfigured-provider.ts';

type PaymentsConfig = Pick<Config, 'PAYMENTS_SECRET_KEY' | 'PAYMENTS_WEBHOOK_SECRET' | 'PAYMENTS_API_URL'>;

/**
 * The provider the configuration asks for: Stripe's SDK, pointed at PAYMENTS_API_URL when set
 * (the local fake), or a stand-in that refuses every call when the keys are missing (never in
 * production: loadConfig refuses that).
 */
export function createPaymentProvider(
  config: PaymentsConfig,
  tuning: Pick<StripeProviderOptions, 'maxNetworkRetries' | 'timeoutMs'> = {},
): PaymentProvider {
  if (!config.PAYMENTS_SECRET_KEY || !config.PAYMENTS_WEBHOOK_SECRET) return createUnconfiguredPaymentProvider();
  return createStripePaymentProvider({
    secretKey: config.PAYMENTS_SECRET_KEY,
    webhookSecret: config.PAYMENTS_WEBHOOK_SECRET,
    apiUrl: config.PAYMENTS_API_URL,
    ...tuning,
  });
}

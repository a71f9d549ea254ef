import { AppError } from '../core/app-error.ts';
import type { PaymentProvider } from './payment-provider.ts';

/**
 * Stands in where no payment keys are set (development, tests that never pay): every call
 * answers 503 `payment_provider_unavailable` saying what to set, and every webhook is refused as
 * unsigned. Production never gets here: the configuration requires both keys there.
 */
export function createUnconfiguredPaymentProvider(): PaymentProvider {
  const refuse = async (): Promise<never> => {
    throw new AppError(
      'payment_provider_unavailable',
      'Payments are not configured: set PAYMENTS_SECRET_KEY and PAYMENTS_WEBHOOK_SECRET (and PAYMENTS_API_URL for the local fake).',
    );
  };
  return {
    createCheckout: refuse,
    retrieveCheckout: refuse,
    expireCheckout: refuse,
    retrievePayment: refuse,
    refund: refuse,
    balanceTransactions: refuse,
    verifyWebhook() {
      throw new AppError('bad_signature', 'Payments are not configured, so no webhook signature can be checked.');
    },
  };
}

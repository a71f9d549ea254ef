import path from 'node:path';
import { startFakePaymentProvider, type FakePaymentProvider } from '#server/payments/fake-provider/start-fake-provider.ts';
import { ROOT } from './run-step.ts';

/** What the standalone fake and the demo use unless told otherwise (local test values, not secrets). */
export const LOCAL_FAKE_PAYMENTS = {
  port: 12111,
  secretKey: 'sk_test_local_fake',
  webhookSecret: 'whsec_local_fake_payments',
  dataFile: path.join(ROOT, '.data', 'fake-payments.json'),
};

/** Starts the fake on 127.0.0.1, on the given port or, when that is taken, on a free one. */
export async function startLocalFakePayments(options: { port: number; webhookUrl: string; webhookSecret: string; dataFile: string }): Promise<FakePaymentProvider> {
  const start = (port: number) => startFakePaymentProvider({ ...options, port, host: '127.0.0.1' });
  try {
    return await start(options.port);
  } catch (err) {
    if ((err as NodeJS.ErrnoException).code !== 'EADDRINUSE') throw err;
    console.log(`Port ${options.port} is taken; the fake payment provider takes a free one.`);
    return start(0);
  }
}

/** The app's environment for talking to that fake. */
export function fakePaymentsEnv(fake: FakePaymentProvider, webhookSecret: string): Record<string, string> {
  return { PAYMENTS_API_URL: fake.url, PAYMENTS_SECRET_KEY: LOCAL_FAKE_PAYMENTS.secretKey, PAYMENTS_WEBHOOK_SECRET: webhookSecret };
}

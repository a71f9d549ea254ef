import { describe, expect, it } from 'vitest';
import { loadConfig } from '#server/config.ts';
import { createPaymentProvider } from '#server/payments/create-payment-provider.ts';

const keys = { PAYMENTS_SECRET_KEY: 'sk_live_x', PAYMENTS_WEBHOOK_SECRET: 'whsec_x' };

describe('payment configuration', () => {
  it('requires both keys in production', () => {
    expect(() => loadConfig({ NODE_ENV: 'production' })).toThrow(/PAYMENTS_SECRET_KEY: required in production[\s\S]*PAYMENTS_WEBHOOK_SECRET: required in production/);
    expect(() => loadConfig({ NODE_ENV: 'production', PAYMENTS_SECRET_KEY: 'sk_live_x' })).toThrow(/PAYMENTS_WEBHOOK_SECRET/);
  });

  it('never lets production talk to a plain-http provider (the fake)', () => {
    expect(() => loadConfig({ NODE_ENV: 'production', ...keys, PAYMENTS_API_URL: 'http://127.0.0.1:12111' })).toThrow(/PAYMENTS_API_URL: must be unset or https/);
    expect(loadConfig({ NODE_ENV: 'production', ...keys, PAYMENTS_API_URL: 'https://payments-proxy.example' }).PAYMENTS_API_URL).toBe('https://payments-proxy.example');
    expect(loadConfig({ NODE_ENV: 'production', ...keys }).PAYMENTS_API_URL).toBeUndefined();
  });

  it('takes the currency as an upper-case ISO code, EUR by default', () => {
    expect(loadConfig({}).PAYMENTS_CURRENCY).toBe('EUR');
    expect(loadConfig({ PAYMENTS_CURRENCY: 'usd' }).PAYMENTS_CURRENCY).toBe('USD');
    expect(() => loadConfig({ PAYMENTS_CURRENCY: 'EURO' })).toThrow(/PAYMENTS_CURRENCY/);
  });

  it('reads an empty variable as unset', () => {
    const c = loadConfig({ PAYMENTS_SECRET_KEY: '', PAYMENTS_WEBHOOK_SECRET: '', PAYMENTS_API_URL: '' });
    expect(c.PAYMENTS_SECRET_KEY).toBeUndefined();
    expect(c.PAYMENTS_API_URL).toBeUndefined();
  });

  it('without keys outside production, every payment call answers 503 saying what to set', async () => {
    const provider = createPaymentProvider(loadConfig({ NODE_ENV: 'development' }));
    await expect(provider.retrieveCheckout('cs_test_1')).rejects.toMatchObject({ code: 'payment_provider_unavailable', status: 503, message: expect.stringMatching(/PAYMENTS_SECRET_KEY/) });
    expect(() => provider.verifyWebhook(Buffer.from('{}'), 't=1,v1=00')).toThrowError(expect.objectContaining({ code: 'bad_signature' }));
  });
});

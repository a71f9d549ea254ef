/**
 * npm run payments:fake [-- --port 12111 --webhook-url URL --secret whsec_… --data FILE --reset]
 * Runs the local fake payment provider on 127.0.0.1 by itself, for development: the app's
 * provider module talks to it when PAYMENTS_API_URL points here. It keeps its state in
 * .data/fake-payments.json (--data), so a restart keeps its checkouts and balance. Never for
 * production: it refuses NODE_ENV=production, and production refuses a plain-http provider.
 */
import fs from 'node:fs';
import { parseArgs } from 'node:util';
import { FAKE_FEE_RULE } from '#server/payments/fake-provider/fake-fee.ts';
import { fakePaymentsEnv, LOCAL_FAKE_PAYMENTS, startLocalFakePayments } from './lib/local-fake-payments.ts';

async function main() {
  if (process.env.NODE_ENV === 'production') throw new Error('The fake payment provider does not run with NODE_ENV=production.');
  const { values } = parseArgs({
    options: {
      port: { type: 'string', default: String(LOCAL_FAKE_PAYMENTS.port) },
      'webhook-url': { type: 'string', default: `http://127.0.0.1:${process.env.PORT ?? 3000}/api/payments/webhook` },
      secret: { type: 'string', default: LOCAL_FAKE_PAYMENTS.webhookSecret },
      data: { type: 'string', default: LOCAL_FAKE_PAYMENTS.dataFile },
      reset: { type: 'boolean', default: false },
    },
  });
  if (values.reset) fs.rmSync(values.data, { force: true });
  const fake = await startLocalFakePayments({ port: Number(values.port), webhookUrl: values['webhook-url'], webhookSecret: values.secret, dataFile: values.data });
  console.log(`Fake payment provider on ${fake.url} (a local test: no money moves)`);
  console.log(`  webhooks to ${values['webhook-url']}; state in ${values.data}`);
  console.log(`  its own fee rule: ${FAKE_FEE_RULE}`);
  console.log(`  controls: GET ${fake.url}/__fake/events · POST ${fake.url}/__fake/down (down=true|false) · POST ${fake.url}/__fake/events/<id>/redeliver`);
  const env = Object.entries(fakePaymentsEnv(fake, values.secret)).map(([k, v]) => `${k}=${v}`).join(' ');
  console.log(`\nStart the app against it with:\n  ${env} npm run dev:server`);

  const stop = () => void fake.close().then(() => process.exit(0));
  process.on('SIGINT', stop);
  process.on('SIGTERM', stop);
}

main().catch((err: unknown) => {
  console.error(`\n✖ ${err instanceof Error ? err.message : String(err)}`);
  process.exit(1);
});

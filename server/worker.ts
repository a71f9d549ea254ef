/**
 * The worker process (npm run worker): runs the jobs the web processes queue — each uploaded
 * file's analysis and each run's figures. Several workers may run against one database; the
 * queue hands each job to one of them, and a job lost with a worker is retried after it expires.
 */
import { loadConfig } from './config.ts';
import { connect } from './connect.ts';
import { resolveDatabaseUrl } from './db/database-url.ts';
import { createLogger } from './logger.ts';
import { registerJobHandlers } from './job-handlers.ts';
import { createPaymentProvider } from './payments/create-payment-provider.ts';

const config = loadConfig();
const logger = createLogger(config.LOG_LEVEL);
const app = await connect({
  databaseUrl: resolveDatabaseUrl({ DATABASE_URL: config.DATABASE_URL }),
  logger,
  superviseQueue: true,
  payments: createPaymentProvider(config),
});
await registerJobHandlers(app.queue, app.services, logger);
logger.info('worker started');
console.log('Benchlight worker is running.');

let stopping = false;
async function shutdown(signal: string) {
  if (stopping) return;
  stopping = true;
  logger.info({ signal }, 'worker stopping');
  setTimeout(() => process.exit(0), 8000).unref();
  await app.close();
  process.exit(0);
}
process.on('SIGTERM', () => void shutdown('SIGTERM'));
process.on('SIGINT', () => void shutdown('SIGINT'));

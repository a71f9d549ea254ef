/**
 * The worker process (npm run worker): runs the jobs the web processes queue — each uploaded
 * file's analysis, each run's figures, every e-mail of the outbox, and readers' refunds and the
 * fees of their payments (with a daily look for requests not tested in time). Several workers may run
 * against one database; the queue hands each job to one of them, and a job lost with a worker is
 * retried after it expires.
 */
import { loadConfig, siteSettingsFrom } from './config.ts';
import { connect } from './connect.ts';
import { resolveDatabaseUrl } from './db/database-url.ts';
import { createLogger } from './logger.ts';
import { createPaymentProvider } from './payments/create-payment-provider.ts';
import { registerJobHandlers, startFundingSweep, startOutboxSweep } from './job-handlers.ts';
import { createMailer } from './mail/mailer.ts';

const config = loadConfig();
const logger = createLogger(config.LOG_LEVEL);
const app = await connect({
  databaseUrl: resolveDatabaseUrl({ DATABASE_URL: config.DATABASE_URL }),
  logger,
  superviseQueue: true,
  payments: createPaymentProvider(config),
  // The worker is what sends e-mail: it needs the SMTP server and where links point.
  mailer: createMailer({ smtpUrl: config.SMTP_URL, from: config.MAIL_FROM, logger }),
  site: siteSettingsFrom(config),
});
await registerJobHandlers(app.queue, app.services, logger);
const stopSweep = startOutboxSweep(app.services, logger);
const stopFundingSweep = startFundingSweep(app.queue, logger);
logger.info('worker started');
console.log('Benchlight worker is running.');

let stopping = false;
async function shutdown(signal: string) {
  if (stopping) return;
  stopping = true;
  logger.info({ signal }, 'worker stopping');
  setTimeout(() => process.exit(0), 8000).unref();
  stopSweep();
  stopFundingSweep();
  await app.close();
  process.exit(0);
}
process.on('SIGTERM', () => void shutdown('SIGTERM'));
process.on('SIGINT', () => void shutdown('SIGINT'));

/**
 * Starts the web server: reads the configuration once, connects, listens.
 * PORT (default 3000) on HOST (default 127.0.0.1).
 */
import { loadConfig } from './config.ts';
import { createDb, closeDb } from './db/knex.ts';
import { resolveDatabaseUrl } from './db/database-url.ts';
import { createLogger } from './logger.ts';
import { createMailer } from './mail/mailer.ts';
import { createApp } from './app.ts';
import { startJobQueue } from './queue/job-queue.ts';
import { createPaymentProvider } from './payments/create-payment-provider.ts';

const config = loadConfig();
const logger = createLogger(config.LOG_LEVEL);
const databaseUrl = resolveDatabaseUrl({ DATABASE_URL: config.DATABASE_URL });
const db = createDb(databaseUrl, (err) => logger.warn({ err: err.message }, 'database connection error'));
const mailer = createMailer({ smtpUrl: config.SMTP_URL, from: config.MAIL_FROM, logger });
// The web process only queues jobs; the worker (npm run worker) runs them.
const queue = await startJobQueue({ databaseUrl, logger, supervise: false });
// Stripe through its SDK, or the local fake when PAYMENTS_API_URL points at it (never in production).
const payments = createPaymentProvider(config);
const app = createApp({ config, db, mailer, clock: { now: () => new Date() }, logger, queue, payments });

const server = app.listen(config.PORT, config.HOST, () => {
  const address = server.address();
  const port = typeof address === 'object' && address ? address.port : config.PORT;
  const host = config.HOST === '0.0.0.0' ? '127.0.0.1' : config.HOST;
  logger.info({ port, host: config.HOST }, 'listening');
  console.log(`Benchlight is running at http://${host}:${port}/`);
});

server.on('error', (err: NodeJS.ErrnoException) => {
  if (err.code === 'EADDRINUSE') {
    console.error(`Port ${config.PORT} on ${config.HOST} is already in use. Stop the other program or set PORT=<port>.`);
  } else {
    console.error(`The web server could not start: ${err.message}`);
  }
  void queue.stop().then(() => closeDb(db)).then(() => process.exit(1));
});

function shutdown(signal: string) {
  logger.info({ signal }, 'shutting down');
  server.close(() => {
    void queue.stop().then(() => closeDb(db)).then(() => process.exit(0));
  });
  setTimeout(() => process.exit(0), 5000).unref();
}
process.on('SIGTERM', () => shutdown('SIGTERM'));
process.on('SIGINT', () => shutdown('SIGINT'));

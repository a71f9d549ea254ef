/**
 * Connects to PostgreSQL and builds the service collaborators: for the web server (main.ts),
 * the worker and command-line scripts. Nothing connects at import time; callers call this.
 */
import type { Logger } from 'pino';
import pino from 'pino';
import { createDb, closeDb, type DbHandles } from './db/knex.ts';
import { resolveDatabaseUrl } from './db/database-url.ts';
import { createSessionAuth } from './auth/session-auth.ts';
import { createSignInLimiter } from './auth/sign-in-limiter.ts';
import { createMailer, type Mailer } from './mail/mailer.ts';
import { systemClock, type Clock, type ServiceDeps, type SiteSettings } from './core/context.ts';
import { createServices, type Services } from './services/index.ts';
import { startJobQueue, type JobQueue } from './queue/job-queue.ts';
import { createPgFileStorage } from './storage/file-storage.ts';
import type { PaymentProvider } from './payments/payment-provider.ts';
import { createUnconfiguredPaymentProvider } from './payments/unconfigured-provider.ts';

export interface Connection {
  db: DbHandles;
  queue: JobQueue;
  deps: ServiceDeps;
  services: Services;
  close(): Promise<void>;
}

export interface ConnectOptions {
  databaseUrl?: string;
  logger?: Logger;
  mailer?: Mailer;
  clock?: Clock;
  signInLimits?: { perAccount: number; perIp: number; windowMinutes: number };
  /** The worker supervises the job queue (expires lost jobs); other processes only queue. */
  superviseQueue?: boolean;
  /**
   * The payment provider (the worker passes createPaymentProvider(config)). Absent, payment calls
   * answer 503: the seed and user:create need none, and must not require payment keys to run.
   */
  payments?: PaymentProvider;
  /** E-mail links, retries and limits (defaults otherwise). */
  site?: Partial<SiteSettings>;
}

export async function connect(options: ConnectOptions = {}): Promise<Connection> {
  const logger = options.logger ?? pino({ level: 'warn' });
  const databaseUrl = options.databaseUrl ?? resolveDatabaseUrl();
  const db = createDb(databaseUrl, (err) => logger.warn({ err: err.message }, 'database connection error'));
  const queue = await startJobQueue({ databaseUrl, logger, supervise: options.superviseQueue ?? false });
  const deps: ServiceDeps = {
    db: db.knex,
    clock: options.clock ?? systemClock,
    sessions: createSessionAuth(db.pool),
    signInLimiter: createSignInLimiter(db.pool, options.signInLimits ?? { perAccount: 10, perIp: 50, windowMinutes: 15 }),
    mailer: options.mailer ?? createMailer({ from: 'Benchlight <no-reply@benchlight.invalid>', logger }),
    logger,
    queue,
    storage: createPgFileStorage(db.knex),
    payments: options.payments ?? createUnconfiguredPaymentProvider(),
    site: options.site,
  };
  const close = async () => {
    await queue.stop();
    await closeDb(db);
  };
  return { db, queue, deps, services: createServices(deps), close };
}

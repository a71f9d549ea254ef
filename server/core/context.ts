import type { Logger } from 'pino';
import type { Db } from '../db/knex.ts';
import type { SessionAuth } from '../auth/session-auth.ts';
import type { SignInLimiter } from '../auth/sign-in-limiter.ts';
import type { Mailer } from '../mail/mailer.ts';
import type { JobQueue } from '../queue/job-queue.ts';
import type { FileStorage } from '../storage/file-storage.ts';
import type { PaymentProvider } from '../payments/payment-provider.ts';

export interface Clock {
  now(): Date;
}

export const systemClock: Clock = { now: () => new Date() };

/**
 * What services may receive: the database handle and the app's collaborators. Each service
 * asks only for the ones it uses (a Pick of this), so scripts can build it with less.
 */
export interface ServiceDeps {
  db: Db;
  clock: Clock;
  sessions: SessionAuth;
  signInLimiter: SignInLimiter;
  mailer: Mailer;
  logger: Logger;
  queue: JobQueue;
  storage: FileStorage;
  /** The payment provider (Stripe through its SDK, or the local fake at PAYMENTS_API_URL). */
  payments: PaymentProvider;
}

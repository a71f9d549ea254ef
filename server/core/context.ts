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

/** Settings of the reader-facing mail; each has a default, so scripts and tests may omit them. */
export interface SiteSettings {
  /** Where e-mailed links point (no trailing slash). */
  publicBaseUrl: string;
  /** First retry delay of a message the SMTP server did not take, s (doubling after). */
  mailRetrySeconds: number;
  /** Readers' mail-sending forms allowed per client IP and per address, per hour. */
  readerMaxPerIp: number;
  readerMaxPerAddress: number;
  /** The local fake SMTP server's folder while it is in use (the Mailbox page), else null. */
  fakeMailboxDir: string | null;
  /** The currency readers pledge in (PAYMENTS_CURRENCY). */
  paymentsCurrency: string;
  /** One bench day, minor units: added to a unit's price to make a request's goal. */
  benchDayCostMinor: number;
  /** The smallest pledge, minor units. */
  pledgeMinMinor: number;
}

export const DEFAULT_SITE_SETTINGS: SiteSettings = {
  publicBaseUrl: 'http://127.0.0.1:3000',
  mailRetrySeconds: 30,
  readerMaxPerIp: 30,
  readerMaxPerAddress: 5,
  fakeMailboxDir: null,
  paymentsCurrency: 'EUR',
  benchDayCostMinor: 40000,
  pledgeMinMinor: 500,
};

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
  /** Defaults from DEFAULT_SITE_SETTINGS for whatever is absent. */
  site?: Partial<SiteSettings>;
}

export function siteSettings(deps: Pick<ServiceDeps, 'site'>): SiteSettings {
  const s = { ...DEFAULT_SITE_SETTINGS, ...deps.site };
  return { ...s, publicBaseUrl: s.publicBaseUrl.replace(/\/+$/, '') };
}

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
import { systemClock, type Clock, type ServiceDeps } from './core/context.ts';
import { createServices, type Services } from './services/index.ts';

export interface Connection {
  db: DbHandles;
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
}

export function connect(options: ConnectOptions = {}): Connection {
  const logger = options.logger ?? pino({ level: 'warn' });
  const db = createDb(options.databaseUrl ?? resolveDatabaseUrl(), (err) => logger.warn({ err: err.message }, 'database connection error'));
  const deps: ServiceDeps = {
    db: db.knex,
    clock: options.clock ?? systemClock,
    sessions: createSessionAuth(db.pool),
    signInLimiter: createSignInLimiter(db.pool, options.signInLimits ?? { perAccount: 10, perIp: 50, windowMinutes: 15 }),
    mailer: options.mailer ?? createMailer({ from: 'Benchlight <no-reply@benchlight.invalid>', logger }),
    logger,
  };
  return { db, deps, services: createServices(deps), close: () => closeDb(db) };
}

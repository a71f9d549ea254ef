import type { Knex } from 'knex';
import type { Logger } from 'pino';
import type { SessionUser } from '../../shared/schemas/users.ts';
import type { SessionAuth } from '../auth/session-auth.ts';
import type { SignInLimiter } from '../auth/sign-in-limiter.ts';
import type { Mailer } from '../mail/mailer.ts';

export interface Clock {
  now(): Date;
}

/** What every service receives: the database handle and the app's collaborators. */
export interface ServiceDeps {
  db: Knex;
  clock: Clock;
  sessions: SessionAuth;
  signInLimiter: SignInLimiter;
  mailer: Mailer;
  logger: Logger;
}

/** Who is calling. */
export interface Caller {
  user: SessionUser | null;
  requestId: string | null;
  ip: string;
}

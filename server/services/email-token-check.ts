import { AppError, notFound } from '../core/app-error.ts';
import { hashEmailToken, type EmailTokenPurpose } from '../auth/email-tokens.ts';
import type { Db } from '../db/knex.ts';
import { emailTokensRepo, type EmailTokenRecord } from '../db/repos/email-tokens-repo.ts';

/**
 * Uses a single-use token from an e-mailed link, in the caller's transaction: 404 when unknown,
 * 410 token_used when used already, 410 token_expired when past its time.
 */
export async function useEmailToken(trx: Db, purpose: EmailTokenPurpose, token: string, now: Date): Promise<EmailTokenRecord> {
  const hash = hashEmailToken(token);
  const used = await emailTokensRepo.use(trx, purpose, hash, now);
  if (used) return used;
  const found = await emailTokensRepo.findByHash(trx, purpose, hash);
  if (!found) throw notFound('That link');
  if (found.usedAt) throw new AppError('token_used', 'This link has been used already.');
  throw new AppError('token_expired', 'This link has expired. Ask for a new one.');
}

/** Reads a reusable token (a reader's preferences link) without using it up: 404 when unknown. */
export async function readEmailToken(db: Db, purpose: EmailTokenPurpose, token: string, now: Date): Promise<EmailTokenRecord> {
  const found = await emailTokensRepo.findByHash(db, purpose, hashEmailToken(token));
  if (!found || found.usedAt) throw notFound('That link');
  if (found.expiresAt && new Date(found.expiresAt) <= now) throw new AppError('token_expired', 'This link has expired.');
  return found;
}

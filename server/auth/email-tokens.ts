import { createHash, randomBytes } from 'node:crypto';

/**
 * Tokens for e-mailed links (confirmations, invitations, password resets, preferences): 32 random
 * bytes from the operating system's CSPRNG, URL-safe base64 in the link, and only the SHA-256 of
 * it in the database — a copy of the database does not hold working links. A plain hash (no salt,
 * no slow hash) suffices because the token has 256 bits of entropy: nothing to guess from.
 */
export function newEmailToken(): { token: string; hash: string } {
  const token = randomBytes(32).toString('base64url');
  return { token, hash: hashEmailToken(token) };
}

export function hashEmailToken(token: string): string {
  return createHash('sha256').update(token, 'utf8').digest('hex');
}

export type EmailTokenPurpose = 'subscription_confirm' | 'reader_manage' | 'vote_confirm' | 'invitation' | 'password_reset';

const HOUR_MS = 60 * 60 * 1000;

/**
 * How long each kind of link works, ms (null: until revoked). Confirmations 48 h; invitations
 * 72 h; a password reset 1 h (short, as it hands over an account); a reader's preferences and
 * unsubscribe link never expires, because RFC 8058 unsubscribes from old e-mails too.
 */
export const TOKEN_LIFETIME_MS: Readonly<Record<EmailTokenPurpose, number | null>> = {
  subscription_confirm: 48 * HOUR_MS,
  vote_confirm: 48 * HOUR_MS,
  invitation: 72 * HOUR_MS,
  password_reset: 1 * HOUR_MS,
  reader_manage: null,
};

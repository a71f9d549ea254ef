import type { Knex } from 'knex';
import type { EmailTokenPurpose } from '../../auth/email-tokens.ts';
import { iso } from './list-page.ts';

export interface EmailTokenRecord {
  id: string;
  purpose: EmailTokenPurpose;
  subject: string;
  data: Record<string, unknown> | null;
  expiresAt: string | null;
  usedAt: string | null;
}

function toRecord(r: any): EmailTokenRecord {
  return { id: r.id, purpose: r.purpose, subject: r.subject, data: r.data, expiresAt: iso(r.expires_at), usedAt: iso(r.used_at) };
}

export const emailTokensRepo = {
  async insert(
    db: Knex,
    t: { id: string; purpose: EmailTokenPurpose; subject: string; hash: string; data?: Record<string, unknown> | null; outboxId?: string | null; expiresAt: Date | null; now: Date },
  ): Promise<void> {
    await db('email_tokens').insert({
      id: t.id,
      purpose: t.purpose,
      subject: t.subject,
      token_hash: t.hash,
      data: t.data ? JSON.stringify(t.data) : null,
      outbox_id: t.outboxId ?? null,
      expires_at: t.expiresAt,
      created_at: t.now,
    });
  },

  /** The token with that hash and purpose, whatever its state. */
  async findByHash(db: Knex, purpose: EmailTokenPurpose, hash: string): Promise<EmailTokenRecord | null> {
    const r = await db('email_tokens').where({ token_hash: hash, purpose }).first();
    return r ? toRecord(r) : null;
  },

  /** Uses a single-use token: only an unused, unexpired one is marked (one conditional update). */
  async use(db: Knex, purpose: EmailTokenPurpose, hash: string, now: Date): Promise<EmailTokenRecord | null> {
    const [r] = await db('email_tokens')
      .where({ token_hash: hash, purpose })
      .whereNull('used_at')
      .andWhere((w) => w.whereNull('expires_at').orWhere('expires_at', '>', now))
      .update({ used_at: now })
      .returning('*');
    return r ? toRecord(r) : null;
  },

  /** Ends every unused token of a subject for a purpose (a password set, an invitation revoked). */
  async useAll(db: Knex, purpose: EmailTokenPurpose, subject: string, now: Date): Promise<void> {
    await db('email_tokens').where({ purpose, subject }).whereNull('used_at').update({ used_at: now });
  },
};

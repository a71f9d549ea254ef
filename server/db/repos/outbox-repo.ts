import type { Knex } from 'knex';
import type { MailKind, OutboxMessage, OutboxState } from '#shared/schemas/mail.ts';
import { iso, likePattern, pageOf } from './list-page.ts';

export interface OutboxRecord extends OutboxMessage {
  payload: Record<string, unknown>;
  claim: string | null;
  claimedAt: string | null;
}

export interface NewOutboxRow {
  id: string;
  recipient: string;
  purpose: string;
  kind: MailKind;
  payload: Record<string, unknown>;
  messageId: string;
}

function toRecord(r: any): OutboxRecord {
  return {
    id: r.id,
    recipient: r.recipient,
    kind: r.kind,
    purpose: r.purpose,
    payload: r.payload ?? {},
    subject: r.subject,
    state: r.state,
    attempts: r.attempts,
    lastError: r.last_error,
    messageId: r.message_id,
    claim: r.claim,
    claimedAt: iso(r.claimed_at),
    createdAt: iso(r.created_at)!,
    nextAttemptAt: iso(r.next_attempt_at)!,
    sentAt: iso(r.sent_at),
    failedAt: iso(r.failed_at),
  };
}

export const outboxRepo = {
  /**
   * Records messages; one already recorded for the same recipient and purpose is left as it is.
   * Returns the ids of the rows this call inserted (only those need a send job).
   */
  async insertMany(db: Knex, rows: readonly NewOutboxRow[], now: Date): Promise<string[]> {
    const ids: string[] = [];
    for (let i = 0; i < rows.length; i += 500) {
      const inserted = await db('mail_outbox')
        .insert(
          rows.slice(i, i + 500).map((r) => ({
            id: r.id,
            recipient: r.recipient,
            purpose: r.purpose,
            kind: r.kind,
            payload: JSON.stringify(r.payload),
            message_id: r.messageId,
            state: 'queued',
            next_attempt_at: now,
            created_at: now,
            updated_at: now,
          })),
        )
        .onConflict(['recipient', 'purpose'])
        .ignore()
        .returning('id');
      ids.push(...inserted.map((r: { id: string }) => r.id));
    }
    return ids;
  },

  async find(db: Knex, id: string): Promise<OutboxRecord | null> {
    const r = await db('mail_outbox').where({ id }).first();
    return r ? toRecord(r) : null;
  },

  /**
   * Takes a due, queued message for one delivery attempt: one conditional update, so of two
   * workers (or one job run twice) exactly one gets it.
   */
  async claim(db: Knex, id: string, claim: string, now: Date): Promise<OutboxRecord | null> {
    const [r] = await db('mail_outbox')
      .where({ id, state: 'queued' })
      .andWhere('next_attempt_at', '<=', now)
      .update({ state: 'sending', claim, claimed_at: now, attempts: db.raw('attempts + 1'), updated_at: now })
      .returning('*');
    return r ? toRecord(r) : null;
  },

  /** Only the holder of the claim records the outcome of its attempt. */
  async markSent(db: Knex, id: string, claim: string, subject: string, now: Date): Promise<boolean> {
    const n = await db('mail_outbox').where({ id, claim }).update({ state: 'sent', subject, sent_at: now, last_error: null, failed_at: null, updated_at: now });
    return n > 0;
  },

  async markRetry(db: Knex, id: string, claim: string, error: string, nextAttemptAt: Date, now: Date, subject: string | null): Promise<boolean> {
    const n = await db('mail_outbox')
      .where({ id, claim, state: 'sending' })
      .update({ state: 'queued', claim: null, last_error: error, next_attempt_at: nextAttemptAt, updated_at: now, ...(subject ? { subject } : {}) });
    return n > 0;
  },

  async markFinal(db: Knex, id: string, claim: string, state: 'failed' | 'cancelled', reason: string, now: Date, subject: string | null): Promise<boolean> {
    const n = await db('mail_outbox')
      .where({ id, claim, state: 'sending' })
      .update({ state, last_error: reason, failed_at: now, updated_at: now, ...(subject ? { subject } : {}) });
    return n > 0;
  },

  /** Messages left 'sending' since before `staleBefore`: their worker stopped mid-attempt. */
  async interrupt(db: Knex, staleBefore: Date, reason: string, now: Date): Promise<string[]> {
    const rows = await db('mail_outbox')
      .where({ state: 'sending' })
      .andWhere('claimed_at', '<', staleBefore)
      .update({ state: 'failed', last_error: reason, failed_at: now, updated_at: now })
      .returning('id');
    return rows.map((r: { id: string }) => r.id);
  },

  /** Queued messages long past due: their job was lost (e.g. retries used up while the database was down). */
  async overdue(db: Knex, dueBefore: Date, limit: number): Promise<{ id: string; nextAttemptAt: string }[]> {
    const rows = await db('mail_outbox').where({ state: 'queued' }).andWhere('next_attempt_at', '<', dueBefore).orderBy('next_attempt_at').limit(limit).select('id', 'next_attempt_at');
    return rows.map((r) => ({ id: r.id, nextAttemptAt: iso(r.next_attempt_at)! }));
  },

  /** An admin's decision to send a failed message again: queued, attempts from zero. */
  async requeue(db: Knex, id: string, now: Date): Promise<OutboxRecord | null> {
    const [r] = await db('mail_outbox')
      .where({ id, state: 'failed' })
      .update({ state: 'queued', attempts: 0, claim: null, claimed_at: null, next_attempt_at: now, failed_at: null, updated_at: now })
      .returning('*');
    return r ? toRecord(r) : null;
  },

  async page(db: Knex, q: { state?: OutboxState; q: string; page: number; pageSize: number }) {
    const query = db('mail_outbox').select('*').orderBy([{ column: 'created_at', order: 'desc' }, { column: 'id', order: 'asc' }]);
    if (q.state) query.where({ state: q.state });
    if (q.q) {
      const like = likePattern(q.q);
      query.where((w) => w.whereILike('recipient', like).orWhereILike('subject', like).orWhereILike('purpose', like));
    }
    return pageOf(query, q, toRecord);
  },

  async countsByState(db: Knex): Promise<Record<OutboxState, number>> {
    const rows = await db('mail_outbox').select('state').count<{ state: OutboxState; count: number }[]>('* as count').groupBy('state');
    const out: Record<OutboxState, number> = { queued: 0, sending: 0, sent: 0, failed: 0, cancelled: 0 };
    for (const r of rows) out[r.state] = Number(r.count);
    return out;
  },
};

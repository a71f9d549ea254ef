/**
 * The outbox: every e-mail is a row written in the transaction of the change that causes it,
 * and sent by the worker (never in a web request), at most once per recipient and purpose.
 *
 * Delivery of one row: claim it (queued → sending, one conditional update), compose it, hand it
 * to SMTP with a Message-ID fixed by the row, record the outcome under the claim. A refused or
 * unreachable server means a retry with doubling delays (a new job starting later); a 5xx reply
 * or the last attempt means "failed" with the reason. A row still "sending" long after any attempt
 * could have ended belonged to a worker that died mid-attempt: it may or may not have reached the
 * server, so it is never resent by itself — it becomes "failed" (interrupted) for an admin to
 * decide. See docs/architecture.md, "Mail and the outbox".
 */
import { randomUUID } from 'node:crypto';
import type { MailKind, OutboxPage, OutboxQuery } from '#shared/schemas/mail.ts';
import { outboxQuerySchema } from '#shared/schemas/mail.ts';
import { AppError, forbidden, notFound } from '../core/app-error.ts';
import type { Caller } from '../core/caller.ts';
import { siteSettings, type ServiceDeps } from '../core/context.ts';
import type { Db } from '../db/knex.ts';
import { outboxRepo, type OutboxRecord } from '../db/repos/outbox-repo.ts';
import { isPermanentMailError } from '../mail/mailer.ts';
import { audit } from './audit.ts';
import type { MailComposer } from './mail-compose.ts';
import { assertCan } from './permissions.ts';

export interface OutgoingMail {
  recipient: string;
  purpose: string;
  kind: MailKind;
  /** Ids and choices only; the message is composed when it is sent. */
  payload: Record<string, unknown>;
}

/** Attempts before a message counts as failed (with doubling delays: about 4 h from 30 s). */
export const MAX_ATTEMPTS = 10;
/** Longest wait between two attempts, s. */
const MAX_DELAY_SECONDS = 2 * 60 * 60;
/**
 * A claim older than this belongs to a worker that stopped: one attempt ends within about a
 * minute (the mailer's connection, greeting and socket timeouts), so five is generous.
 */
export const CLAIM_TIMEOUT_MS = 5 * 60 * 1000;
/** A queued row this long past due has lost its job (the sweep queues a new one). */
const OVERDUE_MS = 15 * 60 * 1000;

export const INTERRUPTED_REASON =
  'Interrupted: the worker stopped while handing this message to the mail server. It may or may not have been delivered, so it was not sent again; send it again if it did not arrive.';

export type DeliveryOutcome = 'sent' | 'retry' | 'failed' | 'cancelled' | 'skipped';

function errorText(err: unknown): string {
  const e = err as { message?: unknown; responseCode?: unknown; code?: unknown };
  const parts = [typeof e?.responseCode === 'number' ? `SMTP ${e.responseCode}` : typeof e?.code === 'string' ? e.code : null, typeof e?.message === 'string' ? e.message : String(err)];
  return parts.filter(Boolean).join(': ').slice(0, 500);
}

export function createOutboxService(deps: Pick<ServiceDeps, 'db' | 'clock' | 'queue' | 'mailer' | 'logger' | 'site'>, composer: MailComposer) {
  const messageDomain = () => {
    try {
      return new URL(siteSettings(deps).publicBaseUrl).hostname || 'benchlight.invalid';
    } catch {
      return 'benchlight.invalid';
    }
  };

  /** Retry after base × 2^(attempt − 1) seconds, at most two hours. */
  const retryDelaySeconds = (attempt: number) => Math.min(MAX_DELAY_SECONDS, siteSettings(deps).mailRetrySeconds * 2 ** Math.max(0, attempt - 1));

  async function afterFailure(row: OutboxRecord, claim: string, err: unknown, subject: string | null): Promise<DeliveryOutcome> {
    const now = deps.clock.now();
    const reason = errorText(err);
    if (isPermanentMailError(err) || row.attempts >= MAX_ATTEMPTS) {
      await outboxRepo.markFinal(deps.db, row.id, claim, 'failed', `${reason}${row.attempts >= MAX_ATTEMPTS ? ` (after ${row.attempts} attempts)` : ''}`, now, subject);
      deps.logger.warn({ outboxId: row.id, kind: row.kind, attempts: row.attempts, err: reason }, 'mail failed for good');
      return 'failed';
    }
    const next = new Date(now.getTime() + retryDelaySeconds(row.attempts) * 1000);
    await deps.db.transaction(async (trx) => {
      if (await outboxRepo.markRetry(trx, row.id, claim, reason, next, now, subject)) {
        await deps.queue.enqueue(trx, [{ name: 'send-mail', data: { outboxId: row.id }, startAfter: next }]);
      }
    });
    deps.logger.info({ outboxId: row.id, kind: row.kind, attempts: row.attempts, next, err: reason }, 'mail not taken; retry later');
    return 'retry';
  }

  /** Records the success; retried a few times, as losing it would leave a sent message "sending". */
  async function recordSent(row: OutboxRecord, claim: string, subject: string): Promise<void> {
    for (let attempt = 1; ; attempt++) {
      try {
        await outboxRepo.markSent(deps.db, row.id, claim, subject, deps.clock.now());
        return;
      } catch (err) {
        if (attempt >= 5) throw err;
        await new Promise((r) => setTimeout(r, 500 * attempt));
      }
    }
  }

  return {
    /**
     * Records messages in the caller's transaction, with one send job each. A message already
     * recorded for the recipient and purpose is not recorded again. Returns how many were new.
     */
    async record(trx: Db, messages: readonly OutgoingMail[]): Promise<number> {
      if (messages.length === 0) return 0;
      const domain = messageDomain();
      const rows = messages.map((m) => {
        const id = randomUUID();
        return { id, recipient: m.recipient.trim().toLowerCase(), purpose: m.purpose, kind: m.kind, payload: m.payload, messageId: `<${id}@${domain}>` };
      });
      const inserted = await outboxRepo.insertMany(trx, rows, deps.clock.now());
      await deps.queue.enqueue(
        trx,
        inserted.map((id) => ({ name: 'send-mail', data: { outboxId: id } })),
      );
      return inserted.length;
    },

    /** One delivery attempt of one row (the worker's send-mail job). Idempotent: a second run finds the row taken or done. */
    async deliver(caller: Caller, id: string): Promise<DeliveryOutcome> {
      if (caller.kind !== 'system') throw forbidden('Only the worker sends mail.');
      const claim = randomUUID();
      const row = await outboxRepo.claim(deps.db, id, claim, deps.clock.now());
      if (!row) return 'skipped';
      let composition: Awaited<ReturnType<MailComposer['compose']>>;
      try {
        composition = await composer.compose(deps.db, row);
      } catch (err) {
        return afterFailure(row, claim, err, null);
      }
      if ('cancel' in composition) {
        await outboxRepo.markFinal(deps.db, row.id, claim, 'cancelled', composition.cancel, deps.clock.now(), null);
        return 'cancelled';
      }
      const { mail } = composition;
      try {
        await deps.mailer.send({ ...mail, to: row.recipient, messageId: row.messageId });
      } catch (err) {
        return afterFailure(row, claim, err, mail.subject);
      }
      await recordSent(row, claim, mail.subject);
      return 'sent';
    },

    /**
     * Run by the worker every minute: rows left "sending" by a dead worker become failed
     * (interrupted, never resent by themselves); queued rows whose job was lost get a new one.
     */
    async sweep(caller: Caller): Promise<{ interrupted: number; requeued: number }> {
      if (caller.kind !== 'system') throw forbidden('Only the worker sweeps the outbox.');
      const now = deps.clock.now();
      const interrupted = await outboxRepo.interrupt(deps.db, new Date(now.getTime() - CLAIM_TIMEOUT_MS), INTERRUPTED_REASON, now);
      if (interrupted.length > 0) deps.logger.warn({ outboxIds: interrupted }, 'mail interrupted mid-attempt; left for an admin');
      const overdue = await outboxRepo.overdue(deps.db, new Date(now.getTime() - OVERDUE_MS), 500);
      await deps.queue.send(overdue.map((r) => ({ name: 'send-mail' as const, data: { outboxId: r.id } })));
      return { interrupted: interrupted.length, requeued: overdue.length };
    },

    /** The send log, newest first (admins). */
    async list(caller: Caller, query: OutboxQuery): Promise<OutboxPage> {
      assertCan(caller, 'mail.manage');
      const q = outboxQuerySchema.parse(query);
      const [page, counts] = await Promise.all([outboxRepo.page(deps.db, q), outboxRepo.countsByState(deps.db)]);
      return { ...page, items: page.items.map(({ payload: _p, claim: _c, claimedAt: _a, ...m }) => m), counts };
    },

    /** An admin sends a failed message again (same Message-ID, so a receiver can spot a copy). */
    async resend(caller: Caller, id: string) {
      assertCan(caller, 'mail.manage');
      const row = await deps.db.transaction(async (trx) => {
        const before = await outboxRepo.find(trx, id);
        if (!before) throw notFound('That message');
        const requeued = await outboxRepo.requeue(trx, id, deps.clock.now());
        if (!requeued) throw new AppError('conflict', 'Only a failed message can be sent again.');
        await deps.queue.enqueue(trx, [{ name: 'send-mail', data: { outboxId: id } }]);
        await audit({ trx, clock: deps.clock, caller, action: 'mail.resend', entity: { type: 'mail', id }, before: { state: before.state, lastError: before.lastError }, after: { state: 'queued' } });
        return requeued;
      });
      const { payload: _p, claim: _c, claimedAt: _a, ...message } = row;
      return message;
    },
  };
}
export type OutboxService = ReturnType<typeof createOutboxService>;

/**
 * Readers' subscriptions: double opt-in, preferences and unsubscribing. Every answer to "subscribe"
 * is the same whether the address is known, pending, confirmed or new, and takes the same path
 * (one upsert, one outbox row); what differs is only in the e-mail its owner receives.
 */
import { randomUUID } from 'node:crypto';
import type { ReaderPreferences, SubscribeBody, Topics, UpdatePreferencesBody } from '#shared/schemas/subscriptions.ts';
import { subscribeBodySchema } from '#shared/schemas/subscriptions.ts';
import type { ReaderLimiter } from '../auth/reader-limiter.ts';
import { AppError } from '../core/app-error.ts';
import type { Caller } from '../core/caller.ts';
import type { ServiceDeps } from '../core/context.ts';
import type { Db } from '../db/knex.ts';
import { subscribersRepo } from '../db/repos/subscribers-repo.ts';
import { pledgesRepo } from '../db/repos/pledges-repo.ts';
import { testRequestsRepo } from '../db/repos/test-requests-repo.ts';
import { audit } from './audit.ts';
import { readEmailToken, useEmailToken } from './email-token-check.ts';
import type { OutboxService } from './outbox-service.ts';

/** 429 for a client IP past its limit; false when the address is past its own (answer the same, send nothing). */
export async function takeReaderLimit(limiter: ReaderLimiter, caller: Caller, email: string): Promise<boolean> {
  const { ipRetryAfterSeconds, addressOver } = await limiter.take(caller.ip ?? 'unknown', email);
  if (ipRetryAfterSeconds > 0) {
    throw new AppError(
      'rate_limited',
      `Too many requests from your network. Try again in ${Math.ceil(ipRetryAfterSeconds / 60)} minute(s).`,
      { retryAfterSeconds: ipRetryAfterSeconds },
      { 'Retry-After': String(ipRetryAfterSeconds) },
    );
  }
  return !addressOver;
}

export function createSubscriptionsService(deps: Pick<ServiceDeps, 'db' | 'clock'>, outbox: OutboxService, limiter: ReaderLimiter) {
  /** The address a preferences link was mailed to. */
  const addressOf = async (db: Db, token: string) => (await readEmailToken(db, 'reader_manage', token, deps.clock.now())).subject;

  const preferencesOf = async (db: Db, email: string): Promise<ReaderPreferences> => {
    const subscriber = await subscribersRepo.findByEmail(db, email);
    return {
      email,
      subscription: subscriber ? { status: subscriber.status, topics: subscriber.topics, corrections: subscriber.corrections } : null,
      votes: await testRequestsRepo.votesOf(db, email),
    };
  };

  const unsubscribeAddress = async (caller: Caller, email: string) => {
    await deps.db.transaction(async (trx) => {
      const now = deps.clock.now();
      const subscriber = await subscribersRepo.findByEmail(trx, email, { lock: true });
      if (subscriber && subscriber.status !== 'unsubscribed') {
        await subscribersRepo.setChoices(trx, subscriber.id, { status: 'unsubscribed' }, now);
        await audit({ trx, clock: deps.clock, caller, action: 'subscriber.unsubscribe', entity: { type: 'subscriber', id: subscriber.id }, before: { status: subscriber.status }, after: { status: 'unsubscribed' } });
      }
      // "Unsubscribe" stops every e-mail to readers at this address, votes' and pledges' news included
      // (a refund notice still goes: it is about the reader's money).
      await testRequestsRepo.setNotifyForAddress(trx, email, false);
      await pledgesRepo.setNotifyForAddress(trx, email, false);
    });
  };

  return {
    /** Always the same answer; a confirmation e-mail goes to the address unless it passed its limit. */
    async subscribe(caller: Caller, input: SubscribeBody): Promise<void> {
      const body = subscribeBodySchema.parse(input);
      if (!(await takeReaderLimit(limiter, caller, body.email))) return;
      await deps.db.transaction(async (trx) => {
        const now = deps.clock.now();
        const subscriber = await subscribersRepo.upsertLocked(trx, { id: randomUUID(), email: body.email, topics: body.topics, corrections: body.corrections, now });
        // A confirmed subscriber's choices change only when the confirmation comes back (the
        // same statement runs either way, so known and new addresses take the same time).
        const pending = subscriber.status !== 'confirmed';
        await subscribersRepo.setChoices(trx, subscriber.id, pending ? { topics: body.topics, corrections: body.corrections, status: 'pending' } : {}, now);
        await outbox.record(trx, [
          {
            recipient: body.email,
            purpose: `subscription-confirm:${randomUUID()}`,
            kind: 'subscription_confirm',
            payload: { subscriberId: subscriber.id, topics: body.topics, corrections: body.corrections },
          },
        ]);
      });
    },

    /** POST only: a mail scanner that opens the link confirms nothing. */
    async confirm(caller: Caller, token: string): Promise<void> {
      await deps.db.transaction(async (trx) => {
        const now = deps.clock.now();
        const used = await useEmailToken(trx, 'subscription_confirm', token, now);
        const subscriber = await subscribersRepo.findById(trx, used.subject, { lock: true });
        if (!subscriber) throw new AppError('not_found', 'That subscription no longer exists.');
        const choices = (used.data ?? {}) as { topics?: Topics; corrections?: boolean };
        const after = await subscribersRepo.setChoices(trx, subscriber.id, { topics: choices.topics, corrections: choices.corrections, status: 'confirmed' }, now);
        await audit({ trx, clock: deps.clock, caller, action: 'subscriber.confirm', entity: { type: 'subscriber', id: subscriber.id }, before: { status: subscriber.status }, after: { status: after.status, topics: after.topics, corrections: after.corrections } });
      });
    },

    async preferences(_caller: Caller, token: string): Promise<ReaderPreferences> {
      return preferencesOf(deps.db, await addressOf(deps.db, token));
    },

    async updatePreferences(caller: Caller, body: UpdatePreferencesBody): Promise<ReaderPreferences> {
      const email = await addressOf(deps.db, body.token);
      await deps.db.transaction(async (trx) => {
        const now = deps.clock.now();
        const subscriber = await subscribersRepo.findByEmail(trx, email, { lock: true });
        if (subscriber && (body.topics || body.corrections !== undefined)) {
          const after = await subscribersRepo.setChoices(trx, subscriber.id, { topics: body.topics, corrections: body.corrections }, now);
          await audit({ trx, clock: deps.clock, caller, action: 'subscriber.update', entity: { type: 'subscriber', id: subscriber.id }, before: { topics: subscriber.topics, corrections: subscriber.corrections }, after: { topics: after.topics, corrections: after.corrections } });
        }
        if (body.voteNotify !== undefined) await testRequestsRepo.setNotifyForAddress(trx, email, body.voteNotify);
      });
      return preferencesOf(deps.db, email);
    },

    /** The unsubscribe page's button and RFC 8058's one-click POST: the token is the authority. */
    async unsubscribe(caller: Caller, token: string): Promise<void> {
      await unsubscribeAddress(caller, await addressOf(deps.db, token));
    },
  };
}
export type SubscriptionsService = ReturnType<typeof createSubscriptionsService>;

import type { PaymentEvent } from '../payments/payment-provider.ts';
import { AppError } from '../core/app-error.ts';
import { systemCaller } from '../core/caller.ts';
import type { ServiceDeps } from '../core/context.ts';
import type { Db } from '../db/knex.ts';
import { paymentEventsRepo } from '../db/repos/payment-events-repo.ts';
import { audit } from './audit.ts';

/** Reacts to one event type inside the transaction that stores the event (so both commit or neither). */
export type PaymentEventHandler = (trx: Db, event: PaymentEvent) => Promise<void>;
/** By event type, e.g. 'checkout.session.completed'; the pledge code registers its own here. */
export type PaymentEventHandlers = Partial<Record<string, PaymentEventHandler>>;

export interface ReceiveResult {
  eventId: string;
  type: string;
  /** The event was stored before: nothing was done this time. */
  duplicate: boolean;
  /** A handler ran for it (false for a duplicate or a type nobody handles yet). */
  handled: boolean;
}

/**
 * Webhook intake: the provider's signature is the only authority (no session, no capability):
 * verified first, then the event is stored once by its own id and handed to the handler for its
 * type in the same transaction. A resent event finds its row and changes nothing; a handler that
 * throws rolls everything back, so the endpoint answers 500 and the provider sends it again.
 */
export function createPaymentEventsService(
  deps: Pick<ServiceDeps, 'db' | 'clock' | 'payments'>,
  options: { handlers?: PaymentEventHandlers } = {},
) {
  const handlers = options.handlers ?? {};
  const caller = systemCaller('payments');
  return {
    async receive(rawBody: Buffer, signature: string | undefined): Promise<ReceiveResult> {
      const event = deps.payments.verifyWebhook(rawBody, signature);
      if (typeof event?.id !== 'string' || typeof event.type !== 'string' || !event.id || !event.type) {
        throw new AppError('bad_request', 'The signed webhook event has no id or type.');
      }
      return deps.db.transaction(async (trx) => {
        const stored = await paymentEventsRepo.insertIfNew(trx, { id: event.id, type: event.type, payload: event, receivedAt: deps.clock.now() });
        if (!stored) return { eventId: event.id, type: event.type, duplicate: true, handled: false };
        const handler = handlers[event.type];
        if (handler) {
          await handler(trx, event);
          await paymentEventsRepo.markProcessed(trx, event.id, deps.clock.now());
        }
        await audit({
          trx,
          clock: deps.clock,
          caller,
          action: 'payment_event.receive',
          entity: { type: 'payment_event', id: event.id },
          after: { type: event.type, handled: Boolean(handler) },
        });
        return { eventId: event.id, type: event.type, duplicate: false, handled: Boolean(handler) };
      });
    },
  };
}

/**
 * Delivers the fake's events to one webhook endpoint the way the provider does: a JSON POST
 * signed in the `Stripe-Signature` header (signed afresh, with a new timestamp, on every
 * attempt); any 2xx answer counts as delivered; anything else, or no answer, is tried again after
 * a delay, a bounded number of times. Events of one checkout session go one after another, so
 * "completed" never overtakes an earlier "payment failed" of the same session.
 */
import type { EventRecord } from './fake-state.ts';
import { webhookSignatureHeader } from './webhook-signature.ts';

export interface DeliveryOptions {
  webhookUrl: string;
  webhookSecret: string;
  /** Waits between attempts, ms; attempts = retryDelaysMs.length + 1. */
  retryDelaysMs: readonly number[];
  /** How long one attempt may take, ms. */
  attemptTimeoutMs: number;
  now: () => Date;
  /** Called after every attempt (the state changed). */
  onAttempt: () => void;
}

export interface WebhookDeliverer {
  /** Queues the event behind earlier ones with the same order key; resolves when it is settled. */
  deliver(record: EventRecord): Promise<void>;
  /** Resolves when nothing is waiting or in flight. */
  whenIdle(): Promise<void>;
  /** Stops at once: waits are cut short, attempts in flight aborted, nothing more is tried. */
  close(): Promise<void>;
}

export function createWebhookDeliverer(options: DeliveryOptions): WebhookDeliverer {
  const stop = new AbortController();
  const chains = new Map<string, Promise<void>>();

  const attempt = async (record: EventRecord): Promise<boolean> => {
    const payload = JSON.stringify(record.event, null, 2);
    const timestamp = Math.floor(options.now().getTime() / 1000);
    const at = options.now().toISOString();
    try {
      const res = await fetch(options.webhookUrl, {
        method: 'POST',
        headers: {
          'Content-Type': 'application/json; charset=utf-8',
          'User-Agent': 'Benchlight-FakePayments/1.0',
          'Stripe-Signature': webhookSignatureHeader(payload, options.webhookSecret, timestamp),
        },
        body: payload,
        signal: AbortSignal.any([stop.signal, AbortSignal.timeout(options.attemptTimeoutMs)]),
      });
      await res.arrayBuffer();
      record.attempts.push({ at, status: res.status });
      return res.ok;
    } catch (err) {
      record.attempts.push({ at, status: null, error: err instanceof Error ? err.message : String(err) });
      return false;
    }
  };

  const run = async (record: EventRecord): Promise<void> => {
    record.delivery = 'pending';
    for (let i = 0; i <= options.retryDelaysMs.length; i++) {
      if (stop.signal.aborted) return;
      if (i > 0) await sleep(options.retryDelaysMs[i - 1], stop.signal);
      if (stop.signal.aborted) return;
      const ok = await attempt(record);
      if (ok) record.delivery = 'delivered';
      else if (i === options.retryDelaysMs.length) record.delivery = 'failed';
      options.onAttempt();
      if (ok) return;
    }
  };

  return {
    deliver(record) {
      const previous = chains.get(record.orderKey) ?? Promise.resolve();
      const next = previous.then(() => run(record));
      chains.set(record.orderKey, next);
      // Forget a finished chain so the map does not grow with every session.
      void next.then(() => {
        if (chains.get(record.orderKey) === next) chains.delete(record.orderKey);
      });
      return next;
    },
    async whenIdle() {
      while (chains.size > 0) await Promise.all([...chains.values()]);
    },
    async close() {
      stop.abort();
      await Promise.all([...chains.values()]);
    },
  };
}

function sleep(ms: number, signal: AbortSignal): Promise<void> {
  return new Promise((resolve) => {
    if (signal.aborted) return resolve();
    const timer = setTimeout(done, ms);
    signal.addEventListener('abort', done, { once: true });
    function done() {
      clearTimeout(timer);
      signal.removeEventListener('abort', done);
      resolve();
    }
  });
}

/**
 * A local stand-in for the payment provider, for development, the demo and tests: an Express
 * app on a loopback address that answers the few API calls stripe-provider.ts makes, in the
 * provider's wire format (form-encoded requests with bracketed keys, JSON answers with `object`
 * fields, `{ error: { type, message, code } }` errors, `Idempotency-Key` honoured), serves a
 * hosted payment page, and delivers signed webhooks with retries. Never used in production:
 * the configuration refuses a plain-http PAYMENTS_API_URL there.
 */
import type { Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import express, { type Request, type Response } from 'express';
import { fakeId } from './fake-ids.ts';
import { createFakeLedger } from './fake-ledger.ts';
import { downPageHtml, notFoundPageHtml, payPageHtml } from './fake-pay-page.ts';
import { type EventRecord, loadState, saveState } from './fake-state.ts';
import { createWebhookDeliverer } from './fake-webhooks.ts';
import { FakeApiError } from './fake-wire.ts';

export interface FakePaymentProviderOptions {
  /** 0 (the default) picks a free port. */
  port?: number;
  /** A loopback address only. */
  host?: '127.0.0.1' | '::1' | 'localhost';
  /** Where events are POSTed (the app's /api/payments/webhook). */
  webhookUrl: string;
  webhookSecret: string;
  /** Keeps the state across restarts (JSON, rewritten after every change). */
  dataFile?: string;
  /** When set, API calls with another secret key get 401 as from the provider. */
  secretKey?: string;
  /** Waits between delivery attempts, ms (default 0.5, 1, 2, 4, 8 s: 6 attempts in all). */
  retryDelaysMs?: readonly number[];
  /** How long one delivery attempt may take, ms (default 5000). */
  attemptTimeoutMs?: number;
  now?: () => Date;
}

export interface FakeEventView {
  id: string;
  type: string;
  created: number;
  delivery: EventRecord['delivery'];
  attempts: EventRecord['attempts'];
  /** The event exactly as delivered (JSON). */
  event: EventRecord['event'];
}

export interface FakePaymentProvider {
  /** http://127.0.0.1:<port>: PAYMENTS_API_URL for the app. */
  url: string;
  port: number;
  /** While down, every /v1 call answers 503 and the hosted page too (deliveries go on). */
  setDown(down: boolean): void;
  events(): FakeEventView[];
  /** Sends the same event (same id) again; resolves when that delivery has settled. */
  redeliver(eventId: string): Promise<void>;
  /** Resolves when no delivery is waiting or in flight. */
  whenIdle(): Promise<void>;
  close(): Promise<void>;
}

const DEFAULT_RETRY_DELAYS_MS = [500, 1000, 2000, 4000, 8000];

export async function startFakePaymentProvider(options: FakePaymentProviderOptions): Promise<FakePaymentProvider> {
  const host = options.host ?? '127.0.0.1';
  if (!['127.0.0.1', '::1', 'localhost'].includes(host)) throw new Error('The fake payment provider listens on a loopback address only.');
  const now = options.now ?? (() => new Date());
  const state = loadState(options.dataFile);
  let down = false;
  let baseUrl = '';
  const fresh: EventRecord[] = [];

  const deliverer = createWebhookDeliverer({
    webhookUrl: options.webhookUrl,
    webhookSecret: options.webhookSecret,
    retryDelaysMs: options.retryDelaysMs ?? DEFAULT_RETRY_DELAYS_MS,
    attemptTimeoutMs: options.attemptTimeoutMs ?? 5000,
    now,
    onAttempt: () => saveState(options.dataFile, state),
  });
  const ledger = createFakeLedger({ state, now, baseUrl: () => baseUrl, emitted: (r) => fresh.push(r) });

  /** After every change: write the state, then send the events it caused, in order. */
  const commit = () => {
    saveState(options.dataFile, state);
    for (const r of fresh.splice(0)) void deliverer.deliver(r);
  };

  const app = express();
  app.disable('x-powered-by');
  // Bracketed keys (created[gte], line_items[0][price_data][currency]) become nested objects.
  app.set('query parser', 'extended');
  app.use((_req, res, next) => {
    res.setHeader('Request-Id', fakeId('req'));
    next();
  });

  // Test controls, answered even while "down".
  const controls = express.Router();
  controls.use(express.json(), express.urlencoded({ extended: false }));
  controls.get('/events', (_req, res) => void res.json({ data: views() }));
  controls.post('/down', (req, res) => {
    const value = String(req.body?.down ?? 'true');
    down = value === 'true' || value === '1';
    res.json({ down });
  });
  controls.post('/events/:id/redeliver', (req, res) => {
    const record = state.events.find((r) => r.event.id === req.params.id);
    if (!record) return void res.status(404).json(new FakeApiError(404, 'invalid_request_error', `No such event: '${req.params.id}'`, 'resource_missing').body());
    void deliverer.deliver(record);
    res.status(202).json({ redelivering: record.event.id });
  });
  app.use('/__fake', controls);

  app.use(['/v1', '/pay'], (req, res, next) => {
    if (!down) return next();
    if (req.baseUrl === '/pay') return void res.status(503).type('html').send(downPageHtml());
    res.status(503).json(new FakeApiError(503, 'api_error', 'The payment provider is unavailable (the local fake is set down). Nothing was done; try again.').body());
  });

  const api = express.Router();
  api.use(express.urlencoded({ extended: true, limit: '100kb' }));
  api.use((req, res, next) => {
    const key = /^Bearer (\S+)$/.exec(req.get('authorization') ?? '')?.[1];
    if (!key) return void res.status(401).json(new FakeApiError(401, 'invalid_request_error', 'You did not provide an API key.').body());
    if (options.secretKey && key !== options.secretKey) {
      return void res.status(401).json(new FakeApiError(401, 'invalid_request_error', `Invalid API Key provided: ${key.slice(0, 8)}****`).body());
    }
    res.setHeader('Stripe-Version', req.get('stripe-version') ?? '');
    next();
  });

  /** One API call: expiry sweep, idempotent replay for POSTs with a key, the change, save, events. */
  const handle = (fn: (req: Request, idempotencyKey: string | null) => unknown) => (req: Request, res: Response) => {
    const key = req.method === 'POST' ? (req.get('idempotency-key') ?? null) : null;
    const fingerprint = `${req.method} ${req.path} ${canonicalJson(req.method === 'POST' ? req.body : req.query)}`;
    ledger.sweepExpired();
    if (key) {
      const prior = state.idempotency[key];
      if (prior && prior.fingerprint !== fingerprint) {
        commit();
        const message = `Keys for idempotent requests can only be used with the same parameters they were first used with. Try using a key other than '${key}' if you meant to execute a different request.`;
        return void res.status(400).json(new FakeApiError(400, 'idempotency_error', message).body());
      }
      if (prior) {
        commit();
        res.setHeader('Idempotent-Replayed', 'true');
        return void res.status(prior.status).json(prior.body);
      }
    }
    try {
      const body = fn(req, key);
      // Only requests that did something are kept: a refused one may be sent again with the same key.
      if (key) state.idempotency[key] = { fingerprint, status: 200, body };
      commit();
      res.status(200).json(body);
    } catch (err) {
      commit();
      if (!(err instanceof FakeApiError)) throw err;
      res.status(err.status).json(err.body());
    }
  };

  api.post('/checkout/sessions', handle((req) => ledger.createSession(req.body ?? {})));
  api.get('/checkout/sessions/:id', handle((req) => ledger.sessionAnswer(ledger.findSession(String(req.params.id)))));
  api.post('/checkout/sessions/:id/expire', handle((req, key) => ledger.expireSession(String(req.params.id), key)));
  api.get('/payment_intents/:id', handle((req) => ledger.paymentIntentAnswer(String(req.params.id), req.query as Record<string, unknown>)));
  api.post('/refunds', handle((req, key) => ledger.refund(req.body ?? {}, key)));
  api.get('/balance_transactions', handle((req) => ledger.listBalanceTransactions(req.query as Record<string, unknown>)));
  api.use((req, res) => {
    res.status(404).json(new FakeApiError(404, 'invalid_request_error', `Unrecognized request URL (${req.method}: ${req.originalUrl}). The local fake answers only what Benchlight uses.`).body());
  });
  app.use('/v1', api);

  const pay = express.Router();
  pay.use(express.urlencoded({ extended: false, limit: '10kb' }));
  pay.use((_req, res, next) => {
    res.setHeader('Content-Security-Policy', "default-src 'none'; style-src 'unsafe-inline'");
    res.setHeader('Cache-Control', 'no-store');
    next();
  });
  const session = (id: string) => {
    ledger.sweepExpired();
    commit();
    return state.sessions[id];
  };
  pay.get('/:id', (req, res) => {
    const s = session(req.params.id);
    if (!s) return void res.status(404).type('html').send(notFoundPageHtml());
    res.type('html').send(payPageHtml({ session: s }));
  });
  pay.post('/:id/pay', (req, res) => {
    const s = session(req.params.id);
    if (!s) return void res.status(404).type('html').send(notFoundPageHtml());
    if (s.status !== 'open') return void res.status(409).type('html').send(payPageHtml({ session: s }));
    const successUrl = ledger.pay(s.id);
    commit();
    res.redirect(303, successUrl);
  });
  pay.post('/:id/decline', (req, res) => {
    const s = session(req.params.id);
    if (!s) return void res.status(404).type('html').send(notFoundPageHtml());
    if (s.status !== 'open') return void res.status(409).type('html').send(payPageHtml({ session: s }));
    ledger.decline(s.id);
    commit();
    res.status(402).type('html').send(payPageHtml({ session: s, error: 'The card was declined (a test: no card was used and nothing was charged). Try again, or cancel.' }));
  });
  app.use('/pay', pay);

  app.use((err: unknown, _req: Request, res: Response, _next: express.NextFunction) => {
    res.status(500).json(new FakeApiError(500, 'api_error', `The local fake failed: ${err instanceof Error ? err.message : String(err)}`).body());
  });

  const server = await new Promise<Server>((resolve, reject) => {
    const s = app.listen(options.port ?? 0, host, (err?: Error) => (err ? reject(err) : resolve(s)));
  });
  const port = (server.address() as AddressInfo).port;
  baseUrl = `http://${host === '::1' ? '[::1]' : host}:${port}`;

  // Deliveries cut short by a stop are resumed, as the provider keeps trying.
  for (const r of state.events) if (r.delivery === 'pending') void deliverer.deliver(r);

  function views(): FakeEventView[] {
    return state.events.map((r) => structuredClone({ id: r.event.id, type: r.event.type, created: r.event.created, delivery: r.delivery, attempts: r.attempts, event: r.event }));
  }

  return {
    url: baseUrl,
    port,
    setDown(value) {
      down = value;
    },
    events: views,
    async redeliver(eventId) {
      const record = state.events.find((r) => r.event.id === eventId);
      if (!record) throw new Error(`The fake payment provider has no event ${eventId}.`);
      await deliverer.deliver(record);
    },
    whenIdle: () => deliverer.whenIdle(),
    async close() {
      await deliverer.close();
      saveState(options.dataFile, state);
      await new Promise<void>((resolve) => {
        server.close(() => resolve());
        server.closeAllConnections();
      });
    },
  };
}

/** JSON with sorted keys: the same parameters in another order are the same request. */
function canonicalJson(value: unknown): string {
  return JSON.stringify(value, (_k, v) =>
    v && typeof v === 'object' && !Array.isArray(v) ? Object.fromEntries(Object.entries(v).sort(([a], [b]) => a.localeCompare(b))) : v,
  );
}

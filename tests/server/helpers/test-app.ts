import { inject } from 'vitest';
import pino from 'pino';
import request from 'supertest';
import { randomUUID } from 'node:crypto';
import { createServer, type Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import { createApp } from '#server/app.ts';
import { loadConfig, siteSettingsFrom, type Config } from '#server/config.ts';
import { createDb, closeDb, type DbHandles } from '#server/db/knex.ts';
import { createSessionAuth } from '#server/auth/session-auth.ts';
import { systemCaller } from '#server/core/caller.ts';
import { createUsersService } from '#server/services/users-service.ts';
import type { Mailer, MailMessage } from '#server/mail/mailer.ts';
import type { Role } from '#shared/auth/capabilities.ts';
import { startJobQueue } from '#server/queue/job-queue.ts';
import { createSignInLimiter } from '#server/auth/sign-in-limiter.ts';
import { createServices } from '#server/services/index.ts';
import { createPgFileStorage } from '#server/storage/file-storage.ts';
import { registerJobHandlers } from '#server/job-handlers.ts';
import { createPaymentProvider } from '#server/payments/create-payment-provider.ts';
import { startFakePaymentProvider, type FakePaymentProvider } from '#server/payments/fake-provider/start-fake-provider.ts';
import type { PaymentEventHandlers } from '#server/services/payment-events-service.ts';
import type { Clock } from '#server/core/context.ts';

export interface TestAppOptions {
  /** Run the worker's job handlers in this process. */
  worker?: boolean;
  /**
   * Start the local fake payment provider in this process (127.0.0.1, a free port), deliver its
   * webhooks to this app, and point the app's provider at it. Without it, payments are unconfigured.
   */
  payments?: boolean | { retryDelaysMs?: number[]; maxNetworkRetries?: number; dataFile?: string };
  /** Handlers for the provider's webhook events, as the pledge code will register them. */
  paymentEventHandlers?: PaymentEventHandlers;
  /** Another mailer (e.g. real SMTP to the local fake); default: collected in memory in `sent`. */
  mailer?: Mailer;
  /** The app's and the services' clock (a test moves it to reach a deadline); default: the real time. */
  clock?: Clock;
}

/**
 * The real app on the real test database, listening on an ephemeral 127.0.0.1 port so the
 * Origin check sees a real host; mail is collected in memory. `origin` is the app's own origin.
 * With `payments`, `fake` is the local fake payment provider the app talks to.
 */
export async function makeTestApp(
  overrides: Partial<Record<string, string>> = {},
  databaseUrl: string = inject('databaseUrl'),
  options: TestAppOptions = {},
) {
  // The port first: the fake needs the app's webhook address before the app is built.
  const server = await new Promise<Server>((resolve) => {
    const s = createServer();
    s.listen(0, '127.0.0.1', () => resolve(s));
  });
  const origin = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
  let fake: FakePaymentProvider | null = null;
  const paymentEnv: Record<string, string> = {};
  if (options.payments) {
    const fakeOptions = options.payments === true ? {} : options.payments;
    paymentEnv.PAYMENTS_SECRET_KEY = `sk_test_${randomUUID().replaceAll('-', '')}`;
    paymentEnv.PAYMENTS_WEBHOOK_SECRET = `whsec_${randomUUID().replaceAll('-', '')}`;
    fake = await startFakePaymentProvider({
      host: '127.0.0.1',
      webhookUrl: `${origin}/api/payments/webhook`,
      webhookSecret: paymentEnv.PAYMENTS_WEBHOOK_SECRET,
      secretKey: paymentEnv.PAYMENTS_SECRET_KEY,
      retryDelaysMs: fakeOptions.retryDelaysMs ?? [20, 40, 80, 160, 320],
      dataFile: fakeOptions.dataFile,
    });
    paymentEnv.PAYMENTS_API_URL = fake.url;
  }
  const config: Config = loadConfig({ NODE_ENV: 'test', LOG_LEVEL: 'silent', ...paymentEnv, ...overrides });
  // One SDK retry (its own 0.5–1 s backoff) keeps a failing call in a test short.
  const maxNetworkRetries = typeof options.payments === 'object' ? (options.payments.maxNetworkRetries ?? 1) : 1;
  const payments = createPaymentProvider(config, { maxNetworkRetries, timeoutMs: 5000 });
  const db: DbHandles = createDb(databaseUrl, () => {});
  const sent: MailMessage[] = [];
  const mailer: Mailer = options.mailer ?? { send: async (m) => void sent.push(m) };
  const logger = pino({ level: 'silent' });
  // The real queue in the test database: uploads queue their jobs; tests run them with runJobs().
  const queue = await startJobQueue({ databaseUrl, logger, supervise: false });
  const clock: Clock = options.clock ?? { now: () => new Date() };
  const app = createApp({ config, db, mailer, clock, logger, queue, payments, paymentEventHandlers: options.paymentEventHandlers });
  const sessions = createSessionAuth(db.pool);
  const services = createServices({
    db: db.knex,
    clock,
    sessions,
    signInLimiter: createSignInLimiter(db.pool, { perAccount: 10, perIp: 50, windowMinutes: 15 }),
    mailer,
    logger,
    queue,
    storage: createPgFileStorage(db.knex),
    payments,
    site: siteSettingsFrom(config),
  }, { paymentEventHandlers: options.paymentEventHandlers });
  // The worker's handlers in this process, on the same queue, for tests that need files analysed.
  if (options.worker) await registerJobHandlers(queue, services, logger);
  server.on('request', app);
  const close = async () => {
    // The fake first, so no delivery arrives at an app that is going away.
    await fake?.close();
    await new Promise<void>((resolve) => server.close(() => resolve()));
    await queue.stop();
    await closeDb(db);
  };
  return { app, config, db, queue, services, sent, origin, payments, fake, api: () => request(origin), agent: () => request.agent(origin), close };
}

/**
 * A staff account made through the users service (as the seed and the command line make them),
 * so the audit rows are those of real use. The e-mail is stored as given.
 */
export async function insertUser(db: DbHandles, role: Role, opts: { email?: string; password?: string; active?: boolean } = {}) {
  const users = createUsersService({ db: db.knex, clock: { now: () => new Date() }, sessions: createSessionAuth(db.pool) });
  const email = opts.email ?? `${role}-${randomUUID().slice(0, 8)}@lab.test`;
  const password = opts.password ?? `pw-${role}-long-enough`;
  const seed = systemCaller('seed');
  const { id } = await users.create(seed, { email, displayName: `${role} person`, role, password });
  if (opts.active === false) await users.update(seed, id, { active: false });
  return { id, email, password };
}

/** A supertest agent signed in as the given user (keeps the session cookie). */
export async function signedInAgent(origin: string, email: string, password: string) {
  const agent = request.agent(origin);
  const res = await agent.post('/api/auth/sign-in').set('Origin', origin).send({ email, password });
  if (res.status !== 200) throw new Error(`sign-in failed: ${res.status} ${JSON.stringify(res.body)}`);
  return agent;
}

import { inject } from 'vitest';
import pino from 'pino';
import request from 'supertest';
import { randomUUID } from 'node:crypto';
import type { Server } from 'node:http';
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

/**
 * The real app on the real test database, listening on an ephemeral 127.0.0.1 port so the
 * Origin check sees a real host; mail is collected in memory. `origin` is the app's own origin.
 */
export async function makeTestApp(
  overrides: Partial<Record<string, string>> = {},
  databaseUrl: string = inject('databaseUrl'),
  options: { worker?: boolean; mailer?: Mailer } = {},
) {
  const config: Config = loadConfig({ NODE_ENV: 'test', LOG_LEVEL: 'silent', ...overrides });
  const db: DbHandles = createDb(databaseUrl, () => {});
  const sent: MailMessage[] = [];
  const mailer: Mailer = options.mailer ?? { send: async (m) => void sent.push(m) };
  const logger = pino({ level: 'silent' });
  // The real queue in the test database: uploads queue their jobs; tests run them with runJobs().
  const queue = await startJobQueue({ databaseUrl, logger, supervise: false });
  const clock = { now: () => new Date() };
  const app = createApp({ config, db, mailer, clock, logger, queue });
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
    site: siteSettingsFrom(config),
  });
  // The worker's handlers in this process, on the same queue, for tests that need files analysed.
  if (options.worker) await registerJobHandlers(queue, services, logger);
  const server = await new Promise<Server>((resolve) => {
    const s = app.listen(0, '127.0.0.1', () => resolve(s));
  });
  const origin = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
  const close = async () => {
    await new Promise<void>((resolve) => server.close(() => resolve()));
    await queue.stop();
    await closeDb(db);
  };
  return { app, db, queue, services, sent, origin, api: () => request(origin), agent: () => request.agent(origin), close };
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

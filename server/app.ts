import path from 'node:path';
import fs from 'node:fs';
import { randomUUID } from 'node:crypto';
import express, { type Express } from 'express';
import { pinoHttp } from 'pino-http';
import type { Logger } from 'pino';
import { siteSettingsFrom, type Config } from './config.ts';
import type { DbHandles } from './db/knex.ts';
import type { Mailer } from './mail/mailer.ts';
import type { JobQueue } from './queue/job-queue.ts';
import { createPgFileStorage, type FileStorage } from './storage/file-storage.ts';
import type { Clock, ServiceDeps } from './core/context.ts';
import { createSessionAuth, type SessionAuth } from './auth/session-auth.ts';
import { createSignInLimiter, type SignInLimiter } from './auth/sign-in-limiter.ts';
import { createServices } from './services/index.ts';
import type { PaymentEventHandlers } from './services/payment-events-service.ts';
import type { PaymentProvider } from './payments/payment-provider.ts';
import { createPaymentProvider } from './payments/create-payment-provider.ts';
import { pingDatabase } from './db/ping.ts';
import { sessionMiddleware } from './http/session-middleware.ts';
import { originCheck } from './http/origin-check.ts';
import { apiNotFound, errorMiddleware } from './http/error-middleware.ts';
import { securityHeaders } from './http/security-headers.ts';
import { healthRoutes } from './routes/health-routes.ts';
import { authRoutes } from './routes/auth-routes.ts';
import { usersRoutes } from './routes/users-routes.ts';
import { catalogRoutes } from './routes/catalog-routes.ts';
import { runsRoutes } from './routes/runs-routes.ts';
import { reportsRoutes } from './routes/reports-routes.ts';
import { publicRoutes } from './routes/public-routes.ts';
import { siteRoutes } from './routes/site-routes.ts';
import { paymentsWebhookRoutes } from './routes/payments-routes.ts';
import { oneClickUnsubscribeRoutes, subscriptionsRoutes } from './routes/subscriptions-routes.ts';
import { testRequestsRoutes } from './routes/test-requests-routes.ts';
import { staffAccessRoutes } from './routes/staff-access-routes.ts';
import { mailRoutes } from './routes/mail-routes.ts';
import { pledgesRoutes } from './routes/pledges-routes.ts';
import { ledgerRoutes } from './routes/ledger-routes.ts';
import { withPageMeta } from './http/index-html.ts';
import { publicBaseUrl } from './http/public-url.ts';

export interface AppDeps {
  config: Config;
  db: DbHandles;
  mailer: Mailer;
  clock: Clock;
  logger: Logger;
  /** The job queue (started by the caller): uploads queue their analysis here. */
  queue: JobQueue;
  /** Raw-file storage; PostgreSQL (stored_files) when absent. */
  storage?: FileStorage;
  /** The payment provider; built from the PAYMENTS_* configuration when absent. */
  payments?: PaymentProvider;
  /** Handlers for the provider's webhook events, by type (tests register their own). */
  paymentEventHandlers?: PaymentEventHandlers;
  /** Overridable for tests; built from db.pool when absent. */
  sessions?: SessionAuth;
  signInLimiter?: SignInLimiter;
  /** Folder of the built client (dist/); served when config.serveClient. */
  clientDir?: string;
}

/** Builds the Express app. Connects to nothing by itself: every collaborator is passed in. */
export function createApp(deps: AppDeps): Express {
  const { config, db, logger } = deps;
  const sessions = deps.sessions ?? createSessionAuth(db.pool);
  const signInLimiter =
    deps.signInLimiter ??
    createSignInLimiter(db.pool, {
      perAccount: config.SIGN_IN_MAX_FAILURES,
      perIp: config.SIGN_IN_MAX_FAILURES_PER_IP,
      windowMinutes: config.SIGN_IN_WINDOW_MINUTES,
    });
  const serviceDeps: ServiceDeps = {
    db: db.knex,
    clock: deps.clock,
    sessions,
    signInLimiter,
    mailer: deps.mailer,
    logger,
    queue: deps.queue,
    storage: deps.storage ?? createPgFileStorage(db.knex),
    payments: deps.payments ?? createPaymentProvider(config),
    site: siteSettingsFrom(config),
  };
  const services = createServices(serviceDeps, { paymentEventHandlers: deps.paymentEventHandlers });

  const app = express();
  app.disable('x-powered-by');
  app.set('trust proxy', config.TRUST_PROXY);
  app.use(
    pinoHttp({
      logger,
      genReqId: (req, res) => {
        const id = randomUUID();
        res.setHeader('X-Request-Id', id);
        return id;
      },
      autoLogging: { ignore: (req) => req.url === '/api/health' },
      // E-mailed links carry bearer tokens in their query (one-click unsubscribe): keep them out of logs.
      serializers: {
        req: (req: { url?: string; query?: Record<string, unknown> }) => ({
          ...req,
          url: req.url?.replace(/([?&]token=)[^&]*/g, '$1[redacted]'),
          ...(req.query && 'token' in req.query ? { query: { ...req.query, token: '[redacted]' } } : {}),
        }),
      },
    }),
  );
  app.use(securityHeaders);

  // The provider's webhook reads its body raw (the signature covers the bytes) and sits outside
  // the session and the Origin check: it comes from the provider, signed, not from a browser.
  app.use(paymentsWebhookRoutes(services));

  const api = express.Router();
  api.use(express.json({ limit: '1mb' }));
  api.use(sessionMiddleware(sessions));
  // RFC 8058 one-click unsubscribe comes from mail providers' servers, without an Origin: the
  // token is its authority. Every other state-changing request passes the Origin check below.
  api.use(oneClickUnsubscribeRoutes(services));
  api.use(originCheck(config.ALLOWED_ORIGINS.split(',').map((s) => s.trim()).filter(Boolean)));
  api.use(healthRoutes(() => pingDatabase(db.knex)));
  api.use(authRoutes(services.auth));
  api.use(usersRoutes(services.users));
  api.use(catalogRoutes(services));
  api.use(runsRoutes(services));
  api.use(reportsRoutes(services));
  api.use(publicRoutes(services, { publicBaseUrl: config.PUBLIC_BASE_URL }));
  api.use(subscriptionsRoutes(services));
  api.use(testRequestsRoutes(services));
  api.use(staffAccessRoutes(services));
  api.use(mailRoutes(services));
  api.use(pledgesRoutes(services, { publicBaseUrl: config.PUBLIC_BASE_URL }));
  api.use(ledgerRoutes(services));
  api.use(apiNotFound);
  app.use('/api', api);
  app.use(siteRoutes(services, { publicBaseUrl: config.PUBLIC_BASE_URL }));

  if (config.serveClient) {
    const clientDir = deps.clientDir ?? path.resolve(import.meta.dirname, '..', 'dist');
    const indexHtml = path.join(clientDir, 'index.html');
    if (!fs.existsSync(indexHtml)) {
      logger.warn({ clientDir }, 'client not built: run "npm run build" to serve the web pages');
    }
    app.use(express.static(clientDir, { index: false, maxAge: '1h' }));
    let indexText: string | null = null;
    const reportPath = /^\/reports\/([a-z0-9-]{1,100})(?:\/versions\/\d+)?\/?$/;
    // Every other path is a client route: the app decides what to show (incl. "page not found").
    // A report's page gets its own title and link-preview metadata in the HTML itself.
    app.get('/{*splat}', async (req, res, next) => {
      res.setHeader('Cache-Control', 'no-cache');
      const match = reportPath.exec(req.path);
      if (!match) return res.sendFile(indexHtml);
      try {
        const preview = await services.publicReports.linkPreview(match[1]);
        if (!preview) return res.sendFile(indexHtml);
        indexText ??= fs.readFileSync(indexHtml, 'utf8');
        const url = `${publicBaseUrl(req, config.PUBLIC_BASE_URL)}${req.path}`;
        res.type('html').send(withPageMeta(indexText, { title: preview.title, description: preview.summary, url }));
      } catch (err) {
        next(err);
      }
    });
  }

  app.use(errorMiddleware(logger));
  return app;
}

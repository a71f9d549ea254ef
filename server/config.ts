import { z } from 'zod';

/**
 * Configuration, read once at start through this schema. .env.example lists every variable.
 * Nothing else in server/ reads process.env.
 */
/** An empty variable (NAME= in a shell or an env file) counts as unset. */
const optionalText = <T extends z.ZodType>(schema: T) => z.preprocess((v) => (v === '' ? undefined : v), schema.optional());

const booleanFromString = z
  .enum(['true', 'false', '1', '0', 'yes', 'no', ''])
  .transform((v) => v === 'true' || v === '1' || v === 'yes');

export const configSchema = z.object({
  NODE_ENV: z.enum(['development', 'test', 'production']).default('development'),
  HOST: z.string().min(1).default('127.0.0.1'),
  PORT: z.coerce.number().int().min(0).max(65535).default(3000),
  DATABASE_URL: z.string().url().optional(),
  BENCHLIGHT_PG_PORT: z.coerce.number().int().min(1024).max(65535).default(54329),
  LOG_LEVEL: z.enum(['fatal', 'error', 'warn', 'info', 'debug', 'trace', 'silent']).default('info'),
  /** Extra origins allowed to send state-changing requests (comma-separated), besides the request's own host. */
  ALLOWED_ORIGINS: z.string().default(''),
  /** Serve the built client from dist/ (always on in production). */
  SERVE_CLIENT: booleanFromString.optional(),
  /** Number of proxy hops to trust for X-Forwarded-* (https detection, client IP). */
  TRUST_PROXY: z.coerce.number().int().min(0).max(10).default(0),
  /** Failed sign-ins allowed per account within the window; the next one gets 429. */
  SIGN_IN_MAX_FAILURES: z.coerce.number().int().min(1).max(1000).default(10),
  /** Failed sign-ins allowed per client IP within the window (higher: a lab shares one address). */
  SIGN_IN_MAX_FAILURES_PER_IP: z.coerce.number().int().min(1).max(10000).default(50),
  SIGN_IN_WINDOW_MINUTES: z.coerce.number().int().min(1).max(24 * 60).default(15),
  /** SMTP server for outgoing e-mail; without it, mail is written to the log. */
  SMTP_URL: z.string().url().optional(),
  MAIL_FROM: z.string().default('Benchlight <no-reply@benchlight.invalid>'),
  /**
   * Folder where the local fake SMTP server writes what it receives (set by npm run demo and the
   * browser tests, beside SMTP_URL pointing at the fake). When set, admins get the Mailbox page.
   */
  FAKE_MAILBOX_DIR: z.string().min(1).optional(),
  /** First retry of a message the SMTP server did not take, s; each further retry waits twice as long. */
  MAIL_RETRY_SECONDS: z.coerce.number().min(0.1).max(3600).default(30),
  /** Readers' forms that send e-mail (subscribe, vote, request a test, password reset): per client IP per hour. */
  READER_MAX_PER_IP: z.coerce.number().int().min(1).max(100000).default(30),
  /** The same, per e-mail address per hour; past it the answer stays the same and nothing is sent. */
  READER_MAX_PER_ADDRESS: z.coerce.number().int().min(1).max(1000).default(5),
  /** The site's public address (https://…), for citations, the feed, the sitemap and e-mail links; else taken from each request. */
  PUBLIC_BASE_URL: z.string().url().optional(),
  /** The payment provider's secret API key (sk_…); payments answer 503 without it outside production. */
  PAYMENTS_SECRET_KEY: optionalText(z.string().min(1)),
  /** The signing secret of the provider's webhook endpoint (whsec_…). */
  PAYMENTS_WEBHOOK_SECRET: optionalText(z.string().min(1)),
  /** Another address for the provider's API: the local fake (npm run payments:fake). Unset: the provider's own. */
  PAYMENTS_API_URL: optionalText(z.string().url()),
  /** The currency readers pay in, ISO 4217. */
  PAYMENTS_CURRENCY: z
    .string()
    .regex(/^[A-Za-z]{3}$/, { message: 'A three-letter currency code, e.g. EUR.' })
    .transform((c) => c.toUpperCase())
    .default('EUR'),
  /** One day of bench time in minor units of PAYMENTS_CURRENCY: a request's goal is the unit's price plus this. */
  BENCH_DAY_COST_MINOR: z.coerce.number().int().min(0).max(99_999_999).default(40000),
  /** The smallest pledge a reader can make, in minor units of PAYMENTS_CURRENCY. */
  PLEDGE_MIN_MINOR: z.coerce.number().int().min(1).max(99_999_999).default(500),
});

export type Config = z.infer<typeof configSchema> & { serveClient: boolean };

export function loadConfig(env: Record<string, string | undefined> = process.env): Config {
  const parsed = configSchema.safeParse(env);
  if (!parsed.success) {
    const lines = parsed.error.issues.map((i) => `  ${i.path.join('.')}: ${i.message}`);
    throw new Error(`Invalid configuration:\n${lines.join('\n')}`);
  }
  const c = parsed.data;
  const production = productionProblems(c);
  if (production.length) throw new Error(`Invalid configuration:\n${production.map((l) => `  ${l}`).join('\n')}`);
  return { ...c, serveClient: c.SERVE_CLIENT ?? c.NODE_ENV === 'production' };
}

/** What production refuses: no payments without both keys, and never a fake or plain-http provider address. */
function productionProblems(c: z.infer<typeof configSchema>): string[] {
  if (c.NODE_ENV !== 'production') return [];
  const problems: string[] = [];
  if (!c.PAYMENTS_SECRET_KEY) problems.push('PAYMENTS_SECRET_KEY: required in production');
  if (!c.PAYMENTS_WEBHOOK_SECRET) problems.push('PAYMENTS_WEBHOOK_SECRET: required in production');
  if (c.PAYMENTS_API_URL && !c.PAYMENTS_API_URL.startsWith('https://')) {
    problems.push('PAYMENTS_API_URL: must be unset or https:// in production (the local fake never runs there)');
  }
  return problems;
}

/** Where e-mailed links point: PUBLIC_BASE_URL, or this server's own address (development, demo). */
export function mailBaseUrl(config: Pick<Config, 'PUBLIC_BASE_URL' | 'HOST' | 'PORT'>): string {
  if (config.PUBLIC_BASE_URL) return config.PUBLIC_BASE_URL.replace(/\/+$/, '');
  const host = config.HOST === '0.0.0.0' || config.HOST === '::' ? '127.0.0.1' : config.HOST;
  return `http://${host}:${config.PORT}`;
}

/** The settings services read from the configuration (see SiteSettings). */
export function siteSettingsFrom(config: Config) {
  return {
    publicBaseUrl: mailBaseUrl(config),
    mailRetrySeconds: config.MAIL_RETRY_SECONDS,
    readerMaxPerIp: config.READER_MAX_PER_IP,
    readerMaxPerAddress: config.READER_MAX_PER_ADDRESS,
    fakeMailboxDir: config.FAKE_MAILBOX_DIR ?? null,
    paymentsCurrency: config.PAYMENTS_CURRENCY,
    benchDayCostMinor: config.BENCH_DAY_COST_MINOR,
    pledgeMinMinor: config.PLEDGE_MIN_MINOR,
  };
}

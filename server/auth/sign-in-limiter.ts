import { RateLimiterPostgres } from 'rate-limiter-flexible';
import type pg from 'pg';

/**
 * Counts failed sign-ins per account and per client IP in PostgreSQL (shared by every web
 * process). After the allowed failures within the window, further attempts are refused.
 */
export interface SignInLimiter {
  /** Seconds until the caller may try again, or 0 when allowed. */
  retryAfterSeconds(ip: string, email: string): Promise<number>;
  recordFailure(ip: string, email: string): Promise<void>;
  recordSuccess(email: string): Promise<void>;
}

export function createSignInLimiter(
  pool: pg.Pool,
  limits: { perAccount: number; perIp: number; windowMinutes: number },
): SignInLimiter {
  const { windowMinutes } = limits;
  const make = (keyPrefix: string, maxFailures: number) =>
    new RateLimiterPostgres({
      storeClient: pool,
      tableName: 'sign_in_limits',
      tableCreated: true, // made by a migration
      clearExpiredByTimeout: false, // no timers: expired rows are ignored by expire
      keyPrefix,
      points: maxFailures,
      duration: windowMinutes * 60,
    });
  const byIp = make('signin-ip', limits.perIp);
  const byAccount = make('signin-account', limits.perAccount);
  const accountKey = (email: string) => email.trim().toLowerCase();

  const wait = async (limiter: RateLimiterPostgres, key: string) => {
    const res = await limiter.get(key);
    if (!res || res.consumedPoints < limiter.points) return 0;
    return Math.max(1, Math.ceil(res.msBeforeNext / 1000));
  };

  return {
    async retryAfterSeconds(ip, email) {
      const [a, b] = await Promise.all([wait(byIp, ip), wait(byAccount, accountKey(email))]);
      return Math.max(a, b);
    },
    async recordFailure(ip, email) {
      // penalty() adds a point without throwing when the limit is passed.
      await Promise.all([byIp.penalty(ip, 1), byAccount.penalty(accountKey(email), 1)]);
    },
    async recordSuccess(email) {
      await byAccount.delete(accountKey(email));
    },
  };
}

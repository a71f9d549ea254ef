import { RateLimiterPostgres, RateLimiterRes } from 'rate-limiter-flexible';
import type { Db } from '../db/knex.ts';

/**
 * Limits readers' forms that send e-mail (subscribe, vote, request a test, reset a password),
 * per client IP and per address, counted in PostgreSQL (`reader_limits`) so every web process
 * shares the count. Over the IP limit the caller gets 429; over the address limit the answer stays
 * the same and nothing is sent, so nobody can flood an inbox and the answer tells nothing.
 */
export interface ReaderLimiter {
  /** Counts one attempt; says which limit, if any, it passed. */
  take(ip: string, email: string): Promise<{ ipRetryAfterSeconds: number; addressOver: boolean }>;
}

export function createReaderLimiter(db: Db, limits: { perIp: number; perAddress: number }): ReaderLimiter {
  const make = (keyPrefix: string, points: number) =>
    new RateLimiterPostgres({
      storeClient: db,
      storeType: 'knex',
      tableName: 'reader_limits',
      tableCreated: true, // made by a migration
      clearExpiredByTimeout: false,
      keyPrefix,
      points,
      duration: 60 * 60,
    });
  const byIp = make('reader-ip', limits.perIp);
  const byAddress = make('reader-address', limits.perAddress);
  const over = async (limiter: RateLimiterPostgres, key: string): Promise<number> => {
    try {
      await limiter.consume(key, 1);
      return 0;
    } catch (res) {
      if (res instanceof RateLimiterRes) return Math.max(1, Math.ceil(res.msBeforeNext / 1000));
      throw res;
    }
  };
  return {
    async take(ip, email) {
      const ipWait = await over(byIp, ip);
      // An attempt refused by IP does not count against the address.
      if (ipWait > 0) return { ipRetryAfterSeconds: ipWait, addressOver: false };
      const addressWait = await over(byAddress, email.trim().toLowerCase());
      return { ipRetryAfterSeconds: 0, addressOver: addressWait > 0 };
    },
  };
}

import { resolveDatabaseUrl, withDatabase } from '#server/db/database-url.ts';
import { TEST_DATABASE } from '#server/db/embedded-postgres.ts';

/**
 * The server tests' own database: TEST_DATABASE_URL when set; otherwise the database
 * "benchlight_test" on the same server as the app's (DATABASE_URL or the embedded cluster).
 */
export function testDatabaseUrl(env: Record<string, string | undefined> = process.env): string {
  if (env.TEST_DATABASE_URL) return env.TEST_DATABASE_URL;
  return withDatabase(resolveDatabaseUrl(env), TEST_DATABASE);
}

import { start } from '#server/db/embedded-postgres.ts';
import { resolveDatabaseUrl, withDatabase } from '#server/db/database-url.ts';
import { dropDatabase, ensureDatabase } from '#server/db/database-admin.ts';

/**
 * An empty database called `name` on the app's server (DATABASE_URL, or the project's own
 * cluster, started if needed), for a tool or test suite of its own. When `overrideUrl` is set
 * that database is used as it is, never dropped.
 */
export async function freshDatabase(name: string, overrideUrl?: string): Promise<string> {
  if (overrideUrl) return overrideUrl;
  if (!process.env.DATABASE_URL) await start(() => {});
  const url = withDatabase(resolveDatabaseUrl(), name);
  await dropDatabase(url);
  await ensureDatabase(url);
  return url;
}

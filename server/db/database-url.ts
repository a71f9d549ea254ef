import { APP_DATABASE, embeddedDatabaseUrl } from './embedded-postgres.ts';

/** DATABASE_URL when set; otherwise the project's own cluster (npm run db:start). */
export function resolveDatabaseUrl(env: Record<string, string | undefined> = process.env): string {
  return env.DATABASE_URL || embeddedDatabaseUrl(APP_DATABASE);
}

/** The same server with another database name. */
export function withDatabase(url: string, database: string): string {
  const u = new URL(url);
  u.pathname = `/${database}`;
  return u.toString();
}

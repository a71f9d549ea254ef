/**
 * npm run db:backup [-- FILE]      writes the app's database to FILE (default backups/benchlight-<time>.dump)
 * npm run db:restore -- FILE       restores FILE into the app's database, replacing its contents
 * Uses DATABASE_URL, or the project's own cluster (started if needed).
 */
import path from 'node:path';
import { backupDatabase, restoreDatabase } from '#server/db/backup.ts';
import { resolveDatabaseUrl } from '#server/db/database-url.ts';
import { start } from '#server/db/embedded-postgres.ts';

async function main(): Promise<number> {
  const [command, file] = process.argv.slice(2);
  if (!process.env.DATABASE_URL) await start(() => {});
  const url = resolveDatabaseUrl();
  if (command === 'backup') {
    const target = file ?? path.join('backups', `benchlight-${new Date().toISOString().replace(/[:.]/g, '-')}.dump`);
    backupDatabase(url, target);
    console.log(`Backed up to ${target}.`);
    return 0;
  }
  if (command === 'restore') {
    if (!file) {
      console.error('usage: npm run db:restore -- FILE');
      return 2;
    }
    restoreDatabase(url, file);
    console.log(`Restored ${file}.`);
    return 0;
  }
  console.error('usage: db-backup.ts backup [FILE] | restore FILE');
  return 2;
}

main().then(
  (code) => (process.exitCode = code),
  (err: unknown) => {
    console.error(err instanceof Error ? err.message : String(err));
    process.exitCode = 1;
  },
);

/**
 * CI check: on an empty database, migrate latest → roll everything back → latest again,
 * so every migration's down() is proven to undo its up().
 */
import { start, ensureDatabase, dropDatabase } from '../server/db/embedded-postgres.ts';
import { resolveDatabaseUrl, withDatabase } from '../server/db/database-url.ts';
import { knexCli } from './lib/run-step.ts';

const DATABASE = 'benchlight_migrations_check';

async function main() {
  let url: string;
  if (process.env.DATABASE_URL) {
    url = process.env.MIGRATIONS_CHECK_DATABASE_URL ?? withDatabase(process.env.DATABASE_URL, DATABASE);
  } else {
    await start(() => {});
    await dropDatabase(DATABASE);
    await ensureDatabase(DATABASE);
    url = withDatabase(resolveDatabaseUrl(), DATABASE);
  }
  knexCli('migrate:latest on an empty database', ['migrate:latest'], url);
  knexCli('migrate:rollback --all', ['migrate:rollback', '--all'], url);
  knexCli('migrate:latest again', ['migrate:latest'], url);
  if (!process.env.DATABASE_URL) await dropDatabase(DATABASE);
  console.log('\nMigrations: latest → rollback → latest passed.');
}

main().catch((err: unknown) => {
  console.error(`\n✖ ${err instanceof Error ? err.message : String(err)}`);
  process.exitCode = 1;
});

/**
 * CI check: on an empty database, migrate latest → roll everything back → latest again,
 * so every migration's down() is proven to undo its up().
 */
import { dropDatabase } from '#server/db/database-admin.ts';
import { freshDatabase } from './lib/fresh-database.ts';
import { knexCli } from './lib/run-step.ts';

const DATABASE = 'benchlight_migrations_check';

async function main() {
  const override = process.env.MIGRATIONS_CHECK_DATABASE_URL;
  const url = await freshDatabase(DATABASE, override);
  knexCli('migrate:latest on an empty database', ['migrate:latest'], url);
  knexCli('migrate:rollback --all', ['migrate:rollback', '--all'], url);
  knexCli('migrate:latest again', ['migrate:latest'], url);
  if (!override) await dropDatabase(url);
  console.log('\nMigrations: latest → rollback → latest passed.');
}

main().catch((err: unknown) => {
  console.error(`\n✖ ${err instanceof Error ? err.message : String(err)}`);
  process.exitCode = 1;
});

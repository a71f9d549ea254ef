/**
 * Knex CLI configuration. Run the CLI through tsx (see package.json db:migrate) because knex
 * cannot load TypeScript by itself. DATABASE_URL wins; otherwise the embedded cluster's URL.
 */
import type { Knex } from 'knex';
import { resolveDatabaseUrl } from './server/db/database-url.ts';

const config: Knex.Config = {
  client: 'pg',
  connection: resolveDatabaseUrl(),
  pool: { min: 0, max: 4 },
  migrations: {
    directory: './migrations',
    extension: 'ts',
    loadExtensions: ['.ts'],
    tableName: 'knex_migrations',
  },
};

export default config;

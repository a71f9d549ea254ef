import { beforeAll } from 'vitest';
import { inject } from 'vitest';
import pg from 'pg';

// Every test file starts from empty tables (the schema stays). Files run one at a time.
beforeAll(async () => {
  const client = new pg.Client({ connectionString: inject('databaseUrl') });
  await client.connect();
  try {
    const { rows } = await client.query<{ tablename: string }>(
      "select tablename from pg_tables where schemaname = 'public' and tablename not like 'knex_migrations%'",
    );
    if (rows.length) await client.query(`truncate ${rows.map((r) => `"${r.tablename}"`).join(', ')} restart identity cascade`);
  } finally {
    await client.end();
  }
});

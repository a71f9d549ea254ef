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
    // Jobs queued by an earlier file must not run in this one.
    const queue = await client.query<{ job: string | null }>("select to_regclass('pgboss.job')::text as job");
    if (queue.rows[0].job) await client.query('truncate pgboss.job, pgboss.archive');
  } finally {
    await client.end();
  }
});

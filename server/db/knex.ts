import knexFactory, { type Knex } from 'knex';
import pg from 'pg';

// node-postgres returns bigint (int8) and numeric as strings; parse them here, in one place.
// Counts and ids stay far below 2^53.
pg.types.setTypeParser(pg.types.builtins.INT8, (v) => Number(v));
pg.types.setTypeParser(pg.types.builtins.NUMERIC, (v) => Number(v));
// A DATE is a calendar day, not an instant: keep it as YYYY-MM-DD rather than a local midnight.
pg.types.setTypeParser(pg.types.builtins.DATE, (v) => v);

/** The query builder handle services pass around; only server/db knows it is Knex. */
export type Db = Knex;
export type Trx = Knex.Transaction;

export interface DbHandles {
  knex: Knex;
  /** A plain pg Pool for the session adapter and the rate limiter, which want one. */
  pool: pg.Pool;
}

export function createDb(databaseUrl: string, onPoolError: (err: Error) => void): DbHandles {
  const knex = knexFactory({
    client: 'pg',
    connection: databaseUrl,
    pool: {
      min: 0,
      max: 10,
      // Without a listener a PostgreSQL restart would crash the process.
      afterCreate: (conn: pg.Client, done: (err: Error | null, conn: pg.Client) => void) => {
        conn.on('error', onPoolError);
        done(null, conn);
      },
    },
    acquireConnectionTimeout: 5000,
  });
  const pool = new pg.Pool({ connectionString: databaseUrl, max: 5, connectionTimeoutMillis: 5000 });
  pool.on('error', onPoolError);
  return { knex, pool };
}

export async function closeDb(db: DbHandles): Promise<void> {
  await Promise.allSettled([db.knex.destroy(), db.pool.end()]);
}

import type { Db } from './knex.ts';

/** Resolves when PostgreSQL answers a trivial query within `timeoutMs`; rejects otherwise. */
export async function pingDatabase(db: Db, timeoutMs = 3000): Promise<void> {
  let timer: NodeJS.Timeout | undefined;
  try {
    await Promise.race([
      db.raw('select 1'),
      new Promise((_, reject) => {
        timer = setTimeout(() => reject(new Error('database ping timed out')), timeoutMs);
      }),
    ]);
  } finally {
    clearTimeout(timer);
  }
}

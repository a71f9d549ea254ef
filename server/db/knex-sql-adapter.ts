import type { Db } from './knex.ts';

/**
 * Lets a library that speaks plain `executeSql(text, $1-style values)` run its statement on a
 * Knex transaction (the job queue queues jobs inside the change that needs them). Knex binds
 * with `?`, so each `$n` becomes `?` with its value, in order of appearance.
 */
export function knexSqlAdapter(trx: Db) {
  return {
    async executeSql(text: string, values: unknown[] = []): Promise<{ rows: any[] }> {
      const bindings: unknown[] = [];
      const sql = text.replace(/\?/g, '\\?').replace(/\$(\d+)/g, (_, n: string) => {
        const v = values[Number(n) - 1];
        bindings.push(v === undefined ? null : v);
        return '?';
      });
      const result = await trx.raw(sql, bindings as never[]);
      return { rows: result.rows ?? [] };
    },
  };
}

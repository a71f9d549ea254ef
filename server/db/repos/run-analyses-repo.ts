import type { Knex } from 'knex';
import { iso } from './list-page.ts';

export interface StoredRunAnalysis {
  fingerprint: string;
  figures: unknown;
  flags: unknown[];
  values: unknown[];
  computedAt: string;
}

export const runAnalysesRepo = {
  async upsert(db: Knex, runId: string, a: Omit<StoredRunAnalysis, 'computedAt'>, now: Date): Promise<void> {
    await db('run_analyses')
      .insert({ run_id: runId, fingerprint: a.fingerprint, figures: JSON.stringify(a.figures), flags: JSON.stringify(a.flags), values: JSON.stringify(a.values), computed_at: now })
      .onConflict('run_id')
      .merge();
  },

  async get(db: Knex, runId: string): Promise<StoredRunAnalysis | null> {
    const r = await db('run_analyses').where({ run_id: runId }).first();
    return r ? { fingerprint: r.fingerprint, figures: r.figures, flags: r.flags, values: r.values, computedAt: iso(r.computed_at)! } : null;
  },
};

import type { Knex } from 'knex';
import { iso } from './list-page.ts';

export const runCommentsRepo = {
  async insert(db: Knex, c: { id: string; runId: string; readingId: string | null; authorId: string | null; authorLabel: string; body: string; now: Date }): Promise<void> {
    await db('run_comments').insert({
      id: c.id,
      run_id: c.runId,
      reading_id: c.readingId,
      author_id: c.authorId,
      author_label: c.authorLabel,
      body: c.body,
      created_at: c.now,
    });
  },

  async listForRun(db: Knex, runId: string) {
    const rows = await db('run_comments as c')
      .leftJoin('users as u', 'u.id', 'c.author_id')
      .leftJoin('readings as rd', 'rd.id', 'c.reading_id')
      .where('c.run_id', runId)
      .select('c.*', 'u.display_name', 'rd.distance_cm', 'rd.x_cm', 'rd.y_cm', 'rd.slot')
      .orderBy([{ column: 'c.created_at', order: 'asc' }, 'c.id']);
    return rows.map((r) => ({
      id: r.id as string,
      body: r.body as string,
      readingId: (r.reading_id as string | null) ?? null,
      point: r.reading_id ? { distanceCm: Number(r.distance_cm), xCm: Number(r.x_cm), yCm: Number(r.y_cm), slot: r.slot } : null,
      author: { id: (r.author_id as string | null) ?? null, displayName: (r.display_name as string | null) ?? (r.author_label as string) },
      createdAt: iso(r.created_at)!,
    }));
  },

  async countByReading(db: Knex, runId: string): Promise<Map<string, number>> {
    const rows = await db('run_comments').where({ run_id: runId }).whereNotNull('reading_id').groupBy('reading_id').select('reading_id', db.raw('count(*)::int as n'));
    return new Map(rows.map((r) => [r.reading_id as string, r.n as number]));
  },
};

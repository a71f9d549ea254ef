import type { Knex } from 'knex';
import type { ModelCategory } from '#shared/schemas/models.ts';
import type { Topics } from '#shared/schemas/subscriptions.ts';
import { iso } from './list-page.ts';

export type SubscriberStatus = 'pending' | 'confirmed' | 'unsubscribed';

export interface SubscriberRecord {
  id: string;
  email: string;
  status: SubscriberStatus;
  topics: Topics;
  corrections: boolean;
  confirmedAt: string | null;
  unsubscribedAt: string | null;
}

function toRecord(r: any): SubscriberRecord {
  return {
    id: r.id,
    email: r.email,
    status: r.status,
    topics: r.all_topics ? { all: true } : { categories: r.categories as ModelCategory[] },
    corrections: r.corrections,
    confirmedAt: iso(r.confirmed_at),
    unsubscribedAt: iso(r.unsubscribed_at),
  };
}

const topicColumns = (topics: Topics) => ('all' in topics ? { all_topics: true, categories: '[]' } : { all_topics: false, categories: JSON.stringify(topics.categories) });

export const subscribersRepo = {
  /**
   * The subscriber for an address (any letter case), created pending when new; locked until the
   * transaction ends. One statement for both, so two requests for a new address make one row.
   */
  async upsertLocked(db: Knex, s: { id: string; email: string; topics: Topics; corrections: boolean; now: Date }): Promise<SubscriberRecord> {
    const t = topicColumns(s.topics);
    await db.raw(
      `insert into subscribers (id, email, status, all_topics, categories, corrections, created_at, updated_at)
       values (?, ?, 'pending', ?, ?::jsonb, ?, ?, ?)
       on conflict ((lower(email))) do nothing`,
      [s.id, s.email, t.all_topics, t.categories, s.corrections, s.now, s.now],
    );
    const r = await db('subscribers').whereRaw('lower(email) = lower(?)', [s.email]).forUpdate().first();
    return toRecord(r);
  },

  async findByEmail(db: Knex, email: string, opts: { lock?: boolean } = {}): Promise<SubscriberRecord | null> {
    const q = db('subscribers').whereRaw('lower(email) = lower(?)', [email]);
    if (opts.lock) q.forUpdate();
    const r = await q.first();
    return r ? toRecord(r) : null;
  },

  async findById(db: Knex, id: string, opts: { lock?: boolean } = {}): Promise<SubscriberRecord | null> {
    const q = db('subscribers').where({ id });
    if (opts.lock) q.forUpdate();
    const r = await q.first();
    return r ? toRecord(r) : null;
  },

  /** Choices of a subscriber who has not confirmed (a confirmed one changes them through a confirmation or the preferences page). */
  async setChoices(db: Knex, id: string, c: { topics?: Topics; corrections?: boolean; status?: SubscriberStatus }, now: Date): Promise<SubscriberRecord> {
    const [r] = await db('subscribers')
      .where({ id })
      .update({
        ...(c.topics ? topicColumns(c.topics) : {}),
        ...(c.corrections !== undefined ? { corrections: c.corrections } : {}),
        ...(c.status ? { status: c.status } : {}),
        ...(c.status === 'confirmed' ? { confirmed_at: now, unsubscribed_at: null } : {}),
        ...(c.status === 'unsubscribed' ? { unsubscribed_at: now } : {}),
        updated_at: now,
      })
      .returning('*');
    return toRecord(r);
  },

  /** The model category of a report, for matching topics. */
  async reportCategory(db: Knex, reportId: string): Promise<ModelCategory | null> {
    const r = await db('reports as r').join('models as m', 'm.id', 'r.model_id').where('r.id', reportId).first('m.category');
    return r ? r.category : null;
  },

  /** Confirmed subscribers whose topics include the category (and who chose corrections, when asked). */
  async matching(db: Knex, category: ModelCategory, opts: { corrections: boolean }): Promise<{ id: string; email: string }[]> {
    const q = db('subscribers')
      .where({ status: 'confirmed' })
      .andWhere((w) => w.where({ all_topics: true }).orWhereRaw('categories @> jsonb_build_array(?::text)', [category]))
      .orderBy('id')
      .select('id', 'email');
    if (opts.corrections) q.andWhere({ corrections: true });
    return q;
  },
};

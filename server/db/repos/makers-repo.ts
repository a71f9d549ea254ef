import type { Knex } from 'knex';
import type { Maker, MakerListQuery } from '#shared/schemas/makers.ts';
import { iso, likePattern, pageOf } from './list-page.ts';

const SORT: Record<MakerListQuery['sort'], string> = { name: 'lower(m.name)', createdAt: 'm.created_at', modelCount: 'model_count' };

function base(db: Knex) {
  return db('makers as m').select(
    'm.*',
    db.raw('(select count(*) from models where models.maker_id = m.id)::int as model_count'),
  );
}

function toMaker(r: any): Maker {
  return {
    id: r.id,
    name: r.name,
    website: r.website,
    notes: r.notes,
    modelCount: Number(r.model_count ?? 0),
    createdAt: iso(r.created_at)!,
    updatedAt: iso(r.updated_at)!,
  };
}

export const makersRepo = {
  list(db: Knex, q: MakerListQuery) {
    const query = base(db);
    if (q.q) query.whereILike('m.name', likePattern(q.q));
    query.orderByRaw(`${SORT[q.sort]} ${q.dir}, m.id`);
    return pageOf(query, q, toMaker);
  },

  async findById(db: Knex, id: string): Promise<Maker | null> {
    const r = await base(db).where('m.id', id).first();
    return r ? toMaker(r) : null;
  },

  async nameTaken(db: Knex, name: string, exceptId?: string): Promise<boolean> {
    const q = db('makers').whereRaw('lower(name) = lower(?)', [name]);
    if (exceptId) q.whereNot('id', exceptId);
    return Boolean(await q.first('id'));
  },

  async insert(db: Knex, m: { id: string; name: string; website: string | null; notes: string; now: Date }): Promise<void> {
    await db('makers').insert({ id: m.id, name: m.name, website: m.website, notes: m.notes, created_at: m.now, updated_at: m.now });
  },

  async update(db: Knex, id: string, changes: { name?: string; website?: string | null; notes?: string }, now: Date): Promise<void> {
    await db('makers').where({ id }).update({ ...changes, updated_at: now });
  },
};

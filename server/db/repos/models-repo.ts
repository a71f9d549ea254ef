import type { Knex } from 'knex';
import type { Model, ModelListQuery } from '#shared/schemas/models.ts';
import { iso, likePattern, pageOf } from './list-page.ts';

const SORT: Record<ModelListQuery['sort'], string> = {
  name: 'lower(md.name)',
  maker: 'lower(mk.name)',
  category: 'md.category',
  createdAt: 'md.created_at',
};

function base(db: Knex) {
  return db('models as md')
    .join('makers as mk', 'mk.id', 'md.maker_id')
    .select('md.*', 'mk.name as maker_name', db.raw('(select count(*) from device_units u where u.model_id = md.id)::int as unit_count'));
}

export function toModel(r: any): Model {
  return {
    id: r.id,
    makerId: r.maker_id,
    makerName: r.maker_name,
    name: r.name,
    category: r.category,
    emittingAreaCm: { width: Number(r.emitting_width_cm), height: Number(r.emitting_height_cm) },
    ledCount: r.led_count,
    nominalWavelengths: r.nominal_wavelengths ?? [],
    claims: {
      irradianceMwCm2: r.claimed_irradiance_mw_cm2,
      atDistanceCm: r.claimed_at_distance_cm,
      beamAngleDeg: r.claimed_beam_angle_deg,
      beamAngleKind: r.claimed_beam_angle_kind,
    },
    price: r.price_minor === null ? null : { amountMinor: Number(r.price_minor), currency: r.price_currency },
    powerW: r.power_w,
    links: r.links ?? [],
    notes: r.notes,
    unitCount: Number(r.unit_count ?? 0),
    createdAt: iso(r.created_at)!,
    updatedAt: iso(r.updated_at)!,
  };
}

export interface ModelRow {
  name?: string;
  category?: string;
  emittingAreaCm?: { width: number; height: number };
  ledCount?: number | null;
  nominalWavelengths?: unknown[];
  claims?: { irradianceMwCm2?: number | null; atDistanceCm?: number | null; beamAngleDeg?: number | null; beamAngleKind?: 'full' | 'half' | null };
  price?: { amountMinor: number; currency: string } | null;
  powerW?: number | null;
  links?: string[];
  notes?: string;
}

function columns(m: ModelRow): Record<string, unknown> {
  const c: Record<string, unknown> = {};
  if (m.name !== undefined) c.name = m.name;
  if (m.category !== undefined) c.category = m.category;
  if (m.emittingAreaCm) {
    c.emitting_width_cm = m.emittingAreaCm.width;
    c.emitting_height_cm = m.emittingAreaCm.height;
  }
  if (m.ledCount !== undefined) c.led_count = m.ledCount;
  if (m.nominalWavelengths !== undefined) c.nominal_wavelengths = JSON.stringify(m.nominalWavelengths);
  if (m.claims) {
    if (m.claims.irradianceMwCm2 !== undefined) c.claimed_irradiance_mw_cm2 = m.claims.irradianceMwCm2;
    if (m.claims.atDistanceCm !== undefined) c.claimed_at_distance_cm = m.claims.atDistanceCm;
    if (m.claims.beamAngleDeg !== undefined) c.claimed_beam_angle_deg = m.claims.beamAngleDeg;
    if (m.claims.beamAngleKind !== undefined) c.claimed_beam_angle_kind = m.claims.beamAngleKind;
  }
  if (m.price !== undefined) {
    c.price_minor = m.price?.amountMinor ?? null;
    c.price_currency = m.price?.currency ?? null;
  }
  if (m.powerW !== undefined) c.power_w = m.powerW;
  if (m.links !== undefined) c.links = JSON.stringify(m.links);
  if (m.notes !== undefined) c.notes = m.notes;
  return c;
}

export const modelsRepo = {
  list(db: Knex, q: ModelListQuery) {
    const query = base(db);
    if (q.q) query.where((w) => w.whereILike('md.name', likePattern(q.q)).orWhereILike('mk.name', likePattern(q.q)));
    if (q.makerId) query.where('md.maker_id', q.makerId);
    if (q.category) query.where('md.category', q.category);
    query.orderByRaw(`${SORT[q.sort]} ${q.dir}, md.id`);
    return pageOf(query, q, toModel);
  },

  async findById(db: Knex, id: string): Promise<Model | null> {
    const r = await base(db).where('md.id', id).first();
    return r ? toModel(r) : null;
  },

  async nameTaken(db: Knex, makerId: string, name: string, exceptId?: string): Promise<boolean> {
    const q = db('models').where('maker_id', makerId).whereRaw('lower(name) = lower(?)', [name]);
    if (exceptId) q.whereNot('id', exceptId);
    return Boolean(await q.first('id'));
  },

  async insert(db: Knex, id: string, makerId: string, m: ModelRow, now: Date): Promise<void> {
    await db('models').insert({ id, maker_id: makerId, ...columns(m), created_at: now, updated_at: now });
  },

  async update(db: Knex, id: string, m: ModelRow, now: Date): Promise<void> {
    await db('models').where({ id }).update({ ...columns(m), updated_at: now });
  },
};

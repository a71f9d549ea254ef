import type { Knex } from 'knex';
import type { DeviceUnit, DeviceUnitListQuery } from '#shared/schemas/device-units.ts';
import { iso, isoDay, likePattern, pageOf } from './list-page.ts';

const SORT: Record<DeviceUnitListQuery['sort'], string> = {
  serial: 'lower(u.serial)',
  model: 'lower(md.name)',
  maker: 'lower(mk.name)',
  receivedOn: 'u.received_on',
  createdAt: 'u.created_at',
};

function base(db: Knex) {
  return db('device_units as u')
    .join('models as md', 'md.id', 'u.model_id')
    .join('makers as mk', 'mk.id', 'md.maker_id')
    .select('u.*', 'md.name as model_name', 'mk.name as maker_name', 'md.emitting_width_cm', 'md.emitting_height_cm');
}

function toDeviceUnit(r: any): DeviceUnit {
  return {
    id: r.id,
    modelId: r.model_id,
    modelName: r.model_name,
    makerName: r.maker_name,
    serial: r.serial,
    obtained: r.obtained,
    receivedOn: isoDay(r.received_on),
    firmware: r.firmware,
    conditionNotes: r.condition_notes,
    emittingAreaCm: { width: Number(r.emitting_width_cm), height: Number(r.emitting_height_cm) },
    createdAt: iso(r.created_at)!,
    updatedAt: iso(r.updated_at)!,
  };
}

export interface DeviceUnitRow {
  serial?: string;
  obtained?: string;
  receivedOn?: string | null;
  firmware?: string | null;
  conditionNotes?: string;
}

function columns(u: DeviceUnitRow): Record<string, unknown> {
  const c: Record<string, unknown> = {};
  if (u.serial !== undefined) c.serial = u.serial;
  if (u.obtained !== undefined) c.obtained = u.obtained;
  if (u.receivedOn !== undefined) c.received_on = u.receivedOn;
  if (u.firmware !== undefined) c.firmware = u.firmware;
  if (u.conditionNotes !== undefined) c.condition_notes = u.conditionNotes;
  return c;
}

export const deviceUnitsRepo = {
  list(db: Knex, q: DeviceUnitListQuery) {
    const query = base(db);
    if (q.q) {
      const p = likePattern(q.q);
      query.where((w) => w.whereILike('u.serial', p).orWhereILike('md.name', p).orWhereILike('mk.name', p));
    }
    if (q.modelId) query.where('u.model_id', q.modelId);
    query.orderByRaw(`${SORT[q.sort]} ${q.dir} nulls last, u.id`);
    return pageOf(query, q, toDeviceUnit);
  },

  async findById(db: Knex, id: string): Promise<DeviceUnit | null> {
    const r = await base(db).where('u.id', id).first();
    return r ? toDeviceUnit(r) : null;
  },

  async serialTaken(db: Knex, modelId: string, serial: string, exceptId?: string): Promise<boolean> {
    const q = db('device_units').where('model_id', modelId).whereRaw('lower(serial) = lower(?)', [serial]);
    if (exceptId) q.whereNot('id', exceptId);
    return Boolean(await q.first('id'));
  },

  async insert(db: Knex, id: string, modelId: string, u: DeviceUnitRow, now: Date): Promise<void> {
    await db('device_units').insert({ id, model_id: modelId, ...columns(u), created_at: now, updated_at: now });
  },

  async update(db: Knex, id: string, u: DeviceUnitRow, now: Date): Promise<void> {
    await db('device_units').where({ id }).update({ ...columns(u), updated_at: now });
  },
};

import type { Knex } from 'knex';
import { calibrationOverdue, type Instrument, type InstrumentListQuery } from '#shared/schemas/instruments.ts';
import { iso, isoDay, likePattern, pageOf } from './list-page.ts';

const SORT: Record<InstrumentListQuery['sort'], string> = {
  name: 'lower(name)',
  kind: 'kind',
  calibrationDueOn: 'calibration_due_on',
  createdAt: 'created_at',
};

export function toInstrument(r: any, today: string): Instrument {
  const due = isoDay(r.calibration_due_on)!;
  return {
    id: r.id,
    kind: r.kind,
    name: r.name,
    serial: r.serial,
    wavelengthRangeNm: r.range_from_nm === null ? null : { from: Number(r.range_from_nm), to: Number(r.range_to_nm) },
    cosineCorrector: r.cosine_corrector,
    calibratedOn: isoDay(r.calibrated_on)!,
    calibrationDueOn: due,
    calibrationUncertaintyPct: Number(r.calibration_uncertainty_pct),
    calibrationOverdue: calibrationOverdue(due, today),
    notes: r.notes,
    createdAt: iso(r.created_at)!,
    updatedAt: iso(r.updated_at)!,
  };
}

export interface InstrumentRow {
  kind?: string;
  name?: string;
  serial?: string;
  wavelengthRangeNm?: { from: number; to: number } | null;
  cosineCorrector?: string | null;
  calibratedOn?: string;
  calibrationDueOn?: string;
  calibrationUncertaintyPct?: number;
  notes?: string;
}

function columns(i: InstrumentRow): Record<string, unknown> {
  const c: Record<string, unknown> = {};
  if (i.kind !== undefined) c.kind = i.kind;
  if (i.name !== undefined) c.name = i.name;
  if (i.serial !== undefined) c.serial = i.serial;
  if (i.wavelengthRangeNm !== undefined) {
    c.range_from_nm = i.wavelengthRangeNm?.from ?? null;
    c.range_to_nm = i.wavelengthRangeNm?.to ?? null;
  }
  if (i.cosineCorrector !== undefined) c.cosine_corrector = i.cosineCorrector;
  if (i.calibratedOn !== undefined) c.calibrated_on = i.calibratedOn;
  if (i.calibrationDueOn !== undefined) c.calibration_due_on = i.calibrationDueOn;
  if (i.calibrationUncertaintyPct !== undefined) c.calibration_uncertainty_pct = i.calibrationUncertaintyPct;
  if (i.notes !== undefined) c.notes = i.notes;
  return c;
}

export const instrumentsRepo = {
  list(db: Knex, q: InstrumentListQuery, today: string) {
    const query = db('instruments').select('*');
    if (q.q) query.where((w) => w.whereILike('name', likePattern(q.q)).orWhereILike('serial', likePattern(q.q)));
    if (q.kind) query.where('kind', q.kind);
    query.orderByRaw(`${SORT[q.sort]} ${q.dir}, id`);
    return pageOf(query, q, (r) => toInstrument(r, today));
  },

  async findById(db: Knex, id: string, today: string): Promise<Instrument | null> {
    const r = await db('instruments').where({ id }).first();
    return r ? toInstrument(r, today) : null;
  },

  async serialTaken(db: Knex, kind: string, serial: string, exceptId?: string): Promise<boolean> {
    const q = db('instruments').where('kind', kind).whereRaw('lower(serial) = lower(?)', [serial]);
    if (exceptId) q.whereNot('id', exceptId);
    return Boolean(await q.first('id'));
  },

  async insert(db: Knex, id: string, i: InstrumentRow, now: Date): Promise<void> {
    await db('instruments').insert({ id, ...columns(i), created_at: now, updated_at: now });
  },

  async update(db: Knex, id: string, i: InstrumentRow, now: Date): Promise<void> {
    await db('instruments').where({ id }).update({ ...columns(i), updated_at: now });
  },
};

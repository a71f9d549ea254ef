import type { Knex } from 'knex';
import type { RunStatus } from '#shared/lab/run-workflow.ts';
import type { RunListQuery } from '#shared/schemas/runs.ts';
import { iso, isoDay, likePattern } from './list-page.ts';

/** A run as stored, with what the pages need of its unit, model, maker, instrument and measurer. */
export interface RunRecord {
  id: string;
  status: RunStatus;
  unitId: string;
  unitSerial: string;
  modelId: string;
  modelName: string;
  makerName: string;
  category: string;
  emittingWidthCm: number;
  emittingHeightCm: number;
  ledCount: number | null;
  instrumentId: string;
  instrumentName: string;
  instrumentKind: 'spectroradiometer' | 'irradiance_meter';
  instrumentSerial: string;
  calibratedOn: string;
  calibrationDueOn: string;
  calibrationUncertaintyPct: number;
  instrumentRangeNm: { from: number; to: number } | null;
  instrumentCosineCorrector: string | null;
  grid: { distancesCm: number[]; xCm: number[]; yCm: number[] };
  bands: Record<string, { loNm: number; hiNm: number }>;
  centerChecks: boolean;
  roomTempC: number | null;
  warmupMinutes: number | null;
  mainsVoltageV: number | null;
  notes: string;
  measuredById: string;
  measuredByName: string;
  measuredOn: string;
  createdAt: string;
  updatedAt: string;
  submittedAt: string | null;
  decidedAt: string | null;
}

const SORT: Record<RunListQuery['sort'], string> = {
  createdAt: 'r.created_at',
  status: 'r.status',
  model: 'lower(md.name)',
  measuredOn: 'r.measured_on',
};

function base(db: Knex) {
  return db('runs as r')
    .join('device_units as u', 'u.id', 'r.unit_id')
    .join('models as md', 'md.id', 'u.model_id')
    .join('makers as mk', 'mk.id', 'md.maker_id')
    .join('instruments as i', 'i.id', 'r.instrument_id')
    .join('users as mb', 'mb.id', 'r.measured_by')
    .select(
      'r.*',
      'u.serial as unit_serial',
      'md.id as model_id',
      'md.name as model_name',
      'md.category',
      'md.emitting_width_cm',
      'md.emitting_height_cm',
      'md.led_count',
      'mk.name as maker_name',
      'i.name as instrument_name',
      'i.kind as instrument_kind',
      'i.serial as instrument_serial',
      'i.calibrated_on',
      'i.calibration_due_on',
      'i.calibration_uncertainty_pct',
      'i.range_from_nm',
      'i.range_to_nm',
      'i.cosine_corrector',
      'mb.display_name as measured_by_name',
    );
}

function toRecord(r: any): RunRecord {
  return {
    id: r.id,
    status: r.status,
    unitId: r.unit_id,
    unitSerial: r.unit_serial,
    modelId: r.model_id,
    modelName: r.model_name,
    makerName: r.maker_name,
    category: r.category,
    emittingWidthCm: Number(r.emitting_width_cm),
    emittingHeightCm: Number(r.emitting_height_cm),
    ledCount: r.led_count,
    instrumentId: r.instrument_id,
    instrumentName: r.instrument_name,
    instrumentKind: r.instrument_kind,
    instrumentSerial: r.instrument_serial,
    calibratedOn: isoDay(r.calibrated_on)!,
    calibrationDueOn: isoDay(r.calibration_due_on)!,
    calibrationUncertaintyPct: Number(r.calibration_uncertainty_pct),
    instrumentRangeNm: r.range_from_nm === null ? null : { from: Number(r.range_from_nm), to: Number(r.range_to_nm) },
    instrumentCosineCorrector: r.cosine_corrector,
    grid: r.grid,
    bands: r.bands,
    centerChecks: r.center_checks,
    roomTempC: r.room_temp_c,
    warmupMinutes: r.warmup_minutes,
    mainsVoltageV: r.mains_voltage_v,
    notes: r.notes,
    measuredById: r.measured_by,
    measuredByName: r.measured_by_name,
    measuredOn: isoDay(r.measured_on)!,
    createdAt: iso(r.created_at)!,
    updatedAt: iso(r.updated_at)!,
    submittedAt: iso(r.submitted_at),
    decidedAt: iso(r.decided_at),
  };
}

export interface NewRun {
  id: string;
  unitId: string;
  instrumentId: string;
  grid: RunRecord['grid'];
  bands: RunRecord['bands'];
  centerChecks: boolean;
  roomTempC: number | null;
  warmupMinutes: number | null;
  mainsVoltageV: number | null;
  notes: string;
  measuredById: string;
  measuredOn: string;
  createdById: string;
  now: Date;
}

export const runsRepo = {
  async insert(db: Knex, r: NewRun): Promise<void> {
    await db('runs').insert({
      id: r.id,
      unit_id: r.unitId,
      instrument_id: r.instrumentId,
      status: 'draft',
      grid: JSON.stringify(r.grid),
      bands: JSON.stringify(r.bands),
      center_checks: r.centerChecks,
      room_temp_c: r.roomTempC,
      warmup_minutes: r.warmupMinutes,
      mains_voltage_v: r.mainsVoltageV,
      notes: r.notes,
      measured_by: r.measuredById,
      measured_on: r.measuredOn,
      created_by: r.createdById,
      created_at: r.now,
      updated_at: r.now,
    });
  },

  async findById(db: Knex, id: string): Promise<RunRecord | null> {
    const r = await base(db).where('r.id', id).first();
    return r ? toRecord(r) : null;
  },

  /** Row-locks the run until the transaction ends (uploads and transitions take it first). */
  async lock(trx: Knex, id: string): Promise<boolean> {
    return Boolean(await trx('runs').where({ id }).forUpdate().first('id'));
  },

  async list(db: Knex, q: RunListQuery & { statuses?: readonly RunStatus[] }): Promise<{ records: RunRecord[]; total: number }> {
    const query = base(db);
    if (q.q) {
      const p = likePattern(q.q);
      query.where((w) => w.whereILike('md.name', p).orWhereILike('mk.name', p).orWhereILike('u.serial', p));
    }
    if (q.status) query.where('r.status', q.status);
    if (q.statuses) query.whereIn('r.status', q.statuses as RunStatus[]);
    if (q.unitId) query.where('r.unit_id', q.unitId);
    const countRow = await query.clone().clearSelect().clearOrder().count<{ count: number }[]>('* as count').first();
    const rows = await query
      .orderByRaw(`${SORT[q.sort]} ${q.dir}, r.id`)
      .offset((q.page - 1) * q.pageSize)
      .limit(q.pageSize);
    return { records: rows.map(toRecord), total: Number(countRow?.count ?? 0) };
  },

  async update(db: Knex, id: string, changes: Record<string, unknown>, now: Date): Promise<void> {
    await db('runs').where({ id }).update({ ...changes, updated_at: now });
  },

  /**
   * Moves the run to `to` only if it is still in one of `from`: the conditional update that makes
   * two concurrent transitions produce one. Returns false when the run was not in such a state.
   */
  async transition(trx: Knex, id: string, from: readonly RunStatus[], to: RunStatus, extra: Record<string, unknown>, now: Date): Promise<boolean> {
    const n = await trx('runs')
      .where({ id })
      .whereIn('status', from as RunStatus[])
      .update({ status: to, ...extra, updated_at: now });
    return n === 1;
  },
};

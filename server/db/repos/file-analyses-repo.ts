import type { Knex } from 'knex';
import type { ImportIssue } from '#shared/measurement/import/import-issue.ts';

export interface FileAnalysis {
  runFileId: string;
  runId: string;
  ok: boolean;
  issues: ImportIssue[];
  unit: string | null;
  wavelengthNm: Float64Array | null;
  irradianceWm2Nm: Float64Array | null;
  summary: Record<string, unknown> | null;
  meterValues: { distanceCm: number; xCm: number; yCm: number; value: number }[] | null;
}

const toBytes = (a: Float64Array | null) => (a === null ? null : Buffer.from(a.buffer, a.byteOffset, a.byteLength));

/** Float64 samples back from bytea (copied: a Buffer's offset need not be 8-aligned). */
function toFloats(b: Buffer | null): Float64Array | null {
  if (b === null) return null;
  const copy = new Uint8Array(b.byteLength);
  copy.set(b);
  return new Float64Array(copy.buffer);
}

export const fileAnalysesRepo = {
  async exists(db: Knex, runFileId: string): Promise<boolean> {
    return Boolean(await db('file_analyses').where({ run_file_id: runFileId }).first('run_file_id'));
  },

  /** Inserts once: a second analysis of the same file (a retried job) changes nothing. Returns true when stored. */
  async insertOnce(db: Knex, a: FileAnalysis, now: Date): Promise<boolean> {
    const rows = await db('file_analyses')
      .insert({
        run_file_id: a.runFileId,
        run_id: a.runId,
        ok: a.ok,
        issues: JSON.stringify(a.issues),
        unit: a.unit,
        wavelengths_nm: toBytes(a.wavelengthNm),
        irradiance_wm2_nm: toBytes(a.irradianceWm2Nm),
        summary: a.summary === null ? null : JSON.stringify(a.summary),
        meter_values: a.meterValues === null ? null : JSON.stringify(a.meterValues),
        analysed_at: now,
      })
      .onConflict('run_file_id')
      .ignore()
      .returning('run_file_id');
    return rows.length === 1;
  },

  async get(db: Knex, runFileId: string): Promise<FileAnalysis | null> {
    const r = await db('file_analyses').where({ run_file_id: runFileId }).first();
    return r ? toAnalysis(r) : null;
  },

  /** The analyses of the files that readings of a run currently point at. */
  async currentForRun(db: Knex, runId: string): Promise<Map<string, FileAnalysis>> {
    const rows = await db('file_analyses as fa')
      .whereIn('fa.run_file_id', db('readings').where('run_id', runId).whereNotNull('current_file_id').select('current_file_id'))
      .select('fa.*');
    return new Map(rows.map((r) => [r.run_file_id as string, toAnalysis(r)]));
  },

  /** Files of a run uploaded after `since` that have no analysis yet (their jobs are still to run). */
  async pendingSince(db: Knex, runId: string, since: Date): Promise<number> {
    const row = await db('run_files as f')
      .leftJoin('file_analyses as fa', 'fa.run_file_id', 'f.id')
      .where('f.run_id', runId)
      .whereNull('fa.run_file_id')
      .andWhere('f.uploaded_at', '>', since)
      .count<{ count: number }[]>('* as count')
      .first();
    return Number(row?.count ?? 0);
  },

  async countForRun(db: Knex, runId: string): Promise<number> {
    const row = await db('file_analyses').where({ run_id: runId }).count<{ count: number }[]>('* as count').first();
    return Number(row?.count ?? 0);
  },
};

function toAnalysis(r: any): FileAnalysis {
  return {
    runFileId: r.run_file_id,
    runId: r.run_id,
    ok: r.ok,
    issues: r.issues ?? [],
    unit: r.unit,
    wavelengthNm: toFloats(r.wavelengths_nm),
    irradianceWm2Nm: toFloats(r.irradiance_wm2_nm),
    summary: r.summary,
    meterValues: r.meter_values,
  };
}

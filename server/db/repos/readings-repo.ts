import type { Knex } from 'knex';
import type { ReadingSlot } from '#shared/lab/grid-point.ts';
import type { ImportIssue } from '#shared/measurement/import/import-issue.ts';
import { iso } from './list-page.ts';

export interface ReadingRecord {
  id: string;
  runId: string;
  slot: ReadingSlot;
  distanceCm: number;
  xCm: number;
  yCm: number;
  currentFileId: string | null;
  excludedReason: string | null;
  /** The current file's analysis: null while pending or without a file. */
  analysisOk: boolean | null;
}

function toRecord(r: any): ReadingRecord {
  return {
    id: r.id,
    runId: r.run_id,
    slot: r.slot,
    distanceCm: Number(r.distance_cm),
    xCm: Number(r.x_cm),
    yCm: Number(r.y_cm),
    currentFileId: r.current_file_id,
    excludedReason: r.excluded_reason,
    analysisOk: r.analysis_ok ?? null,
  };
}

export interface ReadingFileRecord {
  id: string;
  readingId: string | null;
  originalName: string;
  sha256: string;
  sizeBytes: number;
  uploadedBy: string;
  uploadedAt: string;
  analysed: boolean;
  ok: boolean | null;
  issues: ImportIssue[];
  slot: ReadingSlot | null;
  distanceCm: number | null;
  xCm: number | null;
  yCm: number | null;
}

export const readingsRepo = {
  async insertMany(db: Knex, rows: { id: string; runId: string; slot: ReadingSlot; distanceCm: number; xCm: number; yCm: number }[]): Promise<void> {
    if (rows.length === 0) return;
    await db('readings').insert(
      rows.map((r) => ({ id: r.id, run_id: r.runId, slot: r.slot, distance_cm: r.distanceCm, x_cm: r.xCm, y_cm: r.yCm })),
    );
  },

  async listForRun(db: Knex, runId: string): Promise<ReadingRecord[]> {
    const rows = await db('readings as rd')
      .leftJoin('file_analyses as fa', 'fa.run_file_id', 'rd.current_file_id')
      .where('rd.run_id', runId)
      .select('rd.*', 'fa.ok as analysis_ok')
      .orderBy([{ column: 'rd.slot', order: 'desc' }, 'rd.distance_cm', 'rd.y_cm', 'rd.x_cm']);
    return rows.map(toRecord);
  },

  async findById(db: Knex, runId: string, id: string): Promise<ReadingRecord | null> {
    const r = await db('readings as rd')
      .leftJoin('file_analyses as fa', 'fa.run_file_id', 'rd.current_file_id')
      .where({ 'rd.run_id': runId, 'rd.id': id })
      .first('rd.*', 'fa.ok as analysis_ok');
    return r ? toRecord(r) : null;
  },

  async findByPoint(db: Knex, runId: string, slot: ReadingSlot, p: { distanceCm: number; xCm: number; yCm: number }): Promise<ReadingRecord | null> {
    const r = await db('readings')
      .where({ run_id: runId, slot })
      .whereRaw('abs(distance_cm - ?) < 0.0001 and abs(x_cm - ?) < 0.0001 and abs(y_cm - ?) < 0.0001', [p.distanceCm, p.xCm, p.yCm])
      .first();
    return r ? toRecord(r) : null;
  },

  async setCurrentFile(db: Knex, readingId: string, fileId: string): Promise<void> {
    await db('readings').where({ id: readingId }).update({ current_file_id: fileId });
  },

  /** Points a meter file at every reading of the run it fills, unless a newer file already holds one. */
  async setMeterFile(db: Knex, runId: string, readingIds: readonly string[], fileId: string, uploadedAt: Date): Promise<void> {
    if (readingIds.length === 0) return;
    await db('readings as rd')
      .whereIn('rd.id', readingIds as string[])
      .andWhere('rd.run_id', runId)
      .andWhere((w) =>
        w.whereNull('rd.current_file_id').orWhereExists(function () {
          this.select(db.raw('1')).from('run_files as f').whereRaw('f.id = rd.current_file_id').andWhere('f.uploaded_at', '<=', uploadedAt);
        }),
      )
      .update({ current_file_id: fileId });
  },

  async setExcluded(db: Knex, id: string, reason: string | null, userId: string | null, now: Date): Promise<void> {
    await db('readings')
      .where({ id })
      .update({ excluded_reason: reason, excluded_by: reason === null ? null : userId, excluded_at: reason === null ? null : now });
  },

  /** Every file uploaded for a run with its point and analysis, newest first. */
  async filesForRun(db: Knex, runId: string): Promise<ReadingFileRecord[]> {
    const rows = await db('run_files as f')
      .leftJoin('file_analyses as fa', 'fa.run_file_id', 'f.id')
      .join('users as u', 'u.id', 'f.uploaded_by')
      .where('f.run_id', runId)
      .select('f.*', 'u.display_name as uploader', 'fa.ok', 'fa.issues', 'fa.run_file_id as analysed_id')
      .orderBy([{ column: 'f.uploaded_at', order: 'desc' }, { column: 'f.id', order: 'desc' }]);
    return rows.map((r) => ({
      id: r.id,
      readingId: null,
      originalName: r.original_name,
      sha256: r.sha256,
      sizeBytes: r.size_bytes,
      uploadedBy: r.uploader,
      uploadedAt: iso(r.uploaded_at)!,
      analysed: r.analysed_id !== null,
      ok: r.ok ?? null,
      issues: r.issues ?? [],
      slot: r.slot,
      distanceCm: r.distance_cm === null ? null : Number(r.distance_cm),
      xCm: r.x_cm === null ? null : Number(r.x_cm),
      yCm: r.y_cm === null ? null : Number(r.y_cm),
    }));
  },

  async progress(db: Knex, runId: string) {
    const row = await db('readings as rd')
      .leftJoin('file_analyses as fa', 'fa.run_file_id', 'rd.current_file_id')
      .where('rd.run_id', runId)
      .select(
        db.raw('count(*)::int as expected'),
        db.raw('count(rd.current_file_id)::int as received'),
        db.raw('count(*) filter (where fa.ok)::int as analysed'),
        db.raw('count(*) filter (where fa.ok = false)::int as failed'),
        db.raw('count(*) filter (where rd.excluded_reason is not null)::int as excluded'),
      )
      .first();
    return { expected: row.expected, received: row.received, analysed: row.analysed, failed: row.failed, excluded: row.excluded };
  },

  /** A digest of what the run's figures depend on: each reading's current file, analysis and exclusion. */
  async fingerprintParts(db: Knex, runId: string): Promise<string[]> {
    const rows = await db('readings as rd')
      .leftJoin('file_analyses as fa', 'fa.run_file_id', 'rd.current_file_id')
      .where('rd.run_id', runId)
      .select('rd.id', 'rd.current_file_id', 'rd.excluded_reason', 'fa.ok')
      .orderBy('rd.id');
    return rows.map((r) => `${r.id}:${r.current_file_id ?? '-'}:${r.ok ?? '-'}:${r.excluded_reason === null ? 0 : 1}`);
  },
};

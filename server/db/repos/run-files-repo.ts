import type { Knex } from 'knex';
import type { ReadingSlot } from '#shared/lab/grid-point.ts';

export interface RunFileRecord {
  id: string;
  runId: string;
  storageKey: string;
  sha256: string;
  originalName: string;
  sizeBytes: number;
  kind: 'spectrum' | 'meter';
  slot: ReadingSlot | null;
  distanceCm: number | null;
  xCm: number | null;
  yCm: number | null;
  uploadedAt: Date;
}

function toRecord(r: any): RunFileRecord {
  return {
    id: r.id,
    runId: r.run_id,
    storageKey: r.storage_key,
    sha256: r.sha256,
    originalName: r.original_name,
    sizeBytes: r.size_bytes,
    kind: r.kind,
    slot: r.slot,
    distanceCm: r.distance_cm === null ? null : Number(r.distance_cm),
    xCm: r.x_cm === null ? null : Number(r.x_cm),
    yCm: r.y_cm === null ? null : Number(r.y_cm),
    uploadedAt: new Date(r.uploaded_at),
  };
}

export const runFilesRepo = {
  async insertBatch(db: Knex, b: { id: string; runId: string; uploadedBy: string; fileCount: number; manifestName: string | null; now: Date }): Promise<void> {
    await db('run_batches').insert({
      id: b.id,
      run_id: b.runId,
      uploaded_by: b.uploadedBy,
      file_count: b.fileCount,
      manifest_name: b.manifestName,
      uploaded_at: b.now,
    });
  },

  async shasInRun(db: Knex, runId: string, shas: readonly string[]): Promise<Set<string>> {
    if (shas.length === 0) return new Set();
    const rows = await db('run_files').where('run_id', runId).whereIn('sha256', shas as string[]).select('sha256');
    return new Set(rows.map((r) => r.sha256 as string));
  },

  async insert(
    db: Knex,
    f: Omit<RunFileRecord, 'uploadedAt'> & { batchId: string; uploadedBy: string; now: Date },
  ): Promise<void> {
    await db('run_files').insert({
      id: f.id,
      run_id: f.runId,
      batch_id: f.batchId,
      storage_key: f.storageKey,
      sha256: f.sha256,
      original_name: f.originalName,
      size_bytes: f.sizeBytes,
      kind: f.kind,
      slot: f.slot,
      distance_cm: f.distanceCm,
      x_cm: f.xCm,
      y_cm: f.yCm,
      uploaded_by: f.uploadedBy,
      uploaded_at: f.now,
    });
  },

  async findById(db: Knex, id: string): Promise<RunFileRecord | null> {
    const r = await db('run_files').where({ id }).first();
    return r ? toRecord(r) : null;
  },
};

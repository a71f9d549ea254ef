import type { Reading, ReadingFile } from '#shared/schemas/runs.ts';
import { runIsEditable } from '#shared/lab/run-workflow.ts';
import { AppError, notFound } from '../core/app-error.ts';
import { callerUser, type Caller } from '../core/caller.ts';
import type { ServiceDeps } from '../core/context.ts';
import { fileAnalysesRepo } from '../db/repos/file-analyses-repo.ts';
import { readingsRepo, type ReadingFileRecord } from '../db/repos/readings-repo.ts';
import { runAnalysesRepo } from '../db/repos/run-analyses-repo.ts';
import { runCommentsRepo } from '../db/repos/run-comments-repo.ts';
import { runFilesRepo } from '../db/repos/run-files-repo.ts';
import { runsRepo } from '../db/repos/runs-repo.ts';
import { audit } from './audit.ts';
import { assertCan } from './permissions.ts';

/** What the processing job stores per reading in the run's analysis. */
export interface StoredReadingValues {
  readingId: string;
  values: Record<string, number | null>;
  peakNm: number | null;
}

const fileState = (f: ReadingFileRecord): ReadingFile['state'] => (!f.analysed ? 'pending' : f.ok ? 'analysed' : 'failed');
const toFile = (f: ReadingFileRecord): ReadingFile => ({
  id: f.id,
  originalName: f.originalName,
  sha256: f.sha256,
  sizeBytes: f.sizeBytes,
  uploadedBy: f.uploadedBy,
  uploadedAt: f.uploadedAt,
  state: fileState(f),
  issues: f.issues,
});

/** The readings of a run: their state, values, files and history; exclusions with a reason. */
export function createReadingsService(deps: Pick<ServiceDeps, 'db' | 'clock' | 'queue' | 'storage'>) {
  const loadRun = async (id: string) => {
    const run = await runsRepo.findById(deps.db, id);
    if (!run) throw notFound('That run');
    return run;
  };

  return {
    async list(caller: Caller, runId: string): Promise<Reading[]> {
      assertCan(caller, 'lab.enter');
      const run = await loadRun(runId);
      const [readings, files, stored, comments] = await Promise.all([
        readingsRepo.listForRun(deps.db, runId),
        readingsRepo.filesForRun(deps.db, runId),
        runAnalysesRepo.get(deps.db, runId),
        runCommentsRepo.countByReading(deps.db, runId),
      ]);
      const values = new Map(((stored?.values ?? []) as StoredReadingValues[]).map((v) => [v.readingId, v]));
      const byId = new Map(files.map((f) => [f.id, f]));
      return readings.map((r): Reading => {
        const current = r.currentFileId ? (byId.get(r.currentFileId) ?? null) : null;
        const samePoint = (f: ReadingFileRecord) =>
          f.id !== r.currentFileId &&
          f.slot === r.slot &&
          f.distanceCm !== null &&
          Math.abs(f.distanceCm - r.distanceCm) < 1e-4 &&
          Math.abs((f.xCm ?? NaN) - r.xCm) < 1e-4 &&
          Math.abs((f.yCm ?? NaN) - r.yCm) < 1e-4;
        const state: Reading['state'] =
          r.excludedReason !== null ? 'excluded' : !current ? 'missing' : fileState(current);
        const v = values.get(r.id);
        const blank = Object.fromEntries([...Object.keys(run.bands), 'combined'].map((b) => [b, null]));
        return {
          id: r.id,
          distanceCm: r.distanceCm,
          xCm: r.xCm,
          yCm: r.yCm,
          slot: r.slot,
          state,
          excludedReason: r.excludedReason,
          values: state === 'analysed' || state === 'excluded' ? (v?.values ?? blank) : blank,
          peakNm: v?.peakNm ?? null,
          file: current ? toFile(current) : null,
          history: files.filter(samePoint).map(toFile),
          commentCount: comments.get(r.id) ?? 0,
        };
      });
    },

    async setExcluded(caller: Caller, runId: string, readingId: string, reason: string | null): Promise<void> {
      assertCan(caller, 'runs.upload');
      await deps.db.transaction(async (trx) => {
        await runsRepo.lock(trx, runId);
        const run = await runsRepo.findById(trx, runId);
        if (!run) throw notFound('That run');
        if (!runIsEditable(run.status)) throw new AppError('conflict', 'Readings of a run under review or approved cannot be changed.');
        const reading = await readingsRepo.findById(trx, runId, readingId);
        if (!reading) throw notFound('That reading');
        await readingsRepo.setExcluded(trx, readingId, reason, callerUser(caller)?.id ?? null, deps.clock.now());
        await audit({
          trx,
          clock: deps.clock,
          caller,
          action: reason === null ? 'reading.include' : 'reading.exclude',
          entity: { type: 'run', id: runId },
          before: { status: run.status },
          after: { status: run.status, readingId, point: { distanceCm: reading.distanceCm, xCm: reading.xCm, yCm: reading.yCm, slot: reading.slot }, reason },
        });
        await deps.queue.enqueue(trx, [{ name: 'analyze-run', data: { runId }, singletonKey: runId }]);
      });
    },

    /** A reading's spectrum as stored (W/m²/nm), for the run page's chart. */
    async spectrum(caller: Caller, runId: string, readingId: string) {
      assertCan(caller, 'lab.enter');
      const reading = await readingsRepo.findById(deps.db, runId, readingId);
      if (!reading || !reading.currentFileId) throw notFound('A spectrum for that reading');
      const [file, analysis] = await Promise.all([runFilesRepo.findById(deps.db, reading.currentFileId), fileAnalysesRepo.get(deps.db, reading.currentFileId)]);
      if (!file || !analysis?.wavelengthNm || !analysis.irradianceWm2Nm) throw notFound('A spectrum for that reading');
      return {
        readingId,
        fileName: file.originalName,
        unit: analysis.unit,
        wavelengthNm: Array.from(analysis.wavelengthNm),
        irradianceWm2Nm: Array.from(analysis.irradianceWm2Nm),
      };
    },

    /** Ids of every file uploaded to a run (the seed and tools that process without a worker). */
    async fileIds(caller: Caller, runId: string): Promise<string[]> {
      assertCan(caller, 'lab.enter');
      return (await readingsRepo.filesForRun(deps.db, runId)).map((f) => f.id);
    },

    /** The raw bytes of an uploaded file, as uploaded (provenance). */
    async rawFile(caller: Caller, runId: string, fileId: string) {
      assertCan(caller, 'lab.enter');
      const file = await runFilesRepo.findById(deps.db, fileId);
      if (!file || file.runId !== runId) throw notFound('That file');
      const bytes = await deps.storage.get(file.storageKey);
      if (!bytes) throw notFound('That file');
      return { name: file.originalName, bytes };
    },
  };
}
export type ReadingsService = ReturnType<typeof createReadingsService>;

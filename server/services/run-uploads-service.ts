import { randomUUID } from 'node:crypto';
import { baseName, parseManifest, pointFromFileName, type MappedFile } from '#shared/lab/file-mapping.ts';
import { gridContains, pointKey } from '#shared/lab/grid-point.ts';
import { runIsEditable } from '#shared/lab/run-workflow.ts';
import { decodeTextBytes } from '#shared/measurement/import/decode-text.ts';
import type { UploadResult } from '#shared/schemas/runs.ts';
import { AppError, notFound } from '../core/app-error.ts';
import { callerUser, type Caller } from '../core/caller.ts';
import type { ServiceDeps } from '../core/context.ts';
import { readingsRepo } from '../db/repos/readings-repo.ts';
import { runFilesRepo } from '../db/repos/run-files-repo.ts';
import { runsRepo } from '../db/repos/runs-repo.ts';
import { sha256Hex } from '../storage/file-storage.ts';
import { audit } from './audit.ts';
import { assertCan } from './permissions.ts';

export interface UploadedFile {
  originalName: string;
  bytes: Uint8Array;
}

/**
 * A batch of files for a run, stored in one transaction with the jobs that will analyse them:
 * either everything is stored and queued, or nothing is. Spectrum files map to grid points by
 * name or manifest; files that match no point are listed and not stored; bytes already in the run
 * are recognised by SHA-256 and not stored twice; a new file for a filled point replaces it while
 * the old one stays in the point's history. On a meter run every file is a meter-readings file
 * that fills the points it lists once analysed.
 */
export function createRunUploadsService(deps: Pick<ServiceDeps, 'db' | 'clock' | 'queue' | 'storage'>) {
  return {
    async upload(caller: Caller, runId: string, files: readonly UploadedFile[], manifest: UploadedFile | null): Promise<UploadResult> {
      assertCan(caller, 'runs.upload');
      const user = callerUser(caller);
      const run = await runsRepo.findById(deps.db, runId);
      if (!run) throw notFound('That run');
      if (!runIsEditable(run.status)) {
        throw new AppError('conflict', `Files can be added only while the run is a draft or sent back for changes; it is ${run.status.replace('_', ' ')}.`);
      }
      if (files.length === 0) throw new AppError('validation_failed', 'No file was sent.', [{ path: 'body.files', message: 'Choose at least one file.' }]);
      const isMeterRun = run.instrumentKind === 'irradiance_meter';

      // Map every file to its point (spectra) before touching the database.
      let byManifest: Map<string, MappedFile> | null = null;
      if (manifest && !isMeterRun) {
        const parsed = parseManifest(decodeTextBytes(manifest.bytes).text, run.grid);
        if (!parsed.ok) {
          throw new AppError(
            'validation_failed',
            'The manifest cannot be used: fix the lines below and upload again.',
            parsed.errors.map((e) => ({ path: `manifest${e.line === null ? '' : `:${e.line}`}${e.column ? `.${e.column}` : ''}`, message: e.message, line: e.line })),
          );
        }
        byManifest = parsed.entries;
      }
      const result: UploadResult = { accepted: [], unmatched: [], duplicates: [] };
      const toStore: { file: UploadedFile; sha256: string; point: MappedFile | null }[] = [];
      const seenInBatch = new Map<string, string>();
      const seenPoint = new Set<string>();
      for (const file of files) {
        const name = baseName(file.originalName);
        let point: MappedFile | null = null;
        if (!isMeterRun) {
          point = byManifest ? (byManifest.get(name) ?? null) : pointFromFileName(name);
          const onGrid =
            point !== null && gridContains(run.grid, point) && (point.slot === 'grid' || (run.centerChecks && point.xCm === 0 && point.yCm === 0));
          if (!onGrid) {
            result.unmatched.push(name);
            continue;
          }
        }
        const sha256 = sha256Hex(file.bytes);
        if (seenInBatch.has(sha256)) {
          result.duplicates.push(name);
          continue;
        }
        seenInBatch.set(sha256, name);
        if (point) {
          const key = pointKey(point, point.slot);
          if (seenPoint.has(key)) throw new AppError('validation_failed', `Two files of this batch are for the same point (${name}).`, [{ path: 'body.files', message: `${name}: another file of this batch fills the same point.` }]);
          seenPoint.add(key);
        }
        toStore.push({ file, sha256, point });
      }

      await deps.db.transaction(async (trx) => {
        await runsRepo.lock(trx, runId);
        const fresh = await runsRepo.findById(trx, runId);
        if (!fresh || !runIsEditable(fresh.status)) throw new AppError('conflict', 'The run left the draft state while the files were arriving.');
        const already = await runFilesRepo.shasInRun(trx, runId, toStore.map((s) => s.sha256));
        const batchId = randomUUID();
        const now = deps.clock.now();
        const stored = toStore.filter((s) => {
          if (!already.has(s.sha256)) return true;
          result.duplicates.push(baseName(s.file.originalName));
          return false;
        });
        await runFilesRepo.insertBatch(trx, { id: batchId, runId, uploadedBy: user?.id ?? run.measuredById, fileCount: stored.length, manifestName: manifest?.originalName ?? null, now });
        const jobs = [];
        for (const s of stored) {
          const { key } = await deps.storage.put(trx, s.file.bytes);
          const fileId = randomUUID();
          await runFilesRepo.insert(trx, {
            id: fileId,
            runId,
            batchId,
            storageKey: key,
            sha256: s.sha256,
            originalName: baseName(s.file.originalName),
            sizeBytes: s.file.bytes.byteLength,
            kind: isMeterRun ? 'meter' : 'spectrum',
            slot: s.point?.slot ?? null,
            distanceCm: s.point?.distanceCm ?? null,
            xCm: s.point?.xCm ?? null,
            yCm: s.point?.yCm ?? null,
            uploadedBy: user?.id ?? run.measuredById,
            now,
          });
          if (s.point) {
            const reading = await readingsRepo.findByPoint(trx, runId, s.point.slot, s.point);
            if (reading) await readingsRepo.setCurrentFile(trx, reading.id, fileId);
            result.accepted.push({ file: baseName(s.file.originalName), distanceCm: s.point.distanceCm, xCm: s.point.xCm, yCm: s.point.yCm, slot: s.point.slot });
          } else {
            result.accepted.push({ file: baseName(s.file.originalName), distanceCm: null, xCm: null, yCm: null, slot: 'meter' });
          }
          jobs.push({ name: 'process-file' as const, data: { fileId } });
        }
        // The analysis jobs commit with the files: none is lost, none runs for a file not stored.
        await deps.queue.enqueue(trx, jobs);
        if (stored.length > 0) {
          await audit({
            trx,
            clock: deps.clock,
            caller,
            action: 'run.upload',
            entity: { type: 'run', id: runId },
            before: { status: fresh.status },
            after: { status: fresh.status, batchId, stored: stored.length, unmatched: result.unmatched.length, duplicates: result.duplicates.length },
          });
        }
      });
      return result;
    },
  };
}
export type RunUploadsService = ReturnType<typeof createRunUploadsService>;

/**
 * The worker's side of a run: analyse each uploaded file once, then recompute the run's figures
 * and flags from the readings' current files. Both handlers are idempotent (ids in, state read
 * from the database): a job that runs twice, or again after a crash, changes nothing twice.
 */
import { bandValues, COMBINED_BAND } from '#shared/lab/band-values.ts';
import { gridContains, type GridPoint } from '#shared/lab/grid-point.ts';
import { centerDrift, DRIFT_LIMIT, looksSaturated, outlierReadings, type Flag } from '#shared/lab/run-flags.ts';
import { runFigures, type PointValues } from '#shared/lab/run-figures.ts';
import { fitEffectiveBeamAngle } from '#shared/measurement/distance/beam-angle.ts';
import { ledArrayIrradiance } from '#shared/measurement/geometry/led-array.ts';
import { checkMeterReadingsFile } from '#shared/measurement/check/check-meter-readings-file.ts';
import { checkSpectrumFile } from '#shared/measurement/check/check-spectrum-file.ts';
import { issue } from '#shared/measurement/import/import-issue.ts';
import type { RunAnalysis } from '#shared/schemas/runs.ts';
import { notFound } from '../core/app-error.ts';
import type { Caller } from '../core/caller.ts';
import type { ServiceDeps } from '../core/context.ts';
import { fileAnalysesRepo, type FileAnalysis } from '../db/repos/file-analyses-repo.ts';
import { readingsRepo } from '../db/repos/readings-repo.ts';
import { runAnalysesRepo } from '../db/repos/run-analyses-repo.ts';
import { runFilesRepo } from '../db/repos/run-files-repo.ts';
import { runsRepo, type RunRecord } from '../db/repos/runs-repo.ts';
import { assertCan } from './permissions.ts';
import { runFingerprint } from './run-fingerprint.ts';
import type { StoredReadingValues } from './readings-service.ts';

const fmt = (v: number) => Number(v.toPrecision(3));

/** How long a file may wait for its analysis before the run's figures stop waiting for it. */
const PENDING_PATIENCE_MS = 10 * 60 * 1000;
const where = (p: GridPoint) => `${fmt(p.distanceCm)} cm, x ${fmt(p.xCm)}, y ${fmt(p.yCm)}`;

export function createRunProcessingService(deps: Pick<ServiceDeps, 'db' | 'clock' | 'queue' | 'storage' | 'logger'>) {
  const analyzeRunJob = (runId: string) => ({ name: 'analyze-run' as const, data: { runId }, singletonKey: runId });

  return {
    /** Parses and analyses one uploaded file through the shared check pipeline; stores the result once. */
    async processFile(caller: Caller, fileId: string): Promise<'analysed' | 'already' | 'gone'> {
      assertCan(caller, 'runs.upload');
      const file = await runFilesRepo.findById(deps.db, fileId);
      if (!file) return 'gone';
      if (await fileAnalysesRepo.exists(deps.db, fileId)) return 'already';
      const run = await runsRepo.findById(deps.db, file.runId);
      if (!run) return 'gone';
      const bytes = await deps.storage.get(file.storageKey);
      if (!bytes) throw new Error(`stored bytes missing for file ${fileId}`);

      let analysis: FileAnalysis;
      let meterReadingIds: string[] = [];
      if (file.kind === 'spectrum') {
        const check = checkSpectrumFile(bytes, { bands: run.bands });
        const spectrum = check.result?.spectrum ?? null;
        const issues = [...check.issues];
        if (spectrum && looksSaturated(spectrum.wavelengthNm, spectrum.irradianceWm2Nm)) {
          issues.push(issue(null, 'saturated', 'warning', 'The spectrum has a flat top: the detector may have been saturated. Measure again with a shorter integration time.'));
        }
        analysis = {
          runFileId: fileId,
          runId: run.id,
          ok: check.ok,
          issues,
          unit: check.result?.unit ?? null,
          wavelengthNm: spectrum ? Float64Array.from(spectrum.wavelengthNm) : null,
          irradianceWm2Nm: spectrum ? Float64Array.from(spectrum.irradianceWm2Nm) : null,
          summary: check.summary
            ? {
                rangeNm: check.summary.rangeNm,
                samples: check.summary.samples,
                totalWm2: check.summary.totalWm2,
                peakNm: check.summary.peakNm,
                photonFluxUmolM2S: check.summary.photonFluxUmolM2S,
                saturated: issues.some((i) => i.code === 'saturated'),
              }
            : null,
          meterValues: null,
        };
      } else {
        const check = checkMeterReadingsFile(bytes);
        const issues = [...check.issues];
        const values: { distanceCm: number; xCm: number; yCm: number; value: number }[] = [];
        const readings = await readingsRepo.listForRun(deps.db, run.id);
        for (const r of check.result?.readings ?? []) {
          const point = { distanceCm: r.distanceCm, xCm: r.xCm, yCm: r.yCm };
          if (!gridContains(run.grid, point)) {
            issues.push(issue(r.line, 'off_grid', 'warning', `Line ${r.line} is at ${where(point)}, which is not a point of this run's grid; it was left out.`));
            continue;
          }
          values.push({ ...point, value: r.irradianceMwCm2 });
          const reading = readings.find(
            (x) => x.slot === 'grid' && Math.abs(x.distanceCm - r.distanceCm) < 1e-4 && Math.abs(x.xCm - r.xCm) < 1e-4 && Math.abs(x.yCm - r.yCm) < 1e-4,
          );
          if (reading) meterReadingIds.push(reading.id);
        }
        if (check.ok && values.length === 0) issues.push(issue(null, 'no_grid_points', 'error', 'No reading of this file lies on the run’s grid.'));
        const ok = check.ok && values.length > 0;
        if (!ok) meterReadingIds = [];
        analysis = { runFileId: fileId, runId: run.id, ok, issues, unit: 'mW/cm2', wavelengthNm: null, irradianceWm2Nm: null, summary: null, meterValues: values };
      }

      return deps.db.transaction(async (trx) => {
        const stored = await fileAnalysesRepo.insertOnce(trx, analysis, deps.clock.now());
        if (!stored) return 'already' as const;
        if (meterReadingIds.length > 0) await readingsRepo.setMeterFile(trx, run.id, meterReadingIds, fileId, file.uploadedAt);
        await deps.queue.enqueue(trx, [analyzeRunJob(run.id)]);
        return 'analysed' as const;
      });
    },

    /**
     * Recomputes a run's figures, per-reading values and flags, and stores them with their
     * fingerprint. While files of the run still wait for their analysis it does nothing: the last
     * file's job queues this again after its own analysis commits, so the figures are computed once
     * per batch, not once per file. A file waiting longer than PENDING_PATIENCE_MS is taken as lost
     * (its job gave up) and no longer holds the figures back.
     */
    async analyzeRun(caller: Caller, runId: string): Promise<'analysed' | 'waiting'> {
      assertCan(caller, 'runs.upload');
      const run = await runsRepo.findById(deps.db, runId);
      if (!run) return 'analysed';
      const since = new Date(deps.clock.now().getTime() - PENDING_PATIENCE_MS);
      if ((await fileAnalysesRepo.pendingSince(deps.db, runId, since)) > 0) return 'waiting';
      const fingerprint = await runFingerprint(deps.db, runId, run.bands);
      const readings = await readingsRepo.listForRun(deps.db, runId);
      const analyses = await fileAnalysesRepo.currentForRun(deps.db, runId);
      const bandNames = [COMBINED_BAND, ...Object.keys(run.bands)];
      const values: StoredReadingValues[] = [];
      const flags: Flag[] = [];
      for (const r of readings) {
        const a = r.currentFileId ? analyses.get(r.currentFileId) : undefined;
        if (!a?.ok) continue;
        if (a.wavelengthNm && a.irradianceWm2Nm) {
          const spectrum = { wavelengthNm: a.wavelengthNm, irradianceWm2Nm: a.irradianceWm2Nm };
          const bands = bandValues(spectrum, run.bands);
          values.push({
            readingId: r.id,
            values: Object.fromEntries(bandNames.map((b) => [b, bands[b]?.mwCm2 ?? null])),
            peakNm: (a.summary?.peakNm as number | null | undefined) ?? null,
          });
          if (r.excludedReason === null && a.summary?.saturated) {
            flags.push({ code: 'saturated', severity: 'warning', message: `The spectrum at ${where(r)} looks saturated (flat top).`, point: { ...pick(r), slot: r.slot }, value: null });
          }
          const nir = bands.nir?.mwCm2;
          if (r.excludedReason === null && nir !== null && nir !== undefined && nir < 0) {
            flags.push({ code: 'negative_nir', severity: 'warning', message: `The near-infrared band at ${where(r)} integrates below zero: check the dark reference.`, point: { ...pick(r), slot: r.slot }, value: nir });
          }
        } else if (a.meterValues) {
          const v = a.meterValues.find((m) => Math.abs(m.distanceCm - r.distanceCm) < 1e-4 && Math.abs(m.xCm - r.xCm) < 1e-4 && Math.abs(m.yCm - r.yCm) < 1e-4);
          if (v) values.push({ readingId: r.id, values: Object.fromEntries(bandNames.map((b) => [b, b === COMBINED_BAND ? v.value : null])), peakNm: null });
        }
      }
      const valueOf = new Map(values.map((v) => [v.readingId, v]));
      const gridValues: PointValues[] = readings
        .filter((r) => r.slot === 'grid' && r.excludedReason === null && valueOf.has(r.id))
        .map((r) => ({ ...pick(r), values: valueOf.get(r.id)!.values }));
      const figures = runFigures(gridValues, bandNames, { widthCm: run.emittingWidthCm, heightCm: run.emittingHeightCm });

      flags.push(...outlierFlags(gridValues, expectedShape(run, gridValues)), ...driftFlags(run, readings, valueOf), ...runLevelFlags(run, readings));
      await runAnalysesRepo.upsert(deps.db, runId, { fingerprint, figures, flags, values }, deps.clock.now());
      return 'analysed';
    },

    async analysis(caller: Caller, runId: string): Promise<RunAnalysis> {
      assertCan(caller, 'lab.enter');
      const run = await runsRepo.findById(deps.db, runId);
      if (!run) throw notFound('That run');
      const stored = await runAnalysesRepo.get(deps.db, runId);
      const fingerprint = await runFingerprint(deps.db, runId, run.bands);
      const figures = (stored?.figures ?? { planes: [], falloffExponent: {} }) as { planes: RunAnalysis['planes']; falloffExponent: RunAnalysis['falloffExponent'] };
      return {
        planes: figures.planes,
        falloffExponent: figures.falloffExponent,
        flags: (stored?.flags ?? []) as RunAnalysis['flags'],
        computedAt: stored?.computedAt ?? null,
        stale: stored === null || stored.fingerprint !== fingerprint,
      };
    },

    /** Queues a recomputation (after a restart, or for runs whose figures are missing). */
    async requestAnalysis(runId: string): Promise<void> {
      await deps.queue.send([analyzeRunJob(runId)]);
    },
  };
}
export type RunProcessingService = ReturnType<typeof createRunProcessingService>;

const pick = (p: GridPoint): GridPoint => ({ distanceCm: p.distanceCm, xCm: p.xCm, yCm: p.yCm });

/**
 * The field the run's readings should follow, up to scale: identical cosⁿ LEDs filling the
 * model's emitting area, at the beam angle that best fits the readings themselves (the effective
 * beam angle of the measurement core). LED pitch from the model's LED count, else 2 cm.
 */
function expectedShape(run: RunRecord, points: readonly PointValues[]): (p: GridPoint) => number {
  const area = run.emittingWidthCm * run.emittingHeightCm;
  const pitchCm = run.ledCount && run.ledCount > 0 ? Math.sqrt(area / run.ledCount) : 2;
  const emitter = { widthCm: run.emittingWidthCm, heightCm: run.emittingHeightCm, pitchCm };
  const readings = points
    .filter((p) => (p.values[COMBINED_BAND] ?? 0) > 0)
    .map((p) => ({ distanceCm: p.distanceCm, xCm: p.xCm, yCm: p.yCm, irradiance: p.values[COMBINED_BAND] as number }));
  const fit = fitEffectiveBeamAngle(emitter, readings);
  const fullAngleDeg = fit?.fittedFullAngleDeg ?? 120;
  const cache = new Map<string, number>();
  return (p) => {
    const key = `${p.distanceCm}|${p.xCm}|${p.yCm}`;
    let v = cache.get(key);
    if (v === undefined) {
      v = ledArrayIrradiance({ ...emitter, fullAngleDeg }, p);
      cache.set(key, v);
    }
    return v;
  };
}

function outlierFlags(points: readonly PointValues[], expected: (p: GridPoint) => number): Flag[] {
  const flags: Flag[] = [];
  const distances = [...new Set(points.map((p) => p.distanceCm))];
  for (const d of distances) {
    const plane = points
      .filter((p) => p.distanceCm === d && p.values[COMBINED_BAND] !== null)
      .map((p) => ({ xCm: p.xCm, yCm: p.yCm, value: p.values[COMBINED_BAND] as number }));
    const shape = (xCm: number, yCm: number) => expected({ distanceCm: d, xCm, yCm });
    for (const o of outlierReadings(plane, { shape, maxSpanCm: 2 * d })) {
      const pct = Math.round((o.ratio - 1) * 100);
      flags.push({
        code: 'outlier',
        severity: 'warning',
        message: `The reading at ${where({ distanceCm: d, ...o.point })} is ${pct > 0 ? `${pct} % above` : `${-pct} % below`} what its neighbours predict.`,
        point: { distanceCm: d, xCm: o.point.xCm, yCm: o.point.yCm, slot: 'grid' },
        value: o.ratio,
      });
    }
  }
  return flags;
}

function driftFlags(run: RunRecord, readings: Awaited<ReturnType<typeof readingsRepo.listForRun>>, valueOf: Map<string, StoredReadingValues>): Flag[] {
  if (!run.centerChecks) return [];
  const flags: Flag[] = [];
  for (const d of run.grid.distancesCm) {
    const at = (slot: string) => readings.find((r) => r.slot === slot && Math.abs(r.distanceCm - d) < 1e-4 && r.excludedReason === null);
    const first = at('center_start');
    const last = at('center_end');
    const a = first ? (valueOf.get(first.id)?.values[COMBINED_BAND] ?? null) : null;
    const b = last ? (valueOf.get(last.id)?.values[COMBINED_BAND] ?? null) : null;
    const drift = centerDrift(a, b);
    if (drift === null) {
      flags.push({ code: 'no_drift_check', severity: 'warning', message: `No start and end centre readings at ${fmt(d)} cm: drift cannot be checked there.`, point: null, value: d });
    } else if (drift > DRIFT_LIMIT) {
      flags.push({
        code: 'center_drift',
        severity: 'warning',
        message: `The centre reading at ${fmt(d)} cm changed by ${(drift * 100).toFixed(1)} % between the start and the end of the plane (limit ${DRIFT_LIMIT * 100} %).`,
        point: { distanceCm: d, xCm: 0, yCm: 0 },
        value: drift,
      });
    }
  }
  return flags;
}

function runLevelFlags(run: RunRecord, readings: Awaited<ReturnType<typeof readingsRepo.listForRun>>): Flag[] {
  const flags: Flag[] = [];
  if (run.calibrationDueOn < run.measuredOn) {
    flags.push({
      code: 'calibration_overdue',
      severity: 'warning',
      message: `The instrument's calibration was due on ${run.calibrationDueOn}, before this run was measured (${run.measuredOn}).`,
      point: null,
      value: null,
    });
  }
  const missing = readings.filter((r) => r.slot === 'grid' && r.excludedReason === null && r.analysisOk !== true);
  if (missing.length > 0) {
    flags.push({
      code: 'missing_points',
      severity: 'blocking',
      message: `${missing.length} of ${readings.filter((r) => r.slot === 'grid').length} grid points have no usable reading yet.`,
      point: null,
      value: missing.length,
    });
  }
  return flags;
}

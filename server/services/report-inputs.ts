import { COMBINED_BAND } from '#shared/lab/band-values.ts';
import type { SnapshotModel, SnapshotRunInput } from '#shared/lab/report-snapshot.ts';
import type { Db } from '../db/knex.ts';
import { deviceUnitsRepo } from '../db/repos/device-units-repo.ts';
import { fileAnalysesRepo } from '../db/repos/file-analyses-repo.ts';
import { modelsRepo } from '../db/repos/models-repo.ts';
import { readingsRepo } from '../db/repos/readings-repo.ts';
import { runAnalysesRepo } from '../db/repos/run-analyses-repo.ts';
import type { RunRecord } from '../db/repos/runs-repo.ts';
import type { StoredReadingValues } from './readings-service.ts';

/** The model as a report shows it. */
export async function snapshotModel(db: Db, modelId: string): Promise<SnapshotModel> {
  const m = await modelsRepo.findById(db, modelId);
  if (!m) throw new Error(`model ${modelId} is gone`);
  return {
    name: m.name,
    makerName: m.makerName,
    category: m.category,
    emittingAreaCm: m.emittingAreaCm,
    ledCount: m.ledCount,
    nominalWavelengths: m.nominalWavelengths,
    claims: m.claims,
    price: m.price,
    powerW: m.powerW,
    links: m.links,
  };
}

/** Everything of one run a report needs, read from its stored readings and analyses. */
export async function snapshotRunInput(db: Db, run: RunRecord): Promise<SnapshotRunInput> {
  const unit = await deviceUnitsRepo.findById(db, run.unitId);
  const readings = await readingsRepo.listForRun(db, run.id);
  const stored = await runAnalysesRepo.get(db, run.id);
  const values = new Map(((stored?.values ?? []) as StoredReadingValues[]).map((v) => [v.readingId, v.values]));
  const grid = readings
    .filter((r) => r.slot === 'grid' && r.excludedReason === null && values.has(r.id))
    .map((r) => ({ distanceCm: r.distanceCm, xCm: r.xCm, yCm: r.yCm, values: values.get(r.id)! }));
  const checks = new Map<number, number[]>();
  for (const r of readings) {
    if (r.slot === 'grid' || r.excludedReason !== null) continue;
    const v = values.get(r.id)?.[COMBINED_BAND];
    if (v === null || v === undefined) continue;
    checks.set(r.distanceCm, [...(checks.get(r.distanceCm) ?? []), v]);
  }
  // The representative spectrum: the centre reading of the nearest plane.
  const nearest = Math.min(...run.grid.distancesCm);
  const centre = readings.find((r) => r.slot === 'grid' && r.distanceCm === nearest && r.xCm === 0 && r.yCm === 0 && r.currentFileId);
  let spectrum: SnapshotRunInput['spectrum'] = null;
  if (centre?.currentFileId && run.instrumentKind === 'spectroradiometer') {
    const a = await fileAnalysesRepo.get(db, centre.currentFileId);
    if (a?.ok && a.wavelengthNm && a.irradianceWm2Nm) {
      spectrum = { distanceCm: nearest, xCm: 0, yCm: 0, wavelengthNm: Array.from(a.wavelengthNm), irradianceWm2Nm: Array.from(a.irradianceWm2Nm) };
    }
  }
  return {
    unit: { serial: unit?.serial ?? run.unitSerial, obtained: unit?.obtained ?? 'bought_retail', receivedOn: unit?.receivedOn ?? null, firmware: unit?.firmware ?? null },
    instrument: {
      name: run.instrumentName,
      kind: run.instrumentKind,
      serial: run.instrumentSerial,
      wavelengthRangeNm: run.instrumentRangeNm,
      cosineCorrector: run.instrumentCosineCorrector,
      calibratedOn: run.calibratedOn,
      calibrationDueOn: run.calibrationDueOn,
      calibrationUncertaintyPct: run.calibrationUncertaintyPct,
    },
    grid: run.grid,
    bands: run.bands,
    conditions: { roomTempC: run.roomTempC, warmupMinutes: run.warmupMinutes, mainsVoltageV: run.mainsVoltageV },
    measuredOn: run.measuredOn,
    measuredBy: run.measuredByName,
    readings: grid,
    centerChecks: [...checks.entries()].map(([distanceCm, v]) => ({ distanceCm, values: v })),
    spectrum,
  };
}

import { calibrationOverdue } from '#shared/schemas/instruments.ts';
import type { Run, RunProgress } from '#shared/schemas/runs.ts';
import type { RunRecord } from '../db/repos/runs-repo.ts';

/** A stored run as the API shows it. */
export function toRun(r: RunRecord, progress: RunProgress, today: string): Run {
  return {
    id: r.id,
    status: r.status,
    unit: {
      id: r.unitId,
      serial: r.unitSerial,
      modelId: r.modelId,
      modelName: r.modelName,
      makerName: r.makerName,
      category: r.category,
      emittingAreaCm: { width: r.emittingWidthCm, height: r.emittingHeightCm },
    },
    instrument: {
      id: r.instrumentId,
      name: r.instrumentName,
      kind: r.instrumentKind,
      serial: r.instrumentSerial,
      calibratedOn: r.calibratedOn,
      calibrationDueOn: r.calibrationDueOn,
      calibrationUncertaintyPct: r.calibrationUncertaintyPct,
      calibrationOverdue: calibrationOverdue(r.calibrationDueOn, today),
    },
    grid: r.grid,
    bands: r.bands,
    centerChecks: r.centerChecks,
    conditions: { roomTempC: r.roomTempC, warmupMinutes: r.warmupMinutes, mainsVoltageV: r.mainsVoltageV },
    notes: r.notes,
    measuredBy: { id: r.measuredById, displayName: r.measuredByName },
    measuredOn: r.measuredOn,
    createdAt: r.createdAt,
    updatedAt: r.updatedAt,
    submittedAt: r.submittedAt,
    decidedAt: r.decidedAt,
    progress,
  };
}

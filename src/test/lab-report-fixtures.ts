import type { LabReport } from '#shared/schemas/reports.ts';
import type { Run } from '#shared/schemas/runs.ts';

/** Fictional runs and reports for the client tests, as the lab API answers them. */
const stamp = '2026-02-03T10:00:00.000Z';

export function anApprovedRun(id: string, serial: string, model: { id: string; name: string; maker: string }, extra: Partial<Run> = {}): Run {
  return {
    id,
    status: 'approved',
    unit: { id: `u-${id}`, serial, modelId: model.id, modelName: model.name, makerName: model.maker, category: 'panel', emittingAreaCm: { width: 30, height: 20 } },
    instrument: {
      id: 'in-1',
      name: 'Bench spectroradiometer',
      kind: 'spectroradiometer',
      serial: 'SR-1',
      calibratedOn: '2026-01-10',
      calibrationDueOn: '2027-01-10',
      calibrationUncertaintyPct: 4.5,
      calibrationOverdue: false,
    },
    grid: { distancesCm: [15, 30, 60], xCm: [-20, -10, 0, 10, 20], yCm: [-10, 0, 10] },
    bands: { red: { loNm: 600, hiNm: 700 }, nir: { loNm: 700, hiNm: 1100 } },
    centerChecks: false,
    conditions: { roomTempC: 21, warmupMinutes: 10, mainsVoltageV: 230 },
    notes: '',
    measuredBy: { id: 'u-tess', displayName: 'Tess Amberly' },
    measuredOn: '2026-02-01',
    createdAt: stamp,
    updatedAt: stamp,
    submittedAt: stamp,
    decidedAt: stamp,
    progress: { expected: 45, received: 45, analysed: 45, failed: 0, excluded: 0, analysing: false, flags: 0 },
    ...extra,
  };
}

export function aLabReport(id: string, extra: Partial<LabReport> = {}): LabReport {
  return {
    id,
    slug: 'aldermoor-light-co-tarn-hand-panel',
    status: 'draft',
    version: 0,
    title: 'Tarn hand panel: bright at the centre, narrow at 30 cm',
    summary: 'A small panel that delivers most of its light close in.',
    bodyMarkdown: '## What we found\n\nMost of the light falls on a small area.',
    modelId: 'md-tarn',
    modelName: 'Tarn hand panel',
    makerName: 'Aldermoor Light Co.',
    runIds: ['run-1'],
    publishedAt: null,
    retractedAt: null,
    retractionReason: null,
    createdAt: stamp,
    updatedAt: stamp,
    ...extra,
  };
}

/**
 * The demo lab's catalogue and runs, written through the services: the demo makers, models,
 * units and instruments of the demo-data generator, one run per demo unit on the standard grid
 * with its generated files uploaded and analysed, in several states of review, and a meter run.
 * Safe to run twice: what exists is left as it is.
 */
import { systemCaller, userCaller, type Caller } from '#server/core/caller.ts';
import type { Services } from '#server/services/index.ts';
import type { ModelCategory } from '#shared/schemas/models.ts';
import type { SessionUser } from '#shared/schemas/users.ts';
import { DEMO_INSTRUMENTS, DEMO_METER_ID, DEMO_RUN_INSTRUMENT, DEMO_UNITS, type DemoUnit } from './demo/catalog.ts';
import { buildDemoScenario, demoGrid } from './demo/scenario.ts';
import { seedDemoReports } from './demo-reports.ts';

const CATEGORY: Record<DemoUnit['kind'], ModelCategory> = {
  'body panel': 'panel',
  'small panel': 'panel',
  'flexible mat': 'mat',
  'half-body panel': 'panel',
};

/** Fictional shop prices and power draws, in the lab's currency. */
const PRICE_EUR_CENTS: Record<string, number> = { 'corvane-fenwick': 89900, 'aldermoor-tarn': 24900, 'quenby-mere': 41900, 'norrow-holt': 54900 };
const POWER_W: Record<string, number> = { 'corvane-fenwick': 300, 'aldermoor-tarn': 60, 'quenby-mere': 90, 'norrow-holt': 150 };

function addYears(day: string, years: number): string {
  return `${Number(day.slice(0, 4)) + years}${day.slice(4)}`;
}

export interface DemoPeople {
  tester: SessionUser;
  editor: SessionUser;
}

export async function seedDemoLab(services: Services, people: DemoPeople): Promise<void> {
  const seed = systemCaller('seed');
  const tester = userCaller(people.tester);
  const editor = userCaller(people.editor);
  const { manifest, files } = buildDemoScenario();
  const text = new Map(files.map((f) => [f.path, f.text]));
  const all = { q: '', sort: 'name', dir: 'asc', page: 1, pageSize: 200 } as const;

  const instrumentIds = new Map<string, string>();
  const existingInstruments = (await services.instruments.list(seed, { ...all, sort: 'name' })).items;
  for (const i of DEMO_INSTRUMENTS) {
    const kind = i.kind === 'irradiance meter' ? 'irradiance_meter' : 'spectroradiometer';
    const found = existingInstruments.find((x) => x.serial === i.serial && x.kind === kind);
    const instrument =
      found ??
      (await services.instruments.create(seed, {
        kind,
        name: `${i.maker} ${i.model}`,
        serial: i.serial,
        wavelengthRangeNm: i.rangeNm,
        cosineCorrector: kind === 'spectroradiometer' ? 'PTFE diffuser, cosine-corrected' : 'Flat thermopile window',
        calibratedOn: i.calibrationDate,
        calibrationDueOn: addYears(i.calibrationDate, 1),
        calibrationUncertaintyPct: kind === 'spectroradiometer' ? 4.2 : 3,
        notes: 'Demo instrument (fictional).',
      }));
    instrumentIds.set(i.id, instrument.id);
  }

  const makers = (await services.makers.list(seed, all)).items;
  const approved = new Map<string, string>();
  for (const [index, demo] of DEMO_UNITS.entries()) {
    const maker = makers.find((m) => m.name === demo.maker) ?? (await services.makers.create(seed, { name: demo.maker, notes: 'Demo maker (fictional).' }));
    makers.push(maker);
    const models = (await services.models.list(seed, { ...all, sort: 'name', makerId: maker.id })).items;
    const m = manifest.units.find((u) => u.id === demo.id)!;
    const model =
      models.find((x) => x.name === demo.model) ??
      (await services.models.create(seed, {
        makerId: maker.id,
        name: demo.model,
        category: CATEGORY[demo.kind],
        emittingAreaCm: { width: demo.widthCm, height: demo.heightCm },
        ledCount: m.ledCount,
        nominalWavelengths: demo.emitters.map((e) => ({ nm: e.peakNm, sharePct: Math.round(e.powerFraction * 100) })),
        claims: {
          irradianceMwCm2: demo.claimedIrradiance.mwCm2,
          atDistanceCm: demo.claimedIrradiance.distanceCm,
          beamAngleDeg: demo.claimedBeamAngle.angleDeg,
          beamAngleKind: demo.claimedBeamAngle.statesHalfAngle ? 'half' : 'full',
        },
        price: { amountMinor: PRICE_EUR_CENTS[demo.id], currency: 'EUR' },
        powerW: POWER_W[demo.id],
        notes: `Claims as printed: "${demo.claimedIrradiance.wording}", "${demo.claimedBeamAngle.wording}".`,
      }));
    const units = (await services.deviceUnits.list(seed, { ...all, sort: 'serial', modelId: model.id })).items;
    const unit =
      units.find((u) => u.serial === demo.serial) ??
      (await services.deviceUnits.create(seed, { modelId: model.id, serial: demo.serial, obtained: 'bought_retail', receivedOn: '2026-09-21', firmware: null, conditionNotes: 'New, in sealed box.' }));

    const runs = (await services.runs.list(seed, { q: '', sort: 'createdAt', dir: 'asc', page: 1, pageSize: 50, unitId: unit.id })).items;
    if (runs.length > 0) continue;
    const demoRun = manifest.runs.find((r) => r.unitId === demo.id)!;
    const spectra = demoRun.files.map((f) => ({ originalName: f.path.split('/').pop()!, bytes: new TextEncoder().encode(text.get(f.path)!) }));
    const newRun = (instrumentKey: string, notes: string) =>
      services.runs.create(seed, {
        unitId: unit.id,
        instrumentId: instrumentIds.get(instrumentKey)!,
        grid: demoGrid(demo),
        centerChecks: false,
        measuredById: people.tester.id,
        measuredOn: demoRun.measuredOn,
        conditions: { roomTempC: 22.5, warmupMinutes: 10, mainsVoltageV: 230 },
        notes,
      });
    // The unit's reference run, approved: the reports are made of these.
    const run = await newRun(DEMO_RUN_INSTRUMENT[demo.id], 'Demo run: files generated from the LED-array model with instrument noise.');
    await services.runUploads.upload(tester, run.id, spectra, null);
    await analyseNow(services, run.id);
    await moveTo(services, run.id, 'approved', tester, editor);
    approved.set(demo.id, run.id);

    // Re-measurements in the other states of review, so the lab's queues are not empty.
    const again = REMEASURED[demo.id];
    if (again) {
      const second = await newRun(DEMO_RUN_INSTRUMENT[demo.id], 'Demo re-measurement after a firmware update (same files, for the demo).');
      await services.runUploads.upload(tester, second.id, spectra, null);
      await analyseNow(services, second.id);
      await moveTo(services, second.id, again, tester, editor);
    }
    if (demo.id === 'corvane-fenwick') {
      // The body panel was also measured with the thermopile meter: a meter run left as a draft.
      const meterRun = await newRun(DEMO_METER_ID, 'Demo meter run: the lab template, one row per grid point.');
      const meterPath = demoRun.meterReadings.path;
      await services.runUploads.upload(tester, meterRun.id, [{ originalName: meterPath.split('/').pop()!, bytes: new TextEncoder().encode(text.get(meterPath)!) }], null);
      await analyseNow(services, meterRun.id);
    }
  }
  await seedDemoReports(services, approved, editor);
}

/** The seed does the worker's job itself, so the demo opens on analysed runs (the queued jobs find them done). */
async function analyseNow(services: Services, runId: string): Promise<void> {
  const worker = systemCaller('worker');
  const readings = await services.readings.list(worker, runId);
  const fileIds = new Set<string>();
  for (const r of readings) if (r.file) fileIds.add(r.file.id);
  const run = await services.runs.record(worker, runId);
  if (run.instrumentKind === 'irradiance_meter') {
    // A meter file fills its points only once analysed: find it among the run's uploads.
    for (const id of await services.readings.fileIds(worker, runId)) fileIds.add(id);
  }
  for (const id of fileIds) await services.runProcessing.processFile(worker, id);
  await services.runProcessing.analyzeRun(worker, runId);
}

/** Second runs of some units, and where each stops in review. */
const REMEASURED: Record<string, 'submitted' | 'changes_requested' | 'draft'> = {
  'aldermoor-tarn': 'submitted',
  'norrow-holt': 'changes_requested',
  'quenby-mere': 'draft',
};

async function moveTo(services: Services, runId: string, state: 'approved' | 'submitted' | 'changes_requested' | 'draft', tester: Caller, editor: Caller): Promise<void> {
  if (state === 'draft') return;
  await services.runs.transition(tester, runId, 'submit', undefined);
  if (state === 'submitted') return;
  if (state === 'changes_requested') {
    const readings = await services.readings.list(editor, runId);
    const edge = readings.find((r) => r.slot === 'grid' && r.distanceCm === 15 && r.yCm === 0 && r.xCm > 0 && r.xCm < 50);
    await services.runs.addComment(editor, runId, { body: 'This reading sits below its neighbours; check the rail position and measure it again.', readingId: edge?.id ?? null });
    await services.runs.transition(editor, runId, 'request_changes', 'Re-measure the flagged reading at 15 cm before approval.');
    return;
  }
  await services.runs.transition(editor, runId, 'approve', 'Figures checked against the raw files.');
}

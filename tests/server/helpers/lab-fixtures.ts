import type request from 'supertest';
import { buildDemoScenario, demoGrid } from '#seeds/demo/scenario.ts';
import { DEMO_UNITS } from '#seeds/demo/catalog.ts';

type Agent = ReturnType<typeof request.agent>;

/** The demo scenario, built once per test file (deterministic for its seed). */
let scenario: ReturnType<typeof buildDemoScenario> | null = null;
export function demoScenario() {
  scenario ??= buildDemoScenario();
  return scenario;
}

/** The demo spectrum files of one demo unit's run, as name + bytes. */
export function demoRunFiles(unitIndex = 0): { name: string; bytes: Buffer }[] {
  const { manifest, files } = demoScenario();
  const run = manifest.runs[unitIndex];
  const text = new Map(files.map((f) => [f.path, f.text]));
  return run.files.map((f) => ({ name: f.path.split('/').pop()!, bytes: Buffer.from(text.get(f.path)!, 'utf8') }));
}

/** A maker, model, unit and spectroradiometer made through the API as a tester would. */
export async function makeCatalog(agent: Agent, origin: string, unitIndex = 0, suffix = '') {
  const demo = DEMO_UNITS[unitIndex];
  const post = async (path: string, body: object) => {
    const res = await agent.post(path).set('Origin', origin).send(body);
    if (res.status !== 201) throw new Error(`${path}: ${res.status} ${JSON.stringify(res.body)}`);
    return res.body;
  };
  const { maker } = await post('/api/lab/makers', { name: `${demo.maker}${suffix}` });
  const { model } = await post('/api/lab/models', {
    makerId: maker.id,
    name: demo.model,
    category: 'panel',
    emittingAreaCm: { width: demo.widthCm, height: demo.heightCm },
    claims: { irradianceMwCm2: demo.claimedIrradiance.mwCm2, atDistanceCm: demo.claimedIrradiance.distanceCm, beamAngleDeg: demo.claimedBeamAngle.angleDeg, beamAngleKind: 'full' },
  });
  const { unit } = await post('/api/lab/units', { modelId: model.id, serial: `${demo.serial}${suffix}` });
  const { instrument } = await post('/api/lab/instruments', {
    kind: 'spectroradiometer',
    name: `Bench spectroradiometer${suffix}`,
    serial: `BS-${unitIndex}${suffix}`,
    calibratedOn: '2026-01-10',
    calibrationDueOn: '2027-01-10',
    calibrationUncertaintyPct: 3.5,
  });
  return { maker, model, unit, instrument, grid: demoGrid(demo) };
}

/** Polls the run until every reading is analysed and the figures are current (bounded wait). */
export async function waitForAnalysis(agent: Agent, runId: string, expectAnalysed: number, timeoutMs = 60_000) {
  const deadline = Date.now() + timeoutMs;
  let last: any = null;
  while (Date.now() < deadline) {
    const res = await agent.get(`/api/lab/runs/${runId}`);
    last = res.body.run?.progress;
    if (last && last.analysed + last.failed >= expectAnalysed && !last.analysing) {
      const analysis = await agent.get(`/api/lab/runs/${runId}/analysis`);
      if (!analysis.body.stale) return { progress: last, analysis: analysis.body };
    }
    await new Promise((r) => setTimeout(r, 200));
  }
  throw new Error(`run ${runId} not analysed within ${timeoutMs} ms; last progress ${JSON.stringify(last)}`);
}

/**
 * An approved run on a small part of the demo body panel's grid (15 and 30 cm, 3 × 3 points),
 * made through the API: catalogue, run, upload, analysis (needs the app's worker), submission by
 * the tester and approval by the editor.
 */
export async function approvedRun(
  t: { origin: string },
  tester: Agent,
  editor: Agent,
  options: { catalog?: Awaited<ReturnType<typeof makeCatalog>>; suffix?: string } = {},
) {
  const catalog = options.catalog ?? (await makeCatalog(tester, t.origin, 0, options.suffix ?? ''));
  const grid = { distancesCm: [15, 30], xCm: [-20, 0, 20], yCm: [-30, 0, 30] };
  const created = await tester.post('/api/lab/runs').set('Origin', t.origin).send({ unitId: catalog.unit.id, instrumentId: catalog.instrument.id, grid });
  if (created.status !== 201) throw new Error(`run: ${created.status} ${JSON.stringify(created.body)}`);
  const runId: string = created.body.run.id;
  const wanted = new Set(grid.distancesCm.flatMap((d) => grid.yCm.flatMap((y) => grid.xCm.map((x) => `d${d}_x${x}_y${y}`))));
  const req = tester.post(`/api/lab/runs/${runId}/files`).set('Origin', t.origin);
  for (const f of demoRunFiles(0).filter((f) => wanted.has(f.name.replace(/\.[a-z]+$/, '')))) req.attach('files', f.bytes, f.name);
  const up = await req;
  if (up.status !== 202 || up.body.accepted.length !== 18) throw new Error(`upload: ${up.status} ${JSON.stringify(up.body)}`);
  await waitForAnalysis(tester, runId, 18);
  const submitted = await tester.post(`/api/lab/runs/${runId}/submit`).set('Origin', t.origin).send({});
  if (submitted.status !== 200) throw new Error(`submit: ${submitted.status} ${JSON.stringify(submitted.body)}`);
  const approved = await editor.post(`/api/lab/runs/${runId}/approve`).set('Origin', t.origin).send({});
  if (approved.status !== 200) throw new Error(`approve: ${approved.status} ${JSON.stringify(approved.body)}`);
  return { runId, catalog };
}

import { execFile } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { promisify } from 'node:util';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { insertUser, makeTestApp, signedInAgent } from './helpers/test-app.ts';
import { demoRunFiles, makeCatalog, waitForAnalysis } from './helpers/lab-fixtures.ts';

const run = promisify(execFile);
const root = join(import.meta.dirname, '..', '..');

describe('a run from upload to approval, against the real queue and worker', () => {
  let t: Awaited<ReturnType<typeof makeTestApp>>;
  let tester: Awaited<ReturnType<typeof signedInAgent>>;
  let measuringEditor: Awaited<ReturnType<typeof signedInAgent>>;
  let reviewer: Awaited<ReturnType<typeof signedInAgent>>;
  let catalog: Awaited<ReturnType<typeof makeCatalog>>;
  let runId: string;
  const files = demoRunFiles(0);

  beforeAll(async () => {
    t = await makeTestApp({}, undefined, { worker: true });
    const u = await insertUser(t.db, 'tester');
    const e1 = await insertUser(t.db, 'editor');
    const e2 = await insertUser(t.db, 'editor');
    tester = await signedInAgent(t.origin, u.email, u.password);
    measuringEditor = await signedInAgent(t.origin, e1.email, e1.password);
    reviewer = await signedInAgent(t.origin, e2.email, e2.password);
    catalog = await makeCatalog(tester, t.origin);
  });
  afterAll(() => t.close());

  const upload = (agent: typeof tester, id: string, batch: { name: string; bytes: Buffer }[], manifest?: string) => {
    const req = agent.post(`/api/lab/runs/${id}/files`).set('Origin', t.origin);
    for (const f of batch) req.attach('files', f.bytes, f.name);
    if (manifest !== undefined) req.attach('manifest', Buffer.from(manifest), 'manifest.csv');
    return req;
  };

  it('creates a draft run with one reading per grid point', async () => {
    const res = await tester.post('/api/lab/runs').set('Origin', t.origin).send({ unitId: catalog.unit.id, instrumentId: catalog.instrument.id, grid: catalog.grid });
    expect(res.status).toBe(201);
    expect(res.body.run).toMatchObject({ status: 'draft', progress: { expected: 135, received: 0, analysed: 0, failed: 0 } });
    runId = res.body.run.id;
  });

  it('stores the 135 demo files in one batch, analyses each once and computes the figures', { timeout: 90_000 }, async () => {
    expect(files).toHaveLength(135);
    const res = await upload(tester, runId, files);
    expect(res.status).toBe(202);
    expect(res.body.accepted).toHaveLength(135);
    expect(res.body.unmatched).toEqual([]);
    expect(res.body.duplicates).toEqual([]);
    const { progress, analysis } = await waitForAnalysis(tester, runId, 135);
    expect(progress).toMatchObject({ expected: 135, received: 135, analysed: 135, failed: 0 });
    expect(await t.db.knex('file_analyses').where({ run_id: runId }).count<{ count: number }[]>('* as count')).toEqual([{ count: 135 }]);
    expect(analysis.planes.map((p: { distanceCm: number }) => p.distanceCm)).toEqual([15, 30, 60]);
    expect(Object.keys(analysis.planes[0].bands).sort()).toEqual(['combined', 'nir', 'red']);
    expect(Object.keys(analysis.falloffExponent).sort()).toEqual(['combined', 'nir', 'red']);
  });

  it('gives the same figures as the bench CLI for the same files, to 1e-9', { timeout: 60_000 }, async () => {
    const dir = mkdtempSync(join(tmpdir(), 'benchlight-run-'));
    try {
      for (const f of files) writeFileSync(join(dir, f.name), f.bytes);
      const w = catalog.model.emittingAreaCm.width;
      const h = catalog.model.emittingAreaCm.height;
      const cli = await run(process.execPath, ['--import', 'tsx', 'scripts/analyze.ts', 'run', '--footprint', `${w}x${h}`, ...files.map((f) => join(dir, f.name))], { cwd: root, maxBuffer: 1 << 24 });
      const expected = JSON.parse(cli.stdout);
      const { body } = await tester.get(`/api/lab/runs/${runId}/analysis`);
      const close = (a: unknown, b: unknown, path: string): void => {
        if (typeof a === 'number' && typeof b === 'number') {
          expect(Math.abs(a - b), path).toBeLessThanOrEqual(1e-9 * Math.max(1, Math.abs(b)));
        } else if (a && b && typeof a === 'object' && typeof b === 'object') {
          expect(Object.keys(a).sort(), path).toEqual(Object.keys(b).sort());
          for (const k of Object.keys(b)) close((a as Record<string, unknown>)[k], (b as Record<string, unknown>)[k], `${path}.${k}`);
        } else {
          expect(a, path).toEqual(b);
        }
      };
      close(body.planes, expected.planes, 'planes');
      close(body.falloffExponent, expected.falloffExponent, 'falloffExponent');
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
  });

  it('recognises the same batch uploaded again and stores nothing twice', async () => {
    const before = await t.db.knex('run_files').where({ run_id: runId }).count<{ count: number }[]>('* as count');
    const res = await upload(tester, runId, files.slice(0, 20));
    expect(res.status).toBe(202);
    expect(res.body.accepted).toEqual([]);
    expect(res.body.duplicates).toHaveLength(20);
    expect(await t.db.knex('run_files').where({ run_id: runId }).count<{ count: number }[]>('* as count')).toEqual(before);
  });

  it('lists files that match no point without storing them, and refuses a manifest that leaves the grid', async () => {
    const stray = await upload(tester, runId, [{ name: 'notes.txt', bytes: Buffer.from('hello') }, { name: 'd15_x999_y0.csv', bytes: files[0].bytes }]);
    expect(stray.status).toBe(202);
    expect(stray.body.unmatched).toEqual(['notes.txt', 'd15_x999_y0.csv']);
    const bad = await upload(tester, runId, [{ name: 'a.csv', bytes: Buffer.from('x') }], 'file,distance_cm,x_cm,y_cm\na.csv,15,0,0\nb.csv,15,12345,0\n');
    expect(bad.status).toBe(422);
    expect(bad.body.error.code).toBe('validation_failed');
    expect(bad.body.error.details).toEqual([expect.objectContaining({ path: 'manifest:3', line: 3 })]);
  });

  it('submits, takes a change request on one reading, a replacement, and an approval by another editor', { timeout: 60_000 }, async () => {
    expect((await tester.post(`/api/lab/runs/${runId}/approve`).set('Origin', t.origin).send({})).status).toBe(403);
    const submitted = await tester.post(`/api/lab/runs/${runId}/submit`).set('Origin', t.origin).send({});
    expect(submitted.status).toBe(200);
    expect(submitted.body.run.status).toBe('submitted');

    const readings = (await reviewer.get(`/api/lab/runs/${runId}/readings`)).body.readings;
    const target = readings.find((r: { distanceCm: number; xCm: number; yCm: number; slot: string }) => r.slot === 'grid' && r.distanceCm === 30 && r.xCm === 0 && r.yCm === 0);
    const comment = await reviewer.post(`/api/lab/runs/${runId}/comments`).set('Origin', t.origin).send({ body: 'This centre reading looks low; measure it again.', readingId: target.id });
    expect(comment.status).toBe(201);
    const sentBack = await reviewer.post(`/api/lab/runs/${runId}/request-changes`).set('Origin', t.origin).send({ note: 'Re-measure the 30 cm centre.' });
    expect(sentBack.body.run.status).toBe('changes_requested');

    // The tester measures the point again: new bytes for the same name replace it; the old stays in history.
    const original = files.find((f) => f.name.startsWith('d30_x0_y0'))!;
    const replacement = { name: original.name, bytes: Buffer.concat([original.bytes, Buffer.from('\n')]) };
    const up = await upload(tester, runId, [replacement]);
    expect(up.body.accepted).toHaveLength(1);
    await waitForAnalysis(tester, runId, 135);
    const again = (await tester.get(`/api/lab/runs/${runId}/readings`)).body.readings.find((r: { id: string }) => r.id === target.id);
    expect(again.state).toBe('analysed');
    expect(again.history).toHaveLength(1);
    expect(again.commentCount).toBe(1);
    expect((await tester.post(`/api/lab/runs/${runId}/submit`).set('Origin', t.origin).send({})).body.run.status).toBe('submitted');

    // An editor who measured the run may not approve it.
    const measured = await measuringEditor.post('/api/lab/runs').set('Origin', t.origin).send({ unitId: catalog.unit.id, instrumentId: catalog.instrument.id, grid: { distancesCm: [15], xCm: [0], yCm: [0] } });
    const ownRun = measured.body.run.id;
    await upload(measuringEditor, ownRun, [{ name: 'd15_x0_y0.csv', bytes: files.find((f) => f.name.startsWith('d15_x0_y0'))!.bytes }]);
    await waitForAnalysis(measuringEditor, ownRun, 1);
    expect((await measuringEditor.post(`/api/lab/runs/${ownRun}/submit`).set('Origin', t.origin).send({})).status).toBe(200);
    const ownApproval = await measuringEditor.post(`/api/lab/runs/${ownRun}/approve`).set('Origin', t.origin).send({});
    expect(ownApproval.status).toBe(403);
    expect(ownApproval.body.error.code).toBe('forbidden');

    const approved = await reviewer.post(`/api/lab/runs/${runId}/approve`).set('Origin', t.origin).send({ note: 'Figures check out.' });
    expect(approved.status).toBe(200);
    expect(approved.body.run.status).toBe('approved');
    const audit = (await reviewer.get(`/api/lab/runs/${runId}/audit`)).body.events;
    expect(audit.map((e: { action: string }) => e.action)).toEqual([
      'run.create', 'run.upload', 'run.submit', 'run.comment', 'run.request_changes', 'run.upload', 'run.submit', 'run.approve',
    ]);
    expect(audit.find((e: { action: string }) => e.action === 'run.request_changes')).toMatchObject({ from: 'submitted', to: 'changes_requested', note: 'Re-measure the 30 cm centre.' });
    expect(audit.at(-1)).toMatchObject({ from: 'submitted', to: 'approved', note: 'Figures check out.' });
  });

  it('lets only one of two simultaneous approvals through', async () => {
    const e3 = await insertUser(t.db, 'editor');
    const e4 = await insertUser(t.db, 'editor');
    const a3 = await signedInAgent(t.origin, e3.email, e3.password);
    const a4 = await signedInAgent(t.origin, e4.email, e4.password);
    const created = await tester.post('/api/lab/runs').set('Origin', t.origin).send({ unitId: catalog.unit.id, instrumentId: catalog.instrument.id, grid: { distancesCm: [15], xCm: [0], yCm: [0] } });
    const id = created.body.run.id;
    await upload(tester, id, [{ name: 'd15_x0_y0.csv', bytes: files.find((f) => f.name.startsWith('d15_x0_y0'))!.bytes }]);
    await waitForAnalysis(tester, id, 1);
    await tester.post(`/api/lab/runs/${id}/submit`).set('Origin', t.origin).send({});
    const [r3, r4] = await Promise.all([
      a3.post(`/api/lab/runs/${id}/approve`).set('Origin', t.origin).send({}),
      a4.post(`/api/lab/runs/${id}/approve`).set('Origin', t.origin).send({}),
    ]);
    expect([r3.status, r4.status].sort()).toEqual([200, 409]);
    const approvals = await t.db.knex('audit_log').where({ entity_id: id, action: 'run.approve' });
    expect(approvals).toHaveLength(1);
  });

  it('refuses to submit with a point missing until it is excluded with a reason', async () => {
    const created = await tester.post('/api/lab/runs').set('Origin', t.origin).send({ unitId: catalog.unit.id, instrumentId: catalog.instrument.id, grid: { distancesCm: [15], xCm: [0, 10], yCm: [0] } });
    const id = created.body.run.id;
    await upload(tester, id, [{ name: 'd15_x0_y0.csv', bytes: files.find((f) => f.name.startsWith('d15_x0_y0'))!.bytes }]);
    await waitForAnalysis(tester, id, 1);
    const early = await tester.post(`/api/lab/runs/${id}/submit`).set('Origin', t.origin).send({});
    expect(early.status).toBe(409);
    expect(early.body.error.message).toMatch(/1 point has no reading/);
    const missing = (await tester.get(`/api/lab/runs/${id}/readings`)).body.readings.find((r: { state: string }) => r.state === 'missing');
    expect((await tester.post(`/api/lab/runs/${id}/readings/${missing.id}/exclude`).set('Origin', t.origin).send({ reason: 'x' })).status).toBe(422);
    expect((await tester.post(`/api/lab/runs/${id}/readings/${missing.id}/exclude`).set('Origin', t.origin).send({ reason: 'Rail blocked at x 10 cm.' })).status).toBe(204);
    expect((await tester.post(`/api/lab/runs/${id}/submit`).set('Origin', t.origin).send({})).status).toBe(200);
    const audit = (await tester.get(`/api/lab/runs/${id}/audit`)).body.events;
    expect(audit.find((e: { action: string }) => e.action === 'reading.exclude')).toMatchObject({ note: 'Rail blocked at x 10 cm.' });
  });
});

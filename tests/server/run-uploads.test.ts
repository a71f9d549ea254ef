import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { insertUser, makeTestApp, signedInAgent } from './helpers/test-app.ts';
import { demoRunFiles, makeCatalog, waitForAnalysis } from './helpers/lab-fixtures.ts';

/** Deterministic pseudo-random bytes (no seed worth keeping secret). */
function noise(n: number, seed = 7): Buffer {
  const b = Buffer.alloc(n);
  let x = seed;
  for (let i = 0; i < n; i++) {
    x = (x * 1103515245 + 12345) >>> 0;
    b[i] = x >>> 24;
  }
  return b;
}

describe('uploads that are wrong in every way a file can be', () => {
  let t: Awaited<ReturnType<typeof makeTestApp>>;
  let tester: Awaited<ReturnType<typeof signedInAgent>>;
  let runId: string;
  const good = demoRunFiles(0).find((f) => f.name.startsWith('d15_x0_y0'))!;

  beforeAll(async () => {
    t = await makeTestApp({}, undefined, { worker: true });
    const u = await insertUser(t.db, 'tester');
    tester = await signedInAgent(t.origin, u.email, u.password);
    const catalog = await makeCatalog(tester, t.origin);
    const res = await tester
      .post('/api/lab/runs')
      .set('Origin', t.origin)
      .send({ unitId: catalog.unit.id, instrumentId: catalog.instrument.id, grid: { distancesCm: [15], xCm: [-20, -10, 0, 10, 20], yCm: [-10, 0, 10] } });
    runId = res.body.run.id;
  });
  afterAll(() => t.close());

  const upload = (files: { name: string; bytes: Buffer }[]) => {
    const req = tester.post(`/api/lab/runs/${runId}/files`).set('Origin', t.origin);
    for (const f of files) req.attach('files', f.bytes, f.name);
    return req;
  };

  it('keeps random bytes, truncated files, very long lines, formula cells and odd encodings, each with its issues, and never answers 500', { timeout: 60_000 }, async () => {
    const text = good.bytes.toString('utf8');
    const utf16 = Buffer.from(`\uFEFF${text}`, 'utf16le');
    const latin = Buffer.from(text.replace('Irradiance (W/m2/nm)', 'Irradiance (µW/cm²/nm)'), 'latin1');
    const files = [
      { name: 'd15_x-20_y-10.csv', bytes: noise(4096) },
      { name: 'd15_x-10_y-10.csv', bytes: good.bytes.subarray(0, Math.floor(good.bytes.length / 3)) },
      { name: 'd15_x0_y-10.csv', bytes: Buffer.from(`Wavelength (nm),Irradiance (W/m2/nm)\n600,${'9'.repeat(1_000_000)}\n`) },
      { name: 'd15_x10_y-10.csv', bytes: Buffer.from('Wavelength (nm),Irradiance (W/m2/nm)\n600,=SUM(A1:A9)\n601,=1+1\n602,@cmd\n') },
      { name: 'd15_x20_y-10.csv', bytes: utf16 },
      { name: 'd15_x-20_y0.csv', bytes: latin },
      { name: 'd15_x-10_y0.csv', bytes: Buffer.alloc(0) },
    ];
    const res = await upload(files);
    expect(res.status).toBe(202);
    expect(res.body.accepted).toHaveLength(files.length);
    await waitForAnalysis(tester, runId, files.length);
    const readings = (await tester.get(`/api/lab/runs/${runId}/readings`)).body.readings as { file: { originalName: string; state: string; issues: { code: string }[] } | null }[];
    const state = (name: string) => readings.find((r) => r.file?.originalName === name)!.file!;
    expect(state('d15_x-20_y-10.csv').state).toBe('failed');
    expect(state('d15_x-20_y-10.csv').issues.length).toBeGreaterThan(0);
    expect(state('d15_x-10_y-10.csv').issues.length).toBeGreaterThan(0);
    expect(state('d15_x0_y-10.csv').state).toBe('failed');
    expect(state('d15_x10_y-10.csv').state).toBe('failed');
    expect(state('d15_x10_y-10.csv').issues.map((i) => i.code)).toContain('formula_cell');
    // UTF-16 with a byte-order mark and Windows-1252 are decoded, not refused.
    expect(state('d15_x20_y-10.csv').state).toBe('analysed');
    expect(state('d15_x-20_y0.csv').state).toBe('analysed');
    expect(state('d15_x-20_y0.csv').issues.map((i) => i.code)).toContain('not_utf8');
    expect(state('d15_x-10_y0.csv').state).toBe('failed');
  });

  it('answers 413 naming the limit for a file over 5 MB, and stores nothing', async () => {
    const before = await t.db.knex('run_files').count<{ count: number }[]>('* as count');
    const res = await upload([{ name: 'd15_x0_y0.csv', bytes: Buffer.alloc(5 * 1024 * 1024 + 10, 0x31) }]);
    expect(res.status).toBe(413);
    expect(res.body.error).toMatchObject({ code: 'payload_too_large', details: { limit: 'fileBytes' } });
    expect(res.body.error.message).toMatch(/5 MB/);
    expect(await t.db.knex('run_files').count<{ count: number }[]>('* as count')).toEqual(before);
  });

  it('answers 413 for more than 2,000 files in one batch', { timeout: 60_000 }, async () => {
    const files = Array.from({ length: 2001 }, (_, i) => ({ name: `f${i}.csv`, bytes: Buffer.from('x') }));
    const res = await upload(files);
    expect(res.status).toBe(413);
    expect(res.body.error.details).toMatchObject({ limit: 'files', max: 2000 });
  });

  it('answers 413 for a batch that declares more than 200 MB, before reading it', async () => {
    const res = await tester
      .post(`/api/lab/runs/${runId}/files`)
      .set('Origin', t.origin)
      .set('Content-Type', 'multipart/form-data; boundary=x')
      .set('Content-Length', String(300 * 1024 * 1024))
      .send('--x--')
      .ok(() => true)
      .catch((err: { response?: { status: number; body: unknown } }) => err.response!);
    expect(res.status).toBe(413);
  });

  it('answers 422 for a file in a field of another name', async () => {
    const res = await tester.post(`/api/lab/runs/${runId}/files`).set('Origin', t.origin).attach('attachment', good.bytes, 'd15_x0_y0.csv');
    expect(res.status).toBe(422);
  });

  it('refuses uploads to a run under review', async () => {
    await t.db.knex('runs').where({ id: runId }).update({ status: 'submitted' });
    const res = await upload([good]);
    expect(res.status).toBe(409);
    await t.db.knex('runs').where({ id: runId }).update({ status: 'draft' });
  });
});

import { spawn, type ChildProcess } from 'node:child_process';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { insertUser, makeTestApp, signedInAgent } from './helpers/test-app.ts';
import { demoRunFiles, makeCatalog, waitForAnalysis } from './helpers/lab-fixtures.ts';

const root = join(import.meta.dirname, '..', '..');

/** The real worker process (npm run worker) against the test database. */
function startWorker(): { child: ChildProcess; output: () => string } {
  let output = '';
  const child = spawn(process.execPath, ['--import', 'tsx', join(root, 'server', 'worker.ts')], {
    cwd: root,
    env: { ...process.env, DATABASE_URL: inject('databaseUrl'), LOG_LEVEL: 'warn', NODE_ENV: 'test' },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  child.stdout?.on('data', (d) => (output += d));
  child.stderr?.on('data', (d) => (output += d));
  return { child, output: () => output };
}

async function until(what: string, test: () => Promise<boolean>, timeoutMs: number, stepMs = 20) {
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    if (await test()) return;
    await new Promise((r) => setTimeout(r, stepMs));
  }
  throw new Error(`timed out waiting for ${what}`);
}

describe('a worker killed mid-run', () => {
  let t: Awaited<ReturnType<typeof makeTestApp>>;
  const workers: ChildProcess[] = [];

  beforeAll(async () => {
    t = await makeTestApp();
  });
  afterAll(async () => {
    for (const w of workers) if (w.exitCode === null && w.signalCode === null) w.kill('SIGTERM');
    await t.close();
  });

  it('is restarted and the run finishes with every reading analysed exactly once', { timeout: 180_000 }, async () => {
    const u = await insertUser(t.db, 'tester');
    const tester = await signedInAgent(t.origin, u.email, u.password);
    const catalog = await makeCatalog(tester, t.origin);
    const created = await tester.post('/api/lab/runs').set('Origin', t.origin).send({ unitId: catalog.unit.id, instrumentId: catalog.instrument.id, grid: catalog.grid });
    const runId = created.body.run.id;
    const req = tester.post(`/api/lab/runs/${runId}/files`).set('Origin', t.origin);
    const files = demoRunFiles(0);
    for (const f of files) req.attach('files', f.bytes, f.name);
    expect((await req).status).toBe(202);

    const analysed = async () => Number((await t.db.knex('file_analyses').where({ run_id: runId }).count<{ count: number }[]>('* as count'))[0].count);
    const first = startWorker();
    workers.push(first.child);
    await until('the first analysis', async () => (await analysed()) > 0, 60_000);
    first.child.kill('SIGKILL');
    await new Promise((r) => first.child.once('exit', r));
    const atKill = await analysed();
    expect(atKill, 'killed before the run was done').toBeLessThan(files.length);

    const second = startWorker();
    workers.push(second.child);
    const { progress } = await waitForAnalysis(tester, runId, files.length, 150_000).catch((err: Error) => {
      throw new Error(`${err.message}\nworker output:\n${second.output()}`);
    });
    expect(progress).toMatchObject({ expected: 135, received: 135, analysed: 135, failed: 0 });
    // One analysis per file: the primary key refuses a second, so a count equal to the files is exactly once.
    expect(await analysed()).toBe(files.length);
    const distinct = await t.db.knex('file_analyses').where({ run_id: runId }).countDistinct<{ count: number }[]>('run_file_id as count');
    expect(Number(distinct[0].count)).toBe(files.length);
    second.child.kill('SIGTERM');
    await new Promise((r) => second.child.once('exit', r));
  });
});

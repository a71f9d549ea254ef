/**
 * Upload benchmark: `npm run bench:upload`.
 * On a database of its own (benchlight_bench), with the real web server and the real worker as
 * child processes on 127.0.0.1: a tester uploads the demo generator's 135 files of one run in one
 * batch; the time from the upload's answer to the run fully analysed (every file analysed and the
 * run's figures current) is measured. Then ten runs of 135 files (1,350 files) are uploaded at once
 * and timed the same way. Prints the figures and whether the 10 s target for one run is met; never
 * fails the build.
 */
import { spawn, type ChildProcess } from 'node:child_process';
import { readFileSync } from 'node:fs';
import path from 'node:path';
import { connect } from '#server/connect.ts';
import { systemCaller } from '#server/core/caller.ts';
import { buildDemoScenario, demoGrid } from '#seeds/demo/scenario.ts';
import { DEMO_UNITS } from '#seeds/demo/catalog.ts';
import { freshDatabase } from './lib/fresh-database.ts';
import { knexCli, ROOT } from './lib/run-step.ts';
import { freePort } from './lib/free-port.ts';

const TARGET_S = 10;
const SCALE = 10;

function child(file: string, env: Record<string, string>): ChildProcess {
  const c = spawn(process.execPath, ['--import', 'tsx', path.join(ROOT, 'server', file)], { cwd: ROOT, env: { ...process.env, ...env }, stdio: ['ignore', 'pipe', 'pipe'] });
  c.stderr?.on('data', (d) => process.stderr.write(d));
  return c;
}

/** Peak resident memory of a process so far, MB (Linux /proc; null elsewhere). */
function peakRssMb(pid: number | undefined): number | null {
  try {
    const m = /VmHWM:\s+(\d+) kB/.exec(readFileSync(`/proc/${pid}/status`, 'utf8'));
    return m ? Number(m[1]) / 1024 : null;
  } catch {
    return null;
  }
}

async function main() {
  const databaseUrl = await freshDatabase('benchlight_bench', process.env.BENCH_DATABASE_URL);
  knexCli('Migrate the benchmark database', ['migrate:latest'], databaseUrl);
  const app = await connect({ databaseUrl });
  const seed = systemCaller('seed');
  const tester = await app.services.users.create(seed, { email: 'bench@lab.test', displayName: 'Bench tester', role: 'tester', password: 'bench-password-long' });
  const demo = DEMO_UNITS[0];
  const maker = await app.services.makers.create(seed, { name: demo.maker });
  const model = await app.services.models.create(seed, { makerId: maker.id, name: demo.model, category: 'panel', emittingAreaCm: { width: demo.widthCm, height: demo.heightCm } });
  const instrument = await app.services.instruments.create(seed, {
    kind: 'spectroradiometer', name: 'Bench spectroradiometer', serial: 'BENCH-1', calibratedOn: '2026-01-01', calibrationDueOn: '2027-01-01', calibrationUncertaintyPct: 4,
  });
  const units: { id: string }[] = [];
  for (let i = 0; i < SCALE; i++) units.push(await app.services.deviceUnits.create(seed, { modelId: model.id, serial: `BENCH-${i + 1}`, obtained: 'bought_retail' }));

  const { manifest, files } = buildDemoScenario();
  const text = new Map(files.map((f) => [f.path, f.text]));
  const runFiles = manifest.runs[0].files.map((f) => ({ name: f.path.split('/').pop()!, bytes: text.get(f.path)! }));

  const port = await freePort();
  // Production requires the payment keys; nothing measured here pays, so placeholders do.
  const env = {
    DATABASE_URL: databaseUrl, PORT: String(port), HOST: '127.0.0.1', LOG_LEVEL: 'warn', NODE_ENV: 'production', SERVE_CLIENT: 'false',
    PAYMENTS_SECRET_KEY: 'sk_test_benchmark_never_used', PAYMENTS_WEBHOOK_SECRET: 'whsec_benchmark_never_used',
  };
  const server = child('main.ts', env);
  const worker = child('worker.ts', env);
  const base = `http://127.0.0.1:${port}`;
  try {
    for (let i = 0; i < 100; i++) {
      try {
        if ((await fetch(`${base}/api/health`)).ok) break;
      } catch {
        // starting
      }
      await new Promise((r) => setTimeout(r, 200));
    }
    const signIn = await fetch(`${base}/api/auth/sign-in`, { method: 'POST', headers: { 'Content-Type': 'application/json', Origin: base }, body: JSON.stringify({ email: tester.email, password: 'bench-password-long' }) });
    const cookie = (signIn.headers.get('set-cookie') ?? '').split(';')[0];
    const headers = { Cookie: cookie, Origin: base };

    const createRun = async (unitId: string) => {
      const res = await fetch(`${base}/api/lab/runs`, { method: 'POST', headers: { ...headers, 'Content-Type': 'application/json' }, body: JSON.stringify({ unitId, instrumentId: instrument.id, grid: demoGrid(demo) }) });
      return ((await res.json()) as { run: { id: string } }).run.id;
    };
    const upload = async (runId: string) => {
      const form = new FormData();
      for (const f of runFiles) form.append('files', new Blob([f.bytes]), f.name);
      const res = await fetch(`${base}/api/lab/runs/${runId}/files`, { method: 'POST', headers, body: form });
      if (res.status !== 202) throw new Error(`upload answered ${res.status}: ${await res.text()}`);
    };
    const analysed = async (runId: string) => {
      const run = ((await (await fetch(`${base}/api/lab/runs/${runId}`, { headers })).json()) as { run: { progress: { analysed: number; failed: number; expected: number; analysing: boolean } } }).run;
      const p = run.progress;
      return p.analysed + p.failed === p.expected && !p.analysing;
    };
    const until = async (runIds: string[]) => {
      const started = performance.now();
      for (;;) {
        const done = await Promise.all(runIds.map(analysed));
        if (done.every(Boolean)) return (performance.now() - started) / 1000;
        if (performance.now() - started > 600_000) throw new Error('not analysed within 10 minutes');
        await new Promise((r) => setTimeout(r, 100));
      }
    };

    const one = await createRun(units[0].id);
    let t0 = performance.now();
    await upload(one);
    const uploadS = (performance.now() - t0) / 1000;
    const oneS = await until([one]);

    const many = await Promise.all(units.map((u) => createRun(u.id)));
    t0 = performance.now();
    await Promise.all(many.map(upload));
    const manyUploadS = (performance.now() - t0) / 1000;
    const manyS = await until(many);

    const line = (label: string, value: string) => console.log(`${label.padEnd(44)}${value}`);
    console.log(`Benchlight upload benchmark (Node ${process.version}, web server and worker on 127.0.0.1)`);
    line('one run', `${runFiles.length} spectrum files, ${(runFiles.reduce((s, f) => s + f.bytes.length, 0) / 1e6).toFixed(1)} MB`);
    line('  upload (request to 202 answer)', `${uploadS.toFixed(2)} s`);
    line('  upload finished → fully analysed', `${oneS.toFixed(2)} s (target < ${TARGET_S} s) ${oneS < TARGET_S ? 'met' : 'NOT met'}`);
    line('  files analysed per second', `${(runFiles.length / oneS).toFixed(0)}`);
    line(`${SCALE}× (${SCALE} runs uploaded at once)`, `${runFiles.length * SCALE} spectrum files`);
    line('  uploads (all 202 answers)', `${manyUploadS.toFixed(2)} s`);
    line('  last upload → every run fully analysed', `${manyS.toFixed(2)} s (${((runFiles.length * SCALE) / manyS).toFixed(0)} files/s)`);
    line('peak RSS: web server, worker', `${peakRssMb(server.pid)?.toFixed(0) ?? '?'} MB, ${peakRssMb(worker.pid)?.toFixed(0) ?? '?'} MB`);
  } finally {
    server.kill('SIGTERM');
    worker.kill('SIGTERM');
    await app.close();
  }
}

main().catch((err: unknown) => {
  console.error(err instanceof Error ? err.stack : String(err));
  process.exitCode = 1;
});

/**
 * Web budgets: `npm run bench:web`.
 * On a database of its own (benchlight_bench_web) with the demo data, the built client and the
 * real server as a child process on 127.0.0.1:
 *  1. page weight: Chromium opens the home page and the reports index and every script the page
 *     loads (entry and lazy chunks alike, until the network is idle) is gzipped and counted;
 *     budget 200 kB each;
 *  2. the public report API under 50 concurrent connections (autocannon) for a fixed time,
 *     p95 latency measured from every response; budget 50 ms;
 *  3. the same JSON served as a static file by express.static in a process of its own, under the
 *     same load, and the ratio of the two.
 * Prints the figures and whether the budgets are met; never fails the build.
 * BENCH_DATABASE_URL uses a database as it is; BENCH_SKIP_BUILD=1 keeps an existing dist/.
 */
import { spawn, type ChildProcess } from 'node:child_process';
import { existsSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { gzipSync } from 'node:zlib';
import autocannon from 'autocannon';
import { chromium } from 'playwright-core';
import { ensureChromium } from './lib/chromium.ts';
import { freshDatabase } from './lib/fresh-database.ts';
import { buildClient, knexCli, ROOT, seedDemoData } from './lib/run-step.ts';
import { freePort } from './lib/free-port.ts';

const PAGE_BUDGET_KB = 200;
const P95_BUDGET_MS = 50;
const CONNECTIONS = 50;
const DURATION_S = Number(process.env.BENCH_DURATION_S ?? 10);

function startChild(args: string[], env: Record<string, string>): ChildProcess {
  const c = spawn(process.execPath, args, { cwd: ROOT, env: { ...process.env, ...env }, stdio: ['ignore', 'ignore', 'pipe'] });
  c.stderr?.on('data', (d) => process.stderr.write(d));
  return c;
}

async function waitFor(url: string): Promise<void> {
  for (let i = 0; i < 200; i++) {
    try {
      if ((await fetch(url)).ok) return;
    } catch {
      // still starting
    }
    await new Promise((r) => setTimeout(r, 100));
  }
  throw new Error(`${url} did not answer within 20 s`);
}

interface PageWeight {
  path: string;
  gzipKb: number;
  rawKb: number;
  scripts: { name: string; gzipKb: number }[];
}

async function pageWeights(base: string, paths: string[]): Promise<PageWeight[]> {
  const profile = mkdtempSync(path.join(os.tmpdir(), 'benchlight-bench-chromium-'));
  const context = await chromium.launchPersistentContext(profile, {
    executablePath: ensureChromium(),
    args: ['--headless', '--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync'],
  });
  try {
    const out: PageWeight[] = [];
    for (const p of paths) {
      const page = await context.newPage();
      // A fresh page with the HTTP cache off, so each page counts everything it needs.
      const cdp = await context.newCDPSession(page);
      await cdp.send('Network.setCacheDisabled', { cacheDisabled: true });
      const pending: Promise<{ name: string; raw: number; gz: number }>[] = [];
      page.on('response', (res) => {
        if (res.request().resourceType() !== 'script') return;
        pending.push(res.body().then((b) => ({ name: new URL(res.url()).pathname, raw: b.length, gz: gzipSync(b, { level: 9 }).length })));
      });
      await page.goto(`${base}${p}`, { waitUntil: 'networkidle' });
      const scripts = await Promise.all(pending);
      await page.close();
      const kb = (n: number) => Math.round((n / 1024) * 10) / 10;
      out.push({
        path: p,
        gzipKb: kb(scripts.reduce((s, x) => s + x.gz, 0)),
        rawKb: kb(scripts.reduce((s, x) => s + x.raw, 0)),
        scripts: scripts.map((x) => ({ name: x.name, gzipKb: kb(x.gz) })).sort((a, b) => b.gzipKb - a.gzipKb),
      });
    }
    return out;
  } finally {
    await context.close();
    rmSync(profile, { recursive: true, force: true });
  }
}

interface LoadFigures {
  requests: number;
  non2xx: number;
  perSecond: number;
  p50: number;
  p95: number;
  p99: number;
}

/** autocannon for DURATION_S with CONNECTIONS; percentiles from every response's own time. */
async function load(url: string): Promise<LoadFigures> {
  // Warm-up: connections, caches and the JIT, not counted.
  await autocannon({ url, connections: 10, amount: 200 });
  const times: number[] = [];
  const result = await new Promise<autocannon.Result>((resolve, reject) => {
    const instance = autocannon({ url, connections: CONNECTIONS, duration: DURATION_S }, (err, r) => (err ? reject(err) : resolve(r)));
    instance.on('response', (_client, _status, _bytes, ms) => times.push(ms));
  });
  times.sort((a, b) => a - b);
  const q = (p: number) => Math.round(times[Math.min(times.length - 1, Math.floor(p * times.length))] * 10) / 10;
  return { requests: times.length, non2xx: result.non2xx, perSecond: Math.round(result.requests.average), p50: q(0.5), p95: q(0.95), p99: q(0.99) };
}

async function main() {
  const databaseUrl = await freshDatabase('benchlight_bench_web', process.env.BENCH_DATABASE_URL);
  knexCli('Migrate the benchmark database', ['migrate:latest'], databaseUrl);
  seedDemoData('Seed the demo data', databaseUrl);
  if (process.env.BENCH_SKIP_BUILD !== '1' || !existsSync(path.join(ROOT, 'dist', 'index.html'))) buildClient();

  const port = await freePort();
  const base = `http://127.0.0.1:${port}`;
  // Production requires the payment keys; nothing measured here pays, so placeholders do.
  const server = startChild(['--import', 'tsx', path.join(ROOT, 'server', 'main.ts')], {
    DATABASE_URL: databaseUrl, PORT: String(port), HOST: '127.0.0.1', LOG_LEVEL: 'warn', NODE_ENV: 'production', SERVE_CLIENT: 'true',
    PAYMENTS_SECRET_KEY: 'sk_test_benchmark_never_used', PAYMENTS_WEBHOOK_SECRET: 'whsec_benchmark_never_used',
  });
  const staticDir = mkdtempSync(path.join(os.tmpdir(), 'benchlight-bench-static-'));
  let staticServer: ChildProcess | null = null;
  try {
    await waitFor(`${base}/api/health`);
    console.log('\n▶ Page weight (every script a page loads, gzipped)');
    const weights = await pageWeights(base, ['/', '/reports']);
    for (const w of weights) {
      console.log(`  ${w.path.padEnd(10)} ${w.gzipKb.toFixed(1)} kB gzipped (${w.rawKb.toFixed(1)} kB raw) · budget ${PAGE_BUDGET_KB} kB · ${w.gzipKb <= PAGE_BUDGET_KB ? 'met' : 'NOT met'}`);
      for (const s of w.scripts) console.log(`      ${s.gzipKb.toFixed(1).padStart(6)} kB  ${s.name}`);
    }

    const list = (await (await fetch(`${base}/api/public/reports`)).json()) as { reports: { slug: string }[] };
    const slug = list.reports[0]?.slug;
    if (!slug) throw new Error('The demo has no published report to load.');
    const apiUrl = `${base}/api/public/reports/${slug}`;
    const body = await (await fetch(apiUrl)).text();
    writeFileSync(path.join(staticDir, 'report.json'), body);

    const staticPort = await freePort();
    const staticScript = `import express from 'express'; const app = express(); app.use(express.static(${JSON.stringify(staticDir)})); app.listen(${staticPort}, '127.0.0.1');`;
    staticServer = startChild(['--input-type=module', '-e', staticScript], {});
    await waitFor(`http://127.0.0.1:${staticPort}/report.json`);

    console.log(`\n▶ Report API under load: ${CONNECTIONS} connections for ${DURATION_S} s (${(body.length / 1024).toFixed(1)} kB of JSON)`);
    const api = await load(apiUrl);
    const fixed = await load(`http://127.0.0.1:${staticPort}/report.json`);
    const row = (label: string, f: LoadFigures) =>
      console.log(`  ${label.padEnd(22)} p50 ${f.p50} ms · p95 ${f.p95} ms · p99 ${f.p99} ms · ${f.perSecond} req/s · ${f.requests} answers, ${f.non2xx} not 2xx`);
    row(`GET ${'/api/public/reports/:slug'}`, api);
    row('same JSON, static file', fixed);
    console.log(`  p95 budget ${P95_BUDGET_MS} ms: ${api.p95 < P95_BUDGET_MS ? 'met' : 'NOT met'}`);
    console.log(`  ratio to the static file: p95 × ${(api.p95 / fixed.p95).toFixed(2)}, throughput × ${(api.perSecond / fixed.perSecond).toFixed(2)}`);
  } finally {
    staticServer?.kill('SIGTERM');
    server.kill('SIGTERM');
    rmSync(staticDir, { recursive: true, force: true });
  }
}

main().then(
  () => process.exit(0),
  (err) => {
    console.error(err);
    process.exit(1);
  },
);

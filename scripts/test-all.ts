/**
 * npm test: every test. Starts the project's PostgreSQL (unless DATABASE_URL is set), makes
 * sure Chromium is there for the browser tests, builds the client the browser tests load,
 * then runs all four vitest projects: shared, server, client, browser.
 */
import fs from 'node:fs';
import path from 'node:path';
import { start } from '#server/db/embedded-postgres.ts';
import { ensureChromium } from './lib/chromium.ts';
import { buildClient, ROOT, runStep } from './lib/run-step.ts';

const RESULTS = path.join(ROOT, '.tmp', 'vitest-results.json');

/** One closing line in the plain "N passed, N failed, N skipped" form, from vitest's JSON report. */
function printTotals(): void {
  if (!fs.existsSync(RESULTS)) return;
  const r = JSON.parse(fs.readFileSync(RESULTS, 'utf8')) as { numPassedTests: number; numFailedTests: number; numPendingTests: number; numTodoTests: number };
  console.log(`\nTests: ${r.numPassedTests} passed, ${r.numFailedTests} failed, ${r.numPendingTests + r.numTodoTests} skipped`);
}

async function main() {
  if (!process.env.DATABASE_URL) {
    console.log('▶ PostgreSQL (embedded, 127.0.0.1)');
    await start();
  }
  ensureChromium();
  buildClient('Build the client for the browser tests');
  fs.rmSync(RESULTS, { force: true });
  try {
    runStep('Tests: shared, server, client, browser', process.execPath, [
      'node_modules/vitest/vitest.mjs', 'run', '--reporter=default', '--reporter=json', `--outputFile.json=${RESULTS}`,
      ...process.argv.slice(2),
    ]);
  } finally {
    printTotals();
  }
}

main().catch((err: unknown) => {
  console.error(`\n✖ ${err instanceof Error ? err.message : String(err)}`);
  process.exitCode = 1;
});

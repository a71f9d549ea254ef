/**
 * npm test: every test. Starts the project's PostgreSQL (unless DATABASE_URL is set), makes
 * sure Chromium is there for the browser tests, builds the client the browser tests load,
 * then runs all four vitest projects: shared, server, client, browser.
 */
import { start } from '../server/db/embedded-postgres.ts';
import { ensureChromium } from './lib/chromium.ts';
import { runStep } from './lib/run-step.ts';

async function main() {
  if (!process.env.DATABASE_URL) {
    console.log('▶ PostgreSQL (embedded, 127.0.0.1)');
    await start();
  }
  ensureChromium();
  runStep('Build the client for the browser tests', process.execPath, ['node_modules/vite/bin/vite.js', 'build', '--logLevel', 'warn']);
  runStep('Tests: shared, server, client, browser', process.execPath, ['node_modules/vitest/vitest.mjs', 'run', ...process.argv.slice(2)]);
}

main().catch((err: unknown) => {
  console.error(`\n✖ ${err instanceof Error ? err.message : String(err)}`);
  process.exitCode = 1;
});

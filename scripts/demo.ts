/**
 * npm run demo: the whole app with demo data on this machine. Starts the project's
 * PostgreSQL (unless DATABASE_URL is set), migrates, seeds the demo accounts, writes the demo
 * instrument exports to demo-data/, builds the client and
 * runs the server, which serves both the API and the pages. Ctrl-C stops the server;
 * `npm run db:stop` stops PostgreSQL.
 */
import { spawn } from 'node:child_process';
import path from 'node:path';
import { start } from '#server/db/embedded-postgres.ts';
import { resolveDatabaseUrl } from '#server/db/database-url.ts';
import { DEMO_USERS } from '#seeds/data/demo-users.ts';
import { buildClient, knexCli, runStep, ROOT, seedDemoData } from './lib/run-step.ts';

async function main() {
  if (process.env.NODE_ENV === 'production') throw new Error('The demo does not run with NODE_ENV=production.');
  if (!process.env.DATABASE_URL) {
    console.log('▶ PostgreSQL (embedded, 127.0.0.1)');
    await start();
  }
  const databaseUrl = resolveDatabaseUrl();
  knexCli('Migrate', ['migrate:latest'], databaseUrl);
  seedDemoData('Seed the demo data', databaseUrl);
  runStep('Write the demo exports to demo-data/ (try them with the bench CLI)', process.execPath, [
    '--import', 'tsx', path.join(ROOT, 'scripts', 'make-demo-data.ts'), '--out', path.join(ROOT, 'demo-data'),
  ]);
  buildClient();

  console.log('\nDemo accounts:');
  for (const u of DEMO_USERS) console.log(`  ${u.role.padEnd(7)} ${u.email}  /  ${u.password}`);
  console.log('');
  const server = spawn(process.execPath, ['--import', 'tsx', path.join(ROOT, 'server', 'main.ts')], {
    cwd: ROOT,
    stdio: 'inherit',
    // Request logs stay quiet in the demo unless LOG_LEVEL asks for them.
    env: { ...process.env, SERVE_CLIENT: 'true', DATABASE_URL: databaseUrl, LOG_LEVEL: process.env.LOG_LEVEL ?? 'warn' },
  });
  const forward = (signal: NodeJS.Signals) => server.kill(signal);
  process.on('SIGINT', forward);
  process.on('SIGTERM', forward);
  server.on('exit', (code) => process.exit(code ?? 0));
}

main().catch((err: unknown) => {
  console.error(`\n✖ ${err instanceof Error ? err.message : String(err)}`);
  process.exit(1);
});

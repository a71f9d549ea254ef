import { spawnSync } from 'node:child_process';
import path from 'node:path';

export const ROOT = path.resolve(import.meta.dirname, '..', '..');

/** Runs a command in the project root with inherited output; throws on failure. */
export function runStep(label: string, cmd: string, args: string[], env: Record<string, string | undefined> = {}): void {
  console.log(`\n▶ ${label}`);
  const r = spawnSync(cmd, args, { cwd: ROOT, stdio: 'inherit', env: { ...process.env, ...env } });
  if (r.status !== 0) throw new Error(`${label} failed (exit ${r.status ?? r.signal}).`);
}

/** `knex <args>` under the tsx loader (knex cannot load knexfile.ts by itself). */
export function knexCli(label: string, args: string[], databaseUrl: string): void {
  runStep(label, process.execPath, ['--import', 'tsx', path.join(ROOT, 'node_modules/knex/bin/cli.js'), '--knexfile', path.join(ROOT, 'knexfile.ts'), ...args], {
    DATABASE_URL: databaseUrl,
  });
}

/** `vite build` of the web client into dist/. */
export function buildClient(label = 'Build the web client'): void {
  runStep(label, process.execPath, [path.join(ROOT, 'node_modules/vite/bin/vite.js'), 'build', '--logLevel', 'warn']);
}

/** The demo seed (scripts/seed-demo.ts) against one database. */
export function seedDemoData(label: string, databaseUrl: string): void {
  runStep(label, process.execPath, ['--import', 'tsx', path.join(ROOT, 'scripts', 'seed-demo.ts')], { DATABASE_URL: databaseUrl });
}

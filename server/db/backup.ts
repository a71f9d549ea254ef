/**
 * Whole-database backup and restore with PostgreSQL's own tools (Debian's pg_dump and
 * pg_restore): the custom format, which pg_restore reads back table by table. The job queue's
 * schema is included, so queued work survives a restore.
 */
import { spawnSync } from 'node:child_process';
import fs from 'node:fs';
import path from 'node:path';
import { findServerBinaries } from './embedded-postgres.ts';

/** pg_dump or pg_restore from the newest installed server, else from PATH (a client-only install). */
function tool(name: 'pg_dump' | 'pg_restore'): string {
  const dir = findServerBinaries();
  const inServer = dir ? path.join(dir, name) : null;
  return inServer && fs.existsSync(inServer) ? inServer : name;
}

function run(cmd: string, args: string[]): void {
  const r = spawnSync(cmd, args, { encoding: 'utf8' });
  if (r.error) throw new Error(`${path.basename(cmd)} could not start: ${r.error.message}. Install PostgreSQL's client tools (apt-get install postgresql-client).`);
  if (r.status !== 0) throw new Error(`${path.basename(cmd)} failed (exit ${r.status}):\n${r.stderr}`);
}

/** Writes the database at `databaseUrl` to `file` (custom format). */
export function backupDatabase(databaseUrl: string, file: string): void {
  fs.mkdirSync(path.dirname(path.resolve(file)), { recursive: true });
  run(tool('pg_dump'), ['--format=custom', '--no-owner', '--no-privileges', `--file=${file}`, `--dbname=${databaseUrl}`]);
}

/** Restores `file` into the database at `databaseUrl`, replacing what it holds. */
export function restoreDatabase(databaseUrl: string, file: string): void {
  if (!fs.existsSync(file)) throw new Error(`No backup file at ${file}.`);
  run(tool('pg_restore'), ['--clean', '--if-exists', '--no-owner', '--no-privileges', '--single-transaction', `--dbname=${databaseUrl}`, file]);
}

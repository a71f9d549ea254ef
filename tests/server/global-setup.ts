/**
 * Runs once before the server tests: makes sure PostgreSQL runs, creates the test database
 * and migrates it. Migrations run in a child process because knex loads .ts files only
 * under the tsx loader.
 */
import { execFileSync } from 'node:child_process';
import path from 'node:path';
import type { TestProject } from 'vitest/node';
import { start } from '../../server/db/embedded-postgres.ts';
import { ensureDatabase } from '../../server/db/database-admin.ts';
import { testDatabaseUrl } from './test-database.ts';

declare module 'vitest' {
  export interface ProvidedContext {
    databaseUrl: string;
  }
}

export default async function setup(project: TestProject) {
  if (!process.env.DATABASE_URL && !process.env.TEST_DATABASE_URL) await start(() => {});
  const url = testDatabaseUrl();
  await ensureDatabase(url);
  const root = path.resolve(import.meta.dirname, '..', '..');
  execFileSync(
    process.execPath,
    ['--import', 'tsx', path.join(root, 'node_modules/knex/bin/cli.js'), '--knexfile', path.join(root, 'knexfile.ts'), 'migrate:latest'],
    { cwd: root, env: { ...process.env, DATABASE_URL: url }, stdio: ['ignore', 'ignore', 'inherit'] },
  );
  project.provide('databaseUrl', url);
}

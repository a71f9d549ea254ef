/**
 * Runs once before the server tests: makes sure PostgreSQL runs, creates the test database
 * and migrates it (in a child process: knex loads .ts files only under the tsx loader).
 */
import type { TestProject } from 'vitest/node';
import { start } from '#server/db/embedded-postgres.ts';
import { ensureDatabase } from '#server/db/database-admin.ts';
import { testDatabaseUrl } from './test-database.ts';
import { knexCli } from '#scripts/lib/run-step.ts';

declare module 'vitest' {
  export interface ProvidedContext {
    databaseUrl: string;
  }
}

export default async function setup(project: TestProject) {
  if (!process.env.DATABASE_URL && !process.env.TEST_DATABASE_URL) await start(() => {});
  const url = testDatabaseUrl();
  await ensureDatabase(url);
  knexCli('Migrate the server-test database', ['migrate:latest'], url);
  project.provide('databaseUrl', url);
}

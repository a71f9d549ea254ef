import { execFile } from 'node:child_process';
import path from 'node:path';
import { promisify } from 'node:util';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { DEMO_USERS } from '#seeds/data/demo-users.ts';
import { makeTestApp } from './helpers/test-app.ts';

const run = promisify(execFile);
const root = path.resolve(import.meta.dirname, '..', '..');

function seed(env: Record<string, string>) {
  return run(
    process.execPath,
    ['--import', 'tsx', 'scripts/seed-demo.ts'],
    { cwd: root, env: { ...process.env, DATABASE_URL: inject('databaseUrl'), ...env } },
  );
}

describe('demo seed', () => {
  let t: Awaited<ReturnType<typeof makeTestApp>>;
  beforeAll(async () => {
    t = await makeTestApp();
  });
  afterAll(() => t.close());

  it('refuses to run in production and creates nobody', async () => {
    await expect(seed({ NODE_ENV: 'production' })).rejects.toMatchObject({ stderr: expect.stringMatching(/refuses to run with NODE_ENV=production/) });
    expect(await t.db.knex('users').count<{ count: number }[]>('id as count')).toEqual([{ count: 0 }]);
  }, 60000);

  it('creates one account per role that can sign in, and is safe to run twice', async () => {
    await seed({ NODE_ENV: 'development' });
    await seed({ NODE_ENV: 'development' });
    const users = await t.db.knex('users').select('email', 'role').orderBy('email');
    expect(users).toHaveLength(3);
    for (const u of DEMO_USERS) {
      const res = await t.api().post('/api/auth/sign-in').set('Origin', t.origin).send({ email: u.email, password: u.password });
      expect(res.status, u.email).toBe(200);
      expect(res.body.user.role).toBe(u.role);
    }
  }, 60000);
});

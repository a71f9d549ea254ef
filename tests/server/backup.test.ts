import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { backupDatabase, restoreDatabase } from '#server/db/backup.ts';
import { dropDatabase, ensureDatabase } from '#server/db/database-admin.ts';
import { withDatabase } from '#server/db/database-url.ts';
import { insertUser, makeTestApp, signedInAgent } from './helpers/test-app.ts';
import { approvedRun } from './helpers/lab-fixtures.ts';

describe('backup and restore with pg_dump and pg_restore', () => {
  let t: Awaited<ReturnType<typeof makeTestApp>>;
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'benchlight-backup-'));
  const restoredUrl = withDatabase(inject('databaseUrl'), 'benchlight_restore_check');

  beforeAll(async () => {
    t = await makeTestApp({}, undefined, { worker: true });
  });
  afterAll(async () => {
    await t.close();
    await dropDatabase(restoredUrl);
    fs.rmSync(dir, { recursive: true, force: true });
  });

  it('restores a backup into a fresh database that serves the identical public report', { timeout: 180_000 }, async () => {
    const u = await insertUser(t.db, 'tester');
    const e = await insertUser(t.db, 'editor');
    const tester = await signedInAgent(t.origin, u.email, u.password);
    const editor = await signedInAgent(t.origin, e.email, e.password);
    const { runId } = await approvedRun(t, tester, editor);
    const created = await editor.post('/api/lab/reports').set('Origin', t.origin).send({ runIds: [runId], title: 'Backed-up report', summary: 'A report that must survive a backup and a restore.', bodyMarkdown: '## Body' });
    await editor.post(`/api/lab/reports/${created.body.report.id}/publish`).set('Origin', t.origin).send({});
    const slug = created.body.report.slug;
    const before = (await t.api().get(`/api/public/reports/${slug}`)).body;
    const beforeCsv = (await t.api().get(`/api/public/reports/${slug}/readings.csv`)).text;

    const file = path.join(dir, 'benchlight.dump');
    backupDatabase(inject('databaseUrl'), file);
    expect(fs.statSync(file).size).toBeGreaterThan(1000);
    await dropDatabase(restoredUrl);
    await ensureDatabase(restoredUrl);
    restoreDatabase(restoredUrl, file);

    const restored = await makeTestApp({}, restoredUrl);
    try {
      const after = (await restored.api().get(`/api/public/reports/${slug}`)).body;
      // The citation carries the serving host's address; everything else must be identical.
      expect({ ...after.report, citation: '' }).toEqual({ ...before.report, citation: '' });
      expect((await restored.api().get(`/api/public/reports/${slug}/readings.csv`)).text).toBe(beforeCsv);
      expect((await restored.api().get('/api/public/reports')).body).toEqual((await t.api().get('/api/public/reports')).body);
    } finally {
      await restored.close();
    }
  });
});

import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import pino from 'pino';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createApp } from '#server/app.ts';
import { loadConfig } from '#server/config.ts';
import { publicReportSchema } from '#shared/schemas/reports.ts';
import { insertUser, makeTestApp, signedInAgent } from './helpers/test-app.ts';
import { approvedRun, makeCatalog } from './helpers/lab-fixtures.ts';

describe('reports: publication, versions, retraction, and what the public may see', () => {
  let t: Awaited<ReturnType<typeof makeTestApp>>;
  let tester: Awaited<ReturnType<typeof signedInAgent>>;
  let editor: Awaited<ReturnType<typeof signedInAgent>>;
  let runs: { runId: string }[];

  beforeAll(async () => {
    t = await makeTestApp({}, undefined, { worker: true });
    const u = await insertUser(t.db, 'tester');
    const e = await insertUser(t.db, 'editor');
    tester = await signedInAgent(t.origin, u.email, u.password);
    editor = await signedInAgent(t.origin, e.email, e.password);
    const first = await approvedRun(t, tester, editor);
    // A second unit of the same model, for a report over two units.
    const unit2 = await tester.post('/api/lab/units').set('Origin', t.origin).send({ modelId: first.catalog.model.id, serial: 'SECOND-UNIT' });
    const second = await approvedRun(t, tester, editor, { catalog: { ...first.catalog, unit: unit2.body.unit } });
    runs = [first, second];
  }, 180_000);
  afterAll(() => t.close());

  const post = (path: string, body: object = {}) => editor.post(path).set('Origin', t.origin).send(body);

  it('refuses a report over a run that is not approved (409) and one from a tester (403)', async () => {
    const catalog = await makeCatalog(tester, t.origin, 1, '-draft');
    const draftRun = await tester.post('/api/lab/runs').set('Origin', t.origin).send({ unitId: catalog.unit.id, instrumentId: catalog.instrument.id, grid: { distancesCm: [15], xCm: [0], yCm: [0] } });
    const res = await post('/api/lab/reports', { runIds: [draftRun.body.run.id], title: 'Not yet', summary: 'A draft run cannot be reported.', bodyMarkdown: '' });
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe('conflict');
    const byTester = await tester.post('/api/lab/reports').set('Origin', t.origin).send({ runIds: [runs[0].runId], title: 'Mine', summary: 'A tester cannot publish reports.' });
    expect(byTester.status).toBe(403);
  });

  it('keeps a draft private on every public route, publishes it, then serves version 1', async () => {
    const created = await post('/api/lab/reports', {
      runIds: runs.map((r) => r.runId),
      title: 'Test panel over two units',
      summary: 'Two units of the test panel, measured at 15 and 30 cm.',
      bodyMarkdown: '## Findings\n\nBright and even. <script>alert(1)</script><img src=x onerror="alert(2)"> [a link](javascript:alert(3)) <p style="color:red">styled</p>',
    });
    expect(created.status).toBe(201);
    expect(created.body.report).toMatchObject({ status: 'draft', version: 0 });
    const { id, slug } = created.body.report;
    for (const path of [`/api/public/reports/${slug}`, `/api/public/reports/${slug}/versions/1`, `/api/public/reports/${slug}/readings.csv`, `/api/public/reports/${slug}/figures.json`, `/api/public/reports/${slug}/versions/1/figures.json`, `/api/public/reports/${slug}/versions/1/readings.csv`]) {
      expect((await t.api().get(path)).status, path).toBe(404);
    }
    expect((await t.api().get('/api/public/reports')).body.reports).toEqual([]);
    expect(await t.services.publicReports.linkPreview(slug)).toBeNull();
    expect((await t.api().get('/feed.xml')).text).not.toContain(slug);
    expect((await t.api().get('/sitemap.xml')).text).not.toContain(slug);
    // An approved run is not public either: only reports are.
    expect((await t.api().get(`/api/public/runs/${runs[0].runId}`)).status).toBe(404);

    const preview = await editor.get(`/api/lab/reports/${id}/preview`);
    expect(preview.status).toBe(200);
    expect(publicReportSchema.parse(preview.body.report).preview).toBe(true);

    const published = await post(`/api/lab/reports/${id}/publish`);
    expect(published.status).toBe(200);
    expect(published.body.report).toMatchObject({ status: 'published', version: 1, slug });
    const pub = await t.api().get(`/api/public/reports/${slug}`);
    expect(pub.status).toBe(200);
    const report = publicReportSchema.parse(pub.body.report);
    expect(report.version).toBe(1);
    expect(report.units.map((u) => u.serial)).toHaveLength(2);
    expect(report.unitSpread?.length).toBeGreaterThan(0);
    // The preview showed exactly these figures.
    expect(preview.body.report.planes).toEqual(report.planes);
    // Sanitised: no script, no event handler, no javascript: link, no inline style.
    expect(report.bodyHtml).toContain('<h2>Findings</h2>');
    expect(report.bodyHtml).not.toMatch(/<script|onerror|javascript:|style=/i);
    // The runs move to "published".
    expect((await editor.get(`/api/lab/runs/${runs[0].runId}`)).body.run.status).toBe('published');
    const runAudit = (await editor.get(`/api/lab/runs/${runs[0].runId}/audit`)).body.events;
    expect(runAudit.at(-1)).toMatchObject({ action: 'run.publish', from: 'approved', to: 'published' });
  });

  it('answers with an ETag and 304 to If-None-Match, and a short max-age', async () => {
    const list = await t.api().get('/api/public/reports');
    expect(list.headers['cache-control']).toMatch(/max-age=60/);
    const etag = list.headers.etag;
    expect(etag).toBeTruthy();
    const again = await t.api().get('/api/public/reports').set('If-None-Match', etag);
    expect(again.status).toBe(304);
  });

  it('publishes a correction as version 2 with its note; version 1 stays readable; the feed lists both', async () => {
    const { id, slug } = (await editor.get('/api/lab/reports')).body.reports[0];
    const corrected = await post(`/api/lab/reports/${id}/corrections`, { changeNote: 'Fixed the summary: the test was at 15 and 30 cm only.', summary: 'Two units of the test panel, measured at 15 and 30 cm only.' });
    expect(corrected.status).toBe(200);
    expect(corrected.body.report.version).toBe(2);
    const latest = (await t.api().get(`/api/public/reports/${slug}`)).body.report;
    expect(latest.version).toBe(2);
    expect(latest.changeNote).toBe('Fixed the summary: the test was at 15 and 30 cm only.');
    expect(latest.versions.map((v: { version: number }) => v.version)).toEqual([1, 2]);
    const v1 = (await t.api().get(`/api/public/reports/${slug}/versions/1`)).body.report;
    expect(v1.version).toBe(1);
    expect(v1.summary).toBe('Two units of the test panel, measured at 15 and 30 cm.');
    expect(v1.latestVersion).toBe(2);
    const feed = (await t.api().get('/feed.xml')).text;
    expect(feed).toContain(`/reports/${slug}/versions/1</id>`);
    expect(feed).toContain(`/reports/${slug}/versions/2</id>`);
    expect(feed).toContain('Corrected (version 2)');
  });

  it('puts the report\'s own title, description and social-card tags into index.html for its page', async () => {
    const { slug, title } = (await t.api().get('/api/public/reports')).body.reports[0];
    const clientDir = mkdtempSync(join(tmpdir(), 'benchlight-client-'));
    writeFileSync(join(clientDir, 'index.html'), '<!doctype html><html><head><meta name="description" content="The site." /><title>Benchlight</title></head><body><div id="root"></div></body></html>');
    const app = createApp({
      config: loadConfig({ NODE_ENV: 'test', LOG_LEVEL: 'silent', SERVE_CLIENT: 'true', PUBLIC_BASE_URL: 'https://bench.example' }),
      db: t.db,
      mailer: { send: async () => {} },
      clock: { now: () => new Date() },
      queue: t.queue,
      logger: pino({ level: 'silent' }),
      clientDir,
    });
    const page = await request(app).get(`/reports/${slug}`);
    expect(page.status).toBe(200);
    expect(page.text).toContain(`<title>${title} · Benchlight</title>`);
    expect(page.text).toContain(`<meta property="og:title" content="${title}" />`);
    expect(page.text).toContain('<meta property="og:description" content="Two units of the test panel, measured at 15 and 30 cm only." />');
    expect(page.text).toContain(`<meta property="og:url" content="https://bench.example/reports/${slug}" />`);
    expect(page.text).toContain('<meta name="twitter:card" content="summary" />');
    // The site-wide description is replaced, not repeated.
    expect(page.text.match(/name="description"/g)).toHaveLength(1);
    const v1 = await request(app).get(`/reports/${slug}/versions/1`);
    expect(v1.text).toContain(`content="https://bench.example/reports/${slug}/versions/1"`);
    // A slug with no published report gets the plain page (the public service answers drafts as unknown).
    const hidden = await request(app).get('/reports/no-such-report');
    expect(hidden.status).toBe(200);
    expect(hidden.text).toContain('<title>Benchlight</title>');
    expect(hidden.text).not.toContain('og:title');
  });

  it('serves the readings as CSV with units in the column names, the figures as JSON, and the sitemap', async () => {
    const { slug } = (await t.api().get('/api/public/reports')).body.reports[0];
    const csv = await t.api().get(`/api/public/reports/${slug}/readings.csv`);
    expect(csv.headers['content-type']).toMatch(/text\/csv/);
    const [header, ...rows] = csv.text.trim().split('\n');
    expect(header).toBe('distance_cm,x_cm,y_cm,red_mw_cm2,nir_mw_cm2,combined_mw_cm2,unit_serial');
    expect(rows).toHaveLength(36);
    const report = (await t.api().get(`/api/public/reports/${slug}`)).body.report;
    const centre = rows.map((r) => r.split(',')).find((c) => c[0] === '15' && c[1] === '0' && c[2] === '0')!;
    expect(Number(centre[5])).toBeCloseTo(report.planes[0].bands.combined.centerMwCm2, 6);
    const figures = await t.api().get(`/api/public/reports/${slug}/figures.json`);
    expect(figures.body.units.irradiance).toMatch(/mW\/cm²/);
    expect(figures.body.citation).toContain(`/reports/${slug}/versions/2`);
    const v1Figures = await t.api().get(`/api/public/reports/${slug}/versions/1/figures.json`);
    expect(v1Figures.body.report.version).toBe(1);
    expect(v1Figures.body.citation).toContain(`/reports/${slug}/versions/1`);
    expect((await t.api().get('/sitemap.xml')).text).toContain(`/reports/${slug}</loc>`);
  });

  it('retracts with a reason: the page stays with the reason, the index drops it, the audit keeps every step', async () => {
    const { id, slug } = (await editor.get('/api/lab/reports')).body.reports.find((r: { status: string }) => r.status === 'published');
    expect((await post(`/api/lab/reports/${id}/retract`, { reason: 'short' })).status).toBe(422);
    const res = await post(`/api/lab/reports/${id}/retract`, { reason: 'The bench fixture tilted the panel by several degrees.' });
    expect(res.body.report.status).toBe('retracted');
    const page = (await t.api().get(`/api/public/reports/${slug}`)).body.report;
    expect(page.retracted).toMatchObject({ reason: 'The bench fixture tilted the panel by several degrees.' });
    expect((await t.api().get('/api/public/reports')).body.reports.map((r: { slug: string }) => r.slug)).not.toContain(slug);
    const actions = (await t.db.knex('audit_log').where({ entity_type: 'report', entity_id: id }).orderBy('id')).map((r) => r.action);
    expect(actions).toEqual(['report.create', 'report.publish', 'report.correct', 'report.retract']);
  });
});

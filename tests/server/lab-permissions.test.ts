import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { can, type Capability, type Role } from '#shared/auth/capabilities.ts';
import { catalogRoutes } from '#server/routes/catalog-routes.ts';
import { runsRoutes } from '#server/routes/runs-routes.ts';
import { reportsRoutes } from '#server/routes/reports-routes.ts';
import { insertUser, makeTestApp, signedInAgent } from './helpers/test-app.ts';

/** Every /api/lab route and the capability it needs. The test below proves the list is complete. */
const MATRIX: [method: 'get' | 'post' | 'patch', path: string, capability: Capability][] = [
  ['get', '/lab/makers', 'lab.enter'],
  ['post', '/lab/makers', 'catalog.manage'],
  ['get', '/lab/makers/:id', 'lab.enter'],
  ['patch', '/lab/makers/:id', 'catalog.manage'],
  ['get', '/lab/models', 'lab.enter'],
  ['post', '/lab/models', 'catalog.manage'],
  ['get', '/lab/models/:id', 'lab.enter'],
  ['patch', '/lab/models/:id', 'catalog.manage'],
  ['get', '/lab/units', 'lab.enter'],
  ['post', '/lab/units', 'catalog.manage'],
  ['get', '/lab/units/:id', 'lab.enter'],
  ['patch', '/lab/units/:id', 'catalog.manage'],
  ['get', '/lab/instruments', 'lab.enter'],
  ['post', '/lab/instruments', 'catalog.manage'],
  ['get', '/lab/instruments/:id', 'lab.enter'],
  ['patch', '/lab/instruments/:id', 'catalog.manage'],
  ['get', '/lab/runs', 'lab.enter'],
  ['post', '/lab/runs', 'runs.create'],
  ['get', '/lab/review', 'runs.review'],
  ['get', '/lab/runs/:id', 'lab.enter'],
  ['patch', '/lab/runs/:id', 'runs.upload'],
  ['post', '/lab/runs/:id/files', 'runs.upload'],
  ['get', '/lab/runs/:id/files/:fileId', 'lab.enter'],
  ['get', '/lab/runs/:id/readings', 'lab.enter'],
  ['get', '/lab/runs/:id/readings/:readingId/spectrum', 'lab.enter'],
  ['post', '/lab/runs/:id/readings/:readingId/exclude', 'runs.upload'],
  ['post', '/lab/runs/:id/readings/:readingId/include', 'runs.upload'],
  ['get', '/lab/runs/:id/analysis', 'lab.enter'],
  ['post', '/lab/runs/:id/submit', 'runs.upload'],
  ['post', '/lab/runs/:id/request-changes', 'runs.review'],
  ['post', '/lab/runs/:id/approve', 'runs.review'],
  ['get', '/lab/runs/:id/audit', 'lab.enter'],
  ['get', '/lab/runs/:id/comments', 'lab.enter'],
  ['post', '/lab/runs/:id/comments', 'runs.upload'],
  ['get', '/lab/reports', 'lab.enter'],
  ['post', '/lab/reports', 'reports.publish'],
  ['get', '/lab/reports/:id', 'lab.enter'],
  ['patch', '/lab/reports/:id', 'reports.publish'],
  ['get', '/lab/reports/:id/preview', 'reports.publish'],
  ['post', '/lab/reports/:id/publish', 'reports.publish'],
  ['post', '/lab/reports/:id/corrections', 'reports.publish'],
  ['post', '/lab/reports/:id/retract', 'reports.publish'],
];

/** The routes the lab routers really register (method + path), read from Express's own table. */
function registeredRoutes(): string[] {
  const unused = new Proxy({}, { get: () => ({}) }) as never;
  const out: string[] = [];
  for (const router of [catalogRoutes(unused), runsRoutes(unused), reportsRoutes(unused)]) {
    for (const layer of (router as unknown as { stack: { route?: { path: string; methods: Record<string, boolean> } }[] }).stack) {
      if (!layer.route) continue;
      for (const m of Object.keys(layer.route.methods)) out.push(`${m} ${layer.route.path}`);
    }
  }
  return out.sort();
}

describe('permissions of every /api/lab route', () => {
  let t: Awaited<ReturnType<typeof makeTestApp>>;
  const agents: Partial<Record<Role, Awaited<ReturnType<typeof signedInAgent>>>> = {};

  beforeAll(async () => {
    t = await makeTestApp();
    for (const role of ['tester', 'editor', 'admin'] as const) {
      const u = await insertUser(t.db, role);
      agents[role] = await signedInAgent(t.origin, u.email, u.password);
    }
  });
  afterAll(() => t.close());

  it('covers every route the lab routers register', () => {
    expect(MATRIX.map(([m, p]) => `${m} ${p}`).sort()).toEqual(registeredRoutes());
  });

  const concrete = (path: string) => `/api${path.replace(':id', 'no-such-run').replace(':readingId', 'no-such-reading').replace(':fileId', 'no-such-file')}`;

  for (const [method, path, capability] of MATRIX) {
    it(`${method.toUpperCase()} ${path}: 401 signed out, 403 without ${capability}, through with it`, async () => {
      const url = concrete(path);
      const anonymous = await t.api()[method](url).set('Origin', t.origin).send({});
      expect(anonymous.status, 'anonymous').toBe(401);
      for (const role of ['tester', 'editor', 'admin'] as const) {
        const res = await agents[role]![method](url).set('Origin', t.origin).send({});
        if (can(role, capability)) expect([401, 403], `${role} may ${capability}`).not.toContain(res.status);
        else {
          expect(res.status, `${role} lacks ${capability}`).toBe(403);
          expect(res.body.error.code).toBe('forbidden');
        }
      }
    });
  }

  it('keeps the lab API out of the public one', async () => {
    for (const path of ['/api/public/runs', '/api/public/lab/runs', '/api/public/makers', '/api/public/instruments']) {
      expect((await t.api().get(path)).status, path).toBe(404);
    }
  });
});

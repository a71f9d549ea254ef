import net from 'node:net';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { makeTestApp } from './helpers/test-app.ts';

/**
 * A TCP relay between the app and PostgreSQL that can be cut and restored, so the test sees
 * the database vanish and return (as with `npm run db:stop` / `db:start`) without stopping the
 * cluster the other tests use.
 */
function relay(target: { host: string; port: number }) {
  const sockets = new Set<net.Socket>();
  let server: net.Server | null = null;
  let port = 0;
  const open = () =>
    new Promise<number>((resolve) => {
      server = net.createServer((client) => {
        const upstream = net.connect(target);
        for (const s of [client, upstream]) {
          sockets.add(s);
          s.on('close', () => sockets.delete(s));
          s.on('error', () => s.destroy());
        }
        client.pipe(upstream).pipe(client);
      });
      server.listen(port, '127.0.0.1', () => {
        port = (server!.address() as net.AddressInfo).port;
        resolve(port);
      });
    });
  const cut = () =>
    new Promise<void>((resolve) => {
      for (const s of sockets) s.destroy();
      server!.close(() => resolve());
    });
  return { open, cut };
}

describe('/api/health follows the database without a restart', () => {
  const target = new URL(inject('databaseUrl'));
  const link = relay({ host: target.hostname, port: Number(target.port) });
  let t: Awaited<ReturnType<typeof makeTestApp>>;

  beforeAll(async () => {
    const port = await link.open();
    const viaRelay = new URL(target);
    viaRelay.port = String(port);
    t = await makeTestApp({}, viaRelay.toString());
  });
  afterAll(async () => {
    await t.close();
    await link.cut();
  });

  it('answers ok, then 503 while PostgreSQL is unreachable, then ok again', async () => {
    expect((await t.api().get('/api/health')).body).toEqual({ status: 'ok', db: 'ok' });

    await link.cut();
    const down = await t.api().get('/api/health');
    expect(down.status).toBe(503);
    expect(down.body).toEqual({ status: 'degraded', db: 'down' });
    // Other endpoints answer with the database_unavailable code rather than crashing.
    const me = await t.api().get('/api/me').set('Cookie', 'benchlight_session=whatever');
    expect(me.status).toBe(503);
    expect(me.body.error.code).toBe('database_unavailable');

    await link.open();
    await expect.poll(async () => (await t.api().get('/api/health')).status, { timeout: 10000, interval: 200 }).toBe(200);
  });
});

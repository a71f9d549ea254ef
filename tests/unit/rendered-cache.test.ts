import { createHash } from 'node:crypto';
import { describe, expect, it } from 'vitest';
import { createRenderedCache } from '#server/services/rendered-cache.ts';

describe('rendered cache for public answers', () => {
  it('renders once per key, with an ETag that is the SHA-1 of the body (Node crypto computes the check)', async () => {
    const cache = createRenderedCache();
    let renders = 0;
    const render = async () => ({ n: ++renders });
    const a = await cache.get('k1', render);
    const b = await cache.get('k1', render);
    expect(b).toBe(a);
    expect(renders).toBe(1);
    expect(a.body).toBe('{"n":1}');
    expect(a.etag).toBe(`"${createHash('sha1').update('{"n":1}').digest('base64url')}"`);
    const c = await cache.get('k2', render);
    expect(c.body).toBe('{"n":2}');
    expect(c.etag).not.toBe(a.etag);
  });

  it('drops the least recently used entry beyond its size', async () => {
    const cache = createRenderedCache(2);
    let renders = 0;
    const render = async () => ++renders;
    await cache.get('a', render);
    await cache.get('b', render);
    await cache.get('a', render); // a is now the most recent
    await cache.get('c', render); // b goes
    expect(cache.size).toBe(2);
    expect((await cache.get('a', render)).body).toBe('1');
    expect((await cache.get('b', render)).body).toBe('4');
  });
});

import { createHash } from 'node:crypto';

/** A JSON answer serialised once, with its ETag. */
export interface Rendered {
  body: string;
  etag: string;
}

/**
 * Public answers rendered once per state of the data and kept (least recently used first out).
 * A published version never changes, so a key made of the report's id, version, status and
 * last change is enough: any change makes a new key and the old entry simply ages out. Each
 * request still reads the report's row, so several server processes never serve stale data.
 */
export function createRenderedCache(maxEntries = 500) {
  const entries = new Map<string, Rendered>();
  return {
    async get(key: string, render: () => Promise<unknown>): Promise<Rendered> {
      const hit = entries.get(key);
      if (hit) {
        entries.delete(key);
        entries.set(key, hit);
        return hit;
      }
      const body = JSON.stringify(await render());
      const rendered = { body, etag: `"${createHash('sha1').update(body).digest('base64url')}"` };
      entries.set(key, rendered);
      if (entries.size > maxEntries) entries.delete(entries.keys().next().value as string);
      return rendered;
    },
    get size() {
      return entries.size;
    },
  };
}
export type RenderedCache = ReturnType<typeof createRenderedCache>;

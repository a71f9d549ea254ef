import type { z } from 'zod';
import type { ListPage } from '#shared/schemas/list-query.ts';
import { api } from './api-client.ts';

/** `q=…&sort=…`: every set value of a list query, in a stable order (empty ones left out). */
export function listSearchString(query: object): string {
  const params = new URLSearchParams();
  for (const [key, value] of Object.entries(query).sort(([a], [b]) => a.localeCompare(b))) {
    if (value === undefined || value === null || value === '') continue;
    params.set(key, String(value));
  }
  return params.toString();
}

/**
 * GET one page of a server-side list (`{ items, total, page, pageSize }`), its query in the
 * search string, the answer parsed with the list's shared schema.
 */
export function getList<T>(path: string, query: object, schema: z.ZodType<ListPage<T>>, signal?: AbortSignal): Promise<ListPage<T>> {
  const search = listSearchString(query);
  return api.get(search ? `${path}?${search}` : path, schema, signal);
}

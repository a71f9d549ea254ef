import { useCallback, useMemo } from 'react';
import { useSearchParams } from 'react-router-dom';

/**
 * A server-side list's state (search, sort, page, filters) kept in the URL's search params, so a
 * table can be shared and reloaded as it was, and the back button walks through its states.
 * The list's shared zod schema (shared/schemas/list-query.ts) reads the params: its defaults fill
 * what the URL leaves out, and a value it refuses (a hand-edited or stale link) is dropped.
 */

export type SortDir = 'asc' | 'desc';

/** What every list query of the API holds. */
export interface ListQueryBase {
  q: string;
  sort: string;
  dir: SortDir;
  page: number;
  pageSize: number;
}

const BASE_KEYS: readonly string[] = ['q', 'sort', 'dir', 'page', 'pageSize'];

/** The list's own filters: whatever its schema adds to the base (makerId, category, kind…). */
export type ListFilterKey<Q extends ListQueryBase> = Exclude<keyof Q, keyof ListQueryBase> & string;

/** The part of a zod object schema read here: its field names and a parse. */
export interface ListQuerySchemaLike<Q extends ListQueryBase> {
  shape: Record<string, unknown>;
  safeParse(value: unknown): { success: true; data: Q } | { success: false; error: { issues: ReadonlyArray<{ path: readonly PropertyKey[] }> } };
  parse(value: unknown): Q;
}

export interface ListSearchOptions {
  /** Prefixes every param (`runs.sort`) when two lists share one page. */
  prefix?: string;
}

/** Reads a list's query from search params; never throws. */
export function readListQuery<Q extends ListQueryBase>(
  params: URLSearchParams,
  schema: ListQuerySchemaLike<Q>,
  { prefix = '' }: ListSearchOptions = {},
): Q {
  const raw: Record<string, string> = {};
  for (const key of Object.keys(schema.shape)) {
    const value = params.get(prefix + key);
    if (value !== null && value !== '') raw[key] = value;
  }
  const first = schema.safeParse(raw);
  if (first.success) return first.data;
  for (const issue of first.error.issues) delete raw[String(issue.path[0])];
  const second = schema.safeParse(raw);
  return second.success ? second.data : schema.parse({});
}

/**
 * Writes `query` into a copy of `params`. Values equal to the schema's defaults are left out, so
 * a plain list has a plain address; params of other lists and of the page (`tab`) are kept.
 */
export function writeListQuery<Q extends ListQueryBase>(
  params: URLSearchParams,
  query: Partial<Q>,
  schema: ListQuerySchemaLike<Q>,
  { prefix = '' }: ListSearchOptions = {},
): URLSearchParams {
  const defaults = schema.parse({}) as unknown as Record<string, unknown>;
  const next = new URLSearchParams(params);
  for (const key of Object.keys(schema.shape)) {
    const value = (query as Record<string, unknown>)[key];
    if (value === undefined || value === null || value === '' || value === defaults[key]) next.delete(prefix + key);
    else next.set(prefix + key, String(value));
  }
  return next;
}

export interface ListSearch<Q extends ListQueryBase> {
  /** The parsed query, defaults filled in: send it to the API as it is. */
  query: Q;
  /** Any change other than the page itself goes back to page 1. */
  update: (patch: Partial<Q>, options?: { replace?: boolean }) => void;
  setSearch: (q: string) => void;
  setSort: (sort: Q['sort'], dir: SortDir) => void;
  setPage: (page: number) => void;
  setPageSize: (pageSize: number) => void;
  setFilter: <K extends ListFilterKey<Q>>(key: K, value: Q[K] | undefined) => void;
  /** Clears the search and every filter; keeps the sort and page size. */
  clearSearch: () => void;
  /** Back to the schema's defaults (keeps params that are not this list's). */
  reset: () => void;
}

/** The list state of one table, read from and written to the URL (each change is a history entry). */
export function useListSearchParams<Q extends ListQueryBase>(
  schema: ListQuerySchemaLike<Q>,
  options: ListSearchOptions = {},
): ListSearch<Q> {
  const [params, setParams] = useSearchParams();
  const prefix = options.prefix ?? '';
  const query = useMemo(() => readListQuery(params, schema, { prefix }), [params, schema, prefix]);

  const update = useCallback(
    (patch: Partial<Q>, { replace = false }: { replace?: boolean } = {}) => {
      setParams(
        (prev) => {
          const current = readListQuery(prev, schema, { prefix });
          const merged: Q = { ...current, ...patch };
          if (!('page' in patch)) merged.page = 1;
          return writeListQuery(prev, merged, schema, { prefix });
        },
        { replace },
      );
    },
    [setParams, schema, prefix],
  );

  return useMemo(
    () => ({
      query,
      update,
      setSearch: (q) => update({ q } as Partial<Q>),
      setSort: (sort, dir) => update({ sort, dir } as Partial<Q>),
      setPage: (page) => update({ page } as Partial<Q>),
      setPageSize: (pageSize) => update({ pageSize } as Partial<Q>),
      setFilter: (key, value) => update({ [key]: value } as unknown as Partial<Q>),
      clearSearch: () => {
        const cleared: Record<string, unknown> = { q: '' };
        for (const key of Object.keys(schema.shape)) if (!BASE_KEYS.includes(key)) cleared[key] = undefined;
        update(cleared as Partial<Q>);
      },
      reset: () =>
        setParams((prev) => {
          const next = new URLSearchParams(prev);
          for (const key of Object.keys(schema.shape)) next.delete(prefix + key);
          return next;
        }),
    }),
    [query, update, setParams, schema, prefix],
  );
}

/** True when the query narrows the list (a search or a filter), for the empty state's wording. */
export function isNarrowed<Q extends ListQueryBase>(query: Q): boolean {
  return Object.entries(query).some(
    ([key, value]) => (key === 'q' || !BASE_KEYS.includes(key)) && value !== undefined && value !== '',
  );
}

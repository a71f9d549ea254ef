import type { Knex } from 'knex';

/** Applies a page to a query and counts the whole result, in one place for every list. */
export async function pageOf<T>(
  query: Knex.QueryBuilder,
  opts: { page: number; pageSize: number },
  map: (row: any) => T,
): Promise<{ items: T[]; total: number; page: number; pageSize: number }> {
  const countRow = await query.clone().clearSelect().clearOrder().count<{ count: number }[]>('* as count').first();
  const rows = await query.offset((opts.page - 1) * opts.pageSize).limit(opts.pageSize);
  return { items: rows.map(map), total: Number(countRow?.count ?? 0), page: opts.page, pageSize: opts.pageSize };
}

/** `%text%` for ILIKE with the pattern characters escaped. */
export function likePattern(text: string): string {
  return `%${text.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
}

export const iso = (v: Date | string | null): string | null => (v === null ? null : new Date(v).toISOString());

/** A DATE column as YYYY-MM-DD, whatever the driver returned. */
export function isoDay(v: Date | string | null): string | null {
  if (v === null) return null;
  if (typeof v === 'string') return v.slice(0, 10);
  const y = v.getFullYear();
  const m = String(v.getMonth() + 1).padStart(2, '0');
  const d = String(v.getDate()).padStart(2, '0');
  return `${y}-${m}-${d}`;
}

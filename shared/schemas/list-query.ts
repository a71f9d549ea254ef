import { z } from 'zod';

/**
 * Server-side sorting, filtering and paging for the lab's tables. The client keeps these in the
 * URL (?sort=name&dir=asc&q=…&page=2), so a table can be shared and reloaded as it was.
 */
export function listQuerySchema<S extends readonly [string, ...string[]]>(sortable: S, defaultSort: S[number]) {
  return z.object({
    q: z.string().trim().max(200).optional().default(''),
    sort: z.enum(sortable).optional().default(defaultSort),
    dir: z.enum(['asc', 'desc']).optional().default('asc'),
    page: z.coerce.number().int().min(1).max(100000).optional().default(1),
    pageSize: z.coerce.number().int().min(1).max(200).optional().default(25),
  });
}

export function listResponseSchema<T extends z.ZodType>(item: T) {
  return z.object({ items: z.array(item), total: z.number().int(), page: z.number().int(), pageSize: z.number().int() });
}

export interface ListPage<T> {
  items: T[];
  total: number;
  page: number;
  pageSize: number;
}

export const idParamsSchema = z.object({ id: z.string().min(1).max(64) });

/** `YYYY-MM-DD`, a real calendar date. */
export const isoDateSchema = z
  .string()
  .regex(/^\d{4}-\d{2}-\d{2}$/, { message: 'Use the form YYYY-MM-DD.' })
  .refine((s) => !Number.isNaN(Date.parse(`${s}T00:00:00Z`)) && new Date(`${s}T00:00:00Z`).toISOString().startsWith(s), {
    message: 'This is not a calendar date.',
  });

/** A number typed in a form or sent as JSON; empty strings become undefined. */
export const optionalNumber = (schema: z.ZodNumber) =>
  z.preprocess((v) => (v === '' || v === null ? undefined : v), z.coerce.number().pipe(schema).optional());

import type { z } from 'zod';
import { validationFailed } from '../core/app-error.ts';

/** Parses a body, query or params with a shared zod schema; 422 with field paths on failure. */
export function parseWith<S extends z.ZodType>(schema: S, value: unknown, where: 'body' | 'query' | 'params' = 'body'): z.infer<S> {
  const result = schema.safeParse(value);
  if (result.success) return result.data;
  throw validationFailed(
    result.error.issues.map((i) => ({
      path: [where, ...i.path.map(String)].join('.'),
      message: i.message,
    })),
  );
}

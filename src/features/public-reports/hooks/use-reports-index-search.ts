import { z } from 'zod';
import { MODEL_CATEGORIES } from '#shared/schemas/models.ts';
import { listQuerySchema } from '#shared/schemas/list-query.ts';
import { useListSearchParams } from '#src/lib/list-search-params.ts';

/** Columns the index sorts by: the id of each column is its name in the URL (?sort=spread50). */
export const INDEX_SORTS = [
  'title',
  'category',
  'maker',
  'model',
  'center15',
  'center30',
  'redShare',
  'spread50',
  'uniformity',
  'measuredOverClaimed',
  'price',
  'date',
] as const;
export type IndexSort = (typeof INDEX_SORTS)[number];

/**
 * The index's state in the URL: sort and direction, category and maker filters, search. The list
 * is small and sorted in the browser, but the address still reloads and shares as it was; the
 * plain address is the newest report first.
 */
export const reportsIndexSearchSchema = listQuerySchema(INDEX_SORTS, 'date').extend({
  dir: z.enum(['asc', 'desc']).optional().default('desc'),
  category: z.enum(MODEL_CATEGORIES).optional(),
  maker: z.string().trim().min(1).max(200).optional(),
});
export type ReportsIndexSearch = z.infer<typeof reportsIndexSearchSchema>;

export function useReportsIndexSearch() {
  return useListSearchParams(reportsIndexSearchSchema);
}

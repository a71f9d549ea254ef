import { queryOptions, useQuery } from '@tanstack/react-query';
import { modelListResponseSchema } from '#shared/schemas/models.ts';
import { getList } from '#src/lib/get-list.ts';

/** The most models one request may list (the schema's page size limit). */
export const MODEL_OPTIONS_LIMIT = 200;

/**
 * The models to choose from in the unit form and the model filter: GET /api/lab/models, shown as
 * "Maker Model" in that order. Its key starts like the models' own, so a new model refreshes it.
 */
export function modelOptionsQueryOptions() {
  return queryOptions({
    queryKey: ['lab', 'models', 'options'] as const,
    queryFn: ({ signal }) =>
      getList('/api/lab/models', { sort: 'maker', dir: 'asc', page: 1, pageSize: MODEL_OPTIONS_LIMIT }, modelListResponseSchema, signal),
    select: (page) => ({
      options: page.items
        .map((m) => ({ value: m.id, label: `${m.makerName} ${m.name}` }))
        .sort((a, b) => a.label.localeCompare(b.label, 'en-GB')),
      truncated: page.total > page.items.length,
    }),
  });
}

export function useModelOptions() {
  return useQuery(modelOptionsQueryOptions());
}

import { useMutation, useQueryClient } from '@tanstack/react-query';
import { modelResponseSchema, type Model, type ModelBody } from '#shared/schemas/models.ts';
import { api } from '#src/lib/api-client.ts';
import { modelsQueryKey } from './get-models.ts';

/** POST /api/lab/models: 201 { model } | 409 conflict (the maker has this name) | 422 validation_failed. */
export async function createModel(body: ModelBody): Promise<Model> {
  const { model } = await api.post('/api/lab/models', body, modelResponseSchema);
  return model;
}

export function useCreateModel() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createModel,
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: modelsQueryKey }),
        // The makers' table counts their models.
        queryClient.invalidateQueries({ queryKey: ['lab', 'makers'] }),
      ]),
  });
}

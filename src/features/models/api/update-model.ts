import { useMutation, useQueryClient } from '@tanstack/react-query';
import { modelResponseSchema, type Model, type ModelPatch } from '#shared/schemas/models.ts';
import { api } from '#src/lib/api-client.ts';
import { modelsQueryKey } from './get-models.ts';

export interface UpdateModelInput {
  id: string;
  changes: ModelPatch;
}

/** PATCH /api/lab/models/:id (the maker cannot change): 200 { model } | 409 conflict | 422 validation_failed. */
export async function updateModel({ id, changes }: UpdateModelInput): Promise<Model> {
  const { model } = await api.patch(`/api/lab/models/${encodeURIComponent(id)}`, changes, modelResponseSchema);
  return model;
}

export function useUpdateModel() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateModel,
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: modelsQueryKey }),
        // Units show their model's name.
        queryClient.invalidateQueries({ queryKey: ['lab', 'deviceUnits'] }),
      ]),
  });
}

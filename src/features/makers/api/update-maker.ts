import { useMutation, useQueryClient } from '@tanstack/react-query';
import { makerResponseSchema, type Maker, type MakerPatch } from '#shared/schemas/makers.ts';
import { api } from '#src/lib/api-client.ts';
import { makersQueryKey } from './get-makers.ts';

export interface UpdateMakerInput {
  id: string;
  changes: MakerPatch;
}

/** PATCH /api/lab/makers/:id: 200 { maker } | 409 conflict (name taken) | 422 validation_failed. */
export async function updateMaker({ id, changes }: UpdateMakerInput): Promise<Maker> {
  const { maker } = await api.patch(`/api/lab/makers/${encodeURIComponent(id)}`, changes, makerResponseSchema);
  return maker;
}

export function useUpdateMaker() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateMaker,
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: makersQueryKey }),
        // Models and units show their maker's name.
        queryClient.invalidateQueries({ queryKey: ['lab', 'models'] }),
        queryClient.invalidateQueries({ queryKey: ['lab', 'deviceUnits'] }),
      ]),
  });
}

import { useMutation, useQueryClient } from '@tanstack/react-query';
import { makerResponseSchema, type Maker, type MakerBody } from '#shared/schemas/makers.ts';
import { api } from '#src/lib/api-client.ts';
import { makersQueryKey } from './get-makers.ts';

/** POST /api/lab/makers: 201 { maker } | 409 conflict (name taken) | 422 validation_failed. */
export async function createMaker(body: MakerBody): Promise<Maker> {
  const { maker } = await api.post('/api/lab/makers', body, makerResponseSchema);
  return maker;
}

export function useCreateMaker() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createMaker,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: makersQueryKey }),
  });
}

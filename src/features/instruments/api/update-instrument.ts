import { useMutation, useQueryClient } from '@tanstack/react-query';
import { instrumentResponseSchema, type Instrument, type InstrumentPatch } from '#shared/schemas/instruments.ts';
import { api } from '#src/lib/api-client.ts';
import { instrumentsQueryKey } from './get-instruments.ts';

export interface UpdateInstrumentInput {
  id: string;
  changes: InstrumentPatch;
}

/** PATCH /api/lab/instruments/:id (the kind cannot change): 200 { instrument } | 409 conflict | 422 validation_failed. */
export async function updateInstrument({ id, changes }: UpdateInstrumentInput): Promise<Instrument> {
  const { instrument } = await api.patch(`/api/lab/instruments/${encodeURIComponent(id)}`, changes, instrumentResponseSchema);
  return instrument;
}

export function useUpdateInstrument() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateInstrument,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: instrumentsQueryKey }),
  });
}

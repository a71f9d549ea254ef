import { useMutation, useQueryClient } from '@tanstack/react-query';
import { instrumentResponseSchema, type Instrument, type InstrumentBody } from '#shared/schemas/instruments.ts';
import { api } from '#src/lib/api-client.ts';
import { instrumentsQueryKey } from './get-instruments.ts';

/** POST /api/lab/instruments: 201 { instrument } | 409 conflict (serial taken) | 422 validation_failed. */
export async function createInstrument(body: InstrumentBody): Promise<Instrument> {
  const { instrument } = await api.post('/api/lab/instruments', body, instrumentResponseSchema);
  return instrument;
}

export function useCreateInstrument() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createInstrument,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: instrumentsQueryKey }),
  });
}

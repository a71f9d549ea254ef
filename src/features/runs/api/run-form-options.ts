import { useQuery } from '@tanstack/react-query';
import { deviceUnitListResponseSchema } from '#shared/schemas/device-units.ts';
import { instrumentListResponseSchema } from '#shared/schemas/instruments.ts';
import { api } from '#src/lib/api-client.ts';

/** The units and instruments a new run can use (the lab holds dozens, not thousands). */
export function useRunFormOptions() {
  const units = useQuery({
    queryKey: ['lab', 'units', 'all'],
    queryFn: ({ signal }) => api.get('/api/lab/units?sort=maker&pageSize=200', deviceUnitListResponseSchema, signal),
  });
  const instruments = useQuery({
    queryKey: ['lab', 'instruments', 'all'],
    queryFn: ({ signal }) => api.get('/api/lab/instruments?sort=name&pageSize=200', instrumentListResponseSchema, signal),
  });
  return { units, instruments };
}

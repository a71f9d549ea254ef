import { useMutation, useQueryClient } from '@tanstack/react-query';
import { deviceUnitResponseSchema, type DeviceUnit, type DeviceUnitBody } from '#shared/schemas/device-units.ts';
import { api } from '#src/lib/api-client.ts';
import { deviceUnitsQueryKey } from './get-device-units.ts';

/** POST /api/lab/units: 201 { unit } | 409 conflict (serial taken) | 422 validation_failed. */
export async function createDeviceUnit(body: DeviceUnitBody): Promise<DeviceUnit> {
  const { unit } = await api.post('/api/lab/units', body, deviceUnitResponseSchema);
  return unit;
}

export function useCreateDeviceUnit() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createDeviceUnit,
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: deviceUnitsQueryKey }),
        // The models' table counts their units.
        queryClient.invalidateQueries({ queryKey: ['lab', 'models'] }),
      ]),
  });
}

import { useMutation, useQueryClient } from '@tanstack/react-query';
import { deviceUnitResponseSchema, type DeviceUnit, type DeviceUnitPatch } from '#shared/schemas/device-units.ts';
import { api } from '#src/lib/api-client.ts';
import { deviceUnitsQueryKey } from './get-device-units.ts';

export interface UpdateDeviceUnitInput {
  id: string;
  changes: DeviceUnitPatch;
}

/** PATCH /api/lab/units/:id (the model cannot change): 200 { unit } | 409 conflict | 422 validation_failed. */
export async function updateDeviceUnit({ id, changes }: UpdateDeviceUnitInput): Promise<DeviceUnit> {
  const { unit } = await api.patch(`/api/lab/units/${encodeURIComponent(id)}`, changes, deviceUnitResponseSchema);
  return unit;
}

export function useUpdateDeviceUnit() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateDeviceUnit,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: deviceUnitsQueryKey }),
  });
}

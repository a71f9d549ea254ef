import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { deviceUnitListResponseSchema, type DeviceUnitListQuery } from '#shared/schemas/device-units.ts';
import { getList } from '#src/lib/get-list.ts';

/** Every units query starts with this key, so one invalidation refreshes them all. */
export const deviceUnitsQueryKey = ['lab', 'deviceUnits'] as const;

/** GET /api/lab/units: one page, sorted, searched and filtered (model) on the server. */
export function getDeviceUnits(query: DeviceUnitListQuery, signal?: AbortSignal) {
  return getList('/api/lab/units', query, deviceUnitListResponseSchema, signal);
}

export function deviceUnitsQueryOptions(query: DeviceUnitListQuery) {
  return queryOptions({
    queryKey: [...deviceUnitsQueryKey, 'list', query],
    queryFn: ({ signal }) => getDeviceUnits(query, signal),
    placeholderData: keepPreviousData,
  });
}

export function useDeviceUnits(query: DeviceUnitListQuery) {
  return useQuery(deviceUnitsQueryOptions(query));
}

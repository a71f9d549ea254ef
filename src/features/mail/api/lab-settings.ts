import { queryOptions, useQuery } from '@tanstack/react-query';
import { labSettingsSchema, type LabSettings } from '#shared/schemas/mail.ts';
import { api } from '#src/lib/api-client.ts';

/** GET /api/lab/settings: e.g. whether mail goes to the local fake (then the Mailbox page exists). */
export function getLabSettings(signal?: AbortSignal): Promise<LabSettings> {
  return api.get('/api/lab/settings', labSettingsSchema, signal);
}

export function labSettingsQueryOptions() {
  return queryOptions({ queryKey: ['lab', 'settings'], queryFn: ({ signal }) => getLabSettings(signal), staleTime: 5 * 60 * 1000 });
}

export function useLabSettings() {
  return useQuery(labSettingsQueryOptions());
}

import { z } from 'zod';
import { isoDateSchema, listQuerySchema, listResponseSchema } from './list-query.ts';

/** How the lab came by a unit: it matters to readers (a loaned unit may be a picked sample). */
export const OBTAINED_HOW = ['bought_retail', 'loaned', 'donated'] as const;
export const OBTAINED_LABELS: Readonly<Record<(typeof OBTAINED_HOW)[number], string>> = {
  bought_retail: 'Bought retail',
  loaned: 'Loaned',
  donated: 'Donated',
};

/** A tested device (a "unit" on the pages and in the API paths; deviceUnit in code). */
export const deviceUnitSchema = z.object({
  id: z.string(),
  modelId: z.string(),
  modelName: z.string(),
  makerName: z.string(),
  serial: z.string(),
  obtained: z.enum(OBTAINED_HOW),
  receivedOn: z.string().nullable(),
  firmware: z.string().nullable(),
  conditionNotes: z.string(),
  emittingAreaCm: z.object({ width: z.number(), height: z.number() }),
  createdAt: z.string(),
  updatedAt: z.string(),
});
export type DeviceUnit = z.infer<typeof deviceUnitSchema>;

export const deviceUnitBodySchema = z.object({
  modelId: z.string().min(1, { message: 'Choose the model.' }),
  serial: z.string().trim().min(1, { message: 'Enter the serial number.' }).max(120),
  obtained: z.enum(OBTAINED_HOW).optional().default('bought_retail'),
  receivedOn: isoDateSchema.nullable().optional(),
  firmware: z.string().trim().max(120).nullable().optional(),
  conditionNotes: z.string().trim().max(4000).optional(),
});
export type DeviceUnitBody = z.infer<typeof deviceUnitBodySchema>;
export const deviceUnitPatchSchema = z.object({
  serial: z.string().trim().min(1).max(120).optional(),
  obtained: z.enum(OBTAINED_HOW).optional(),
  receivedOn: isoDateSchema.nullable().optional(),
  firmware: z.string().trim().max(120).nullable().optional(),
  conditionNotes: z.string().trim().max(4000).optional(),
});
export type DeviceUnitPatch = z.infer<typeof deviceUnitPatchSchema>;

export const deviceUnitListQuerySchema = listQuerySchema(['serial', 'model', 'maker', 'receivedOn', 'createdAt'] as const, 'serial').extend({
  modelId: z.string().max(64).optional(),
});
export type DeviceUnitListQuery = z.infer<typeof deviceUnitListQuerySchema>;
export const deviceUnitListResponseSchema = listResponseSchema(deviceUnitSchema);
export const deviceUnitResponseSchema = z.object({ unit: deviceUnitSchema });

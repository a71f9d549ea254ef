import { z } from 'zod';
import { listQuerySchema, listResponseSchema } from './list-query.ts';

export const makerSchema = z.object({
  id: z.string(),
  name: z.string(),
  website: z.string().nullable(),
  notes: z.string(),
  modelCount: z.number().int(),
  createdAt: z.string(),
  updatedAt: z.string(),
});
export type Maker = z.infer<typeof makerSchema>;

export const makerBodySchema = z.object({
  name: z.string().trim().min(1, { message: 'Enter the maker’s name.' }).max(120),
  website: z.preprocess((v) => (v === '' ? null : v), z.string().trim().url({ message: 'Enter a full address, e.g. https://…' }).max(500).nullable().optional()),
  notes: z.string().trim().max(4000).optional(),
});
export type MakerBody = z.infer<typeof makerBodySchema>;
export const makerPatchSchema = makerBodySchema.partial();
export type MakerPatch = z.infer<typeof makerPatchSchema>;

export const makerListQuerySchema = listQuerySchema(['name', 'createdAt', 'modelCount'] as const, 'name');
export type MakerListQuery = z.infer<typeof makerListQuerySchema>;
export const makerListResponseSchema = listResponseSchema(makerSchema);
export const makerResponseSchema = z.object({ maker: makerSchema });

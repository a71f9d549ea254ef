import { z } from 'zod';
import { listQuerySchema, listResponseSchema } from './list-query.ts';

export const MODEL_CATEGORIES = ['panel', 'mat', 'pad', 'cap', 'other'] as const;
export type ModelCategory = (typeof MODEL_CATEGORIES)[number];
export const CATEGORY_LABELS: Readonly<Record<ModelCategory, string>> = {
  panel: 'Panel',
  mat: 'Mat',
  pad: 'Pad',
  cap: 'Cap',
  other: 'Other',
};

const positive = (what: string) => z.number({ message: `Enter ${what}.` }).positive({ message: `${what[0].toUpperCase()}${what.slice(1)} must be above 0.` });

/** A maker's claims, kept as they were printed (a beam angle says whether it is full or half). */
export const claimsSchema = z.object({
  irradianceMwCm2: positive('the claimed irradiance').max(10000).nullable().optional(),
  atDistanceCm: z.number().min(0, { message: 'The distance cannot be negative.' }).max(1000).nullable().optional(),
  beamAngleDeg: positive('the beam angle').max(180, { message: 'An angle of at most 180°.' }).nullable().optional(),
  beamAngleKind: z.enum(['full', 'half']).nullable().optional(),
});
export type Claims = z.infer<typeof claimsSchema>;

export const nominalWavelengthSchema = z.object({
  nm: z.number().min(200).max(3000),
  sharePct: z.number().min(0).max(100).nullable(),
});

export const priceSchema = z.object({
  /** Integer minor units (cents): money is never a float. */
  amountMinor: z.number().int().min(0).max(1e10),
  currency: z.string().regex(/^[A-Z]{3}$/, { message: 'A three-letter currency code, e.g. EUR.' }),
});

export const modelSchema = z.object({
  id: z.string(),
  makerId: z.string(),
  makerName: z.string(),
  name: z.string(),
  category: z.enum(MODEL_CATEGORIES),
  emittingAreaCm: z.object({ width: z.number(), height: z.number() }),
  ledCount: z.number().int().nullable(),
  nominalWavelengths: z.array(nominalWavelengthSchema),
  claims: z.object({
    irradianceMwCm2: z.number().nullable(),
    atDistanceCm: z.number().nullable(),
    beamAngleDeg: z.number().nullable(),
    beamAngleKind: z.enum(['full', 'half']).nullable(),
  }),
  price: priceSchema.nullable(),
  powerW: z.number().nullable(),
  links: z.array(z.string()),
  notes: z.string(),
  unitCount: z.number().int(),
  createdAt: z.string(),
  updatedAt: z.string(),
});
export type Model = z.infer<typeof modelSchema>;

export const modelBodySchema = z
  .object({
    makerId: z.string().min(1, { message: 'Choose the maker.' }),
    name: z.string().trim().min(1, { message: 'Enter the model’s name.' }).max(160),
    category: z.enum(MODEL_CATEGORIES, { message: 'Choose a category.' }),
    emittingAreaCm: z.object({
      width: positive('the width').max(500),
      height: positive('the height').max(500),
    }),
    ledCount: z.number().int().positive().max(100000).nullable().optional(),
    nominalWavelengths: z.array(nominalWavelengthSchema).max(12).optional(),
    claims: claimsSchema.optional(),
    price: priceSchema.nullable().optional(),
    powerW: z.number().positive().max(100000).nullable().optional(),
    links: z.array(z.string().trim().url({ message: 'Each link must be a full address.' }).max(500)).max(10).optional(),
    notes: z.string().trim().max(4000).optional(),
  })
  .refine((b) => !b.claims?.beamAngleDeg || b.claims.beamAngleKind, {
    message: 'Say whether the claimed beam angle is a full or a half angle.',
    path: ['claims', 'beamAngleKind'],
  })
  .refine((b) => !b.claims?.irradianceMwCm2 || b.claims.atDistanceCm !== undefined && b.claims.atDistanceCm !== null, {
    message: 'Give the distance the irradiance is claimed at (0 for the surface).',
    path: ['claims', 'atDistanceCm'],
  });
export type ModelBody = z.infer<typeof modelBodySchema>;
export const modelPatchSchema = z.object({
  name: z.string().trim().min(1).max(160).optional(),
  category: z.enum(MODEL_CATEGORIES).optional(),
  emittingAreaCm: z.object({ width: z.number().positive().max(500), height: z.number().positive().max(500) }).optional(),
  ledCount: z.number().int().positive().max(100000).nullable().optional(),
  nominalWavelengths: z.array(nominalWavelengthSchema).max(12).optional(),
  claims: claimsSchema.optional(),
  price: priceSchema.nullable().optional(),
  powerW: z.number().positive().max(100000).nullable().optional(),
  links: z.array(z.string().trim().url().max(500)).max(10).optional(),
  notes: z.string().trim().max(4000).optional(),
});
export type ModelPatch = z.infer<typeof modelPatchSchema>;

export const modelListQuerySchema = listQuerySchema(['name', 'maker', 'category', 'createdAt'] as const, 'name').extend({
  makerId: z.string().max(64).optional(),
  category: z.enum(MODEL_CATEGORIES).optional(),
});
export type ModelListQuery = z.infer<typeof modelListQuerySchema>;
export const modelListResponseSchema = listResponseSchema(modelSchema);
export const modelResponseSchema = z.object({ model: modelSchema });

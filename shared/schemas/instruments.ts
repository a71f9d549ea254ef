import { z } from 'zod';
import { isoDateSchema, listQuerySchema, listResponseSchema } from './list-query.ts';

export const INSTRUMENT_KINDS = ['spectroradiometer', 'irradiance_meter'] as const;
export type InstrumentKind = (typeof INSTRUMENT_KINDS)[number];
export const INSTRUMENT_KIND_LABELS: Readonly<Record<InstrumentKind, string>> = {
  spectroradiometer: 'Spectroradiometer',
  irradiance_meter: 'Irradiance meter',
};

export const instrumentSchema = z.object({
  id: z.string(),
  kind: z.enum(INSTRUMENT_KINDS),
  name: z.string(),
  serial: z.string(),
  wavelengthRangeNm: z.object({ from: z.number(), to: z.number() }).nullable(),
  cosineCorrector: z.string().nullable(),
  calibratedOn: z.string(),
  calibrationDueOn: z.string(),
  calibrationUncertaintyPct: z.number(),
  /** True when the due date has passed (on the server's clock). */
  calibrationOverdue: z.boolean(),
  notes: z.string(),
  createdAt: z.string(),
  updatedAt: z.string(),
});
export type Instrument = z.infer<typeof instrumentSchema>;

const rangeSchema = z
  .object({ from: z.number().min(100).max(20000), to: z.number().min(100).max(20000) })
  .refine((r) => r.from < r.to, { message: 'The range must start below where it ends.', path: ['to'] });

export const instrumentBodySchema = z
  .object({
    kind: z.enum(INSTRUMENT_KINDS, { message: 'Choose the kind of instrument.' }),
    name: z.string().trim().min(1, { message: 'Enter a name.' }).max(160),
    serial: z.string().trim().min(1, { message: 'Enter the serial number.' }).max(120),
    wavelengthRangeNm: rangeSchema.nullable().optional(),
    cosineCorrector: z.string().trim().max(200).nullable().optional(),
    calibratedOn: isoDateSchema,
    calibrationDueOn: isoDateSchema,
    calibrationUncertaintyPct: z.number({ message: 'Enter the calibration uncertainty in %.' }).min(0).max(100),
    notes: z.string().trim().max(4000).optional(),
  })
  .refine((b) => b.calibrationDueOn > b.calibratedOn, {
    message: 'The due date comes after the calibration date.',
    path: ['calibrationDueOn'],
  });
export type InstrumentBody = z.infer<typeof instrumentBodySchema>;
export const instrumentPatchSchema = z.object({
  name: z.string().trim().min(1).max(160).optional(),
  serial: z.string().trim().min(1).max(120).optional(),
  wavelengthRangeNm: rangeSchema.nullable().optional(),
  cosineCorrector: z.string().trim().max(200).nullable().optional(),
  calibratedOn: isoDateSchema.optional(),
  calibrationDueOn: isoDateSchema.optional(),
  calibrationUncertaintyPct: z.number().min(0).max(100).optional(),
  notes: z.string().trim().max(4000).optional(),
});
export type InstrumentPatch = z.infer<typeof instrumentPatchSchema>;

export const instrumentListQuerySchema = listQuerySchema(['name', 'kind', 'calibrationDueOn', 'createdAt'] as const, 'name').extend({
  kind: z.enum(INSTRUMENT_KINDS).optional(),
});
export type InstrumentListQuery = z.infer<typeof instrumentListQuerySchema>;
export const instrumentListResponseSchema = listResponseSchema(instrumentSchema);
export const instrumentResponseSchema = z.object({ instrument: instrumentSchema });

/** True when `dueOn` (YYYY-MM-DD) is before `today` (YYYY-MM-DD): the calibration has lapsed. */
export function calibrationOverdue(dueOn: string, today: string): boolean {
  return dueOn < today;
}

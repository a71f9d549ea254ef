import { z } from 'zod';
import { RUN_STATUSES } from '../lab/run-workflow.ts';
import { READING_SLOTS } from '../lab/grid-point.ts';
import { FLAG_CODES } from '../lab/run-flags.ts';
import { isoDateSchema, listQuerySchema, listResponseSchema } from './list-query.ts';

const positions = (what: string, min: number) =>
  z
    .array(z.number().finite().min(-1000).max(1000), { message: `Give the ${what} as a list of numbers in cm.` })
    .min(min, { message: `Give at least ${min} ${what}.` })
    .max(61, { message: `At most 61 ${what}.` })
    .refine((a) => new Set(a).size === a.length, { message: `The ${what} must not repeat.` });

/** Distances × x positions × y positions, cm, origin at the centre of the emitting area. */
export const runGridSchema = z.object({
  distancesCm: z
    .array(z.number().positive({ message: 'Distances are above 0 cm.' }).max(1000), { message: 'Give the distances in cm.' })
    .min(1, { message: 'Give at least one distance.' })
    .max(10, { message: 'At most 10 distances.' })
    .refine((a) => new Set(a).size === a.length, { message: 'The distances must not repeat.' }),
  xCm: positions('x positions', 1),
  yCm: positions('y positions', 1),
});
export type RunGridBody = z.infer<typeof runGridSchema>;

export const bandSchema = z
  .object({ loNm: z.number().min(200).max(3000), hiNm: z.number().min(200).max(3000) })
  .refine((b) => b.loNm < b.hiNm, { message: 'A band starts below where it ends.' });
export const runBandsSchema = z
  .record(z.string().regex(/^[a-z][a-z0-9_]{0,19}$/), bandSchema)
  .refine((b) => Object.keys(b).length >= 1 && Object.keys(b).length <= 6, { message: 'Give one to six bands.' })
  .refine((b) => !('combined' in b), { message: '"combined" is the union of the bands; give it no band of its own.' });

export const conditionsSchema = z.object({
  roomTempC: z.number().min(-20).max(60).nullable().optional(),
  warmupMinutes: z.number().min(0).max(600).nullable().optional(),
  mainsVoltageV: z.number().min(0).max(500).nullable().optional(),
});

export const runBodySchema = z.object({
  unitId: z.string().min(1, { message: 'Choose the unit.' }),
  instrumentId: z.string().min(1, { message: 'Choose the instrument.' }),
  grid: runGridSchema,
  bands: runBandsSchema.optional(),
  /** Take a centre reading at the start and the end of each plane, for the drift check. */
  centerChecks: z.boolean().optional().default(false),
  /** Who measured (default: whoever creates the run). */
  measuredById: z.string().min(1).optional(),
  measuredOn: isoDateSchema.optional(),
  conditions: conditionsSchema.optional(),
  notes: z.string().trim().max(4000).optional(),
});
export type RunBody = z.input<typeof runBodySchema>;
export type RunBodyParsed = z.infer<typeof runBodySchema>;

export const runPatchSchema = z.object({
  measuredOn: isoDateSchema.optional(),
  conditions: conditionsSchema.optional(),
  notes: z.string().trim().max(4000).optional(),
  bands: runBandsSchema.optional(),
});
export type RunPatch = z.infer<typeof runPatchSchema>;

export const runProgressSchema = z.object({
  expected: z.number().int(),
  received: z.number().int(),
  analysed: z.number().int(),
  failed: z.number().int(),
  excluded: z.number().int(),
  /** The run's figures are being recomputed after a change. */
  analysing: z.boolean(),
  /** Automatic flags in the latest figures. */
  flags: z.number().int(),
});
export type RunProgress = z.infer<typeof runProgressSchema>;

export const runSchema = z.object({
  id: z.string(),
  status: z.enum(RUN_STATUSES),
  unit: z.object({
    id: z.string(),
    serial: z.string(),
    modelId: z.string(),
    modelName: z.string(),
    makerName: z.string(),
    category: z.string(),
    emittingAreaCm: z.object({ width: z.number(), height: z.number() }),
  }),
  instrument: z.object({
    id: z.string(),
    name: z.string(),
    kind: z.enum(['spectroradiometer', 'irradiance_meter']),
    serial: z.string(),
    calibratedOn: z.string(),
    calibrationDueOn: z.string(),
    calibrationUncertaintyPct: z.number(),
    calibrationOverdue: z.boolean(),
  }),
  grid: runGridSchema,
  bands: z.record(z.string(), z.object({ loNm: z.number(), hiNm: z.number() })),
  centerChecks: z.boolean(),
  conditions: z.object({ roomTempC: z.number().nullable(), warmupMinutes: z.number().nullable(), mainsVoltageV: z.number().nullable() }),
  notes: z.string(),
  measuredBy: z.object({ id: z.string(), displayName: z.string() }),
  measuredOn: z.string(),
  createdAt: z.string(),
  updatedAt: z.string(),
  submittedAt: z.string().nullable(),
  decidedAt: z.string().nullable(),
  progress: runProgressSchema,
});
export type Run = z.infer<typeof runSchema>;
export const runResponseSchema = z.object({ run: runSchema });

export const runListQuerySchema = listQuerySchema(['createdAt', 'status', 'model', 'measuredOn'] as const, 'createdAt').extend({
  status: z.enum(RUN_STATUSES).optional(),
  unitId: z.string().max(64).optional(),
});
export type RunListQuery = z.infer<typeof runListQuerySchema>;
export const runListResponseSchema = listResponseSchema(runSchema.omit({ progress: true }).extend({ progress: runProgressSchema }));

export const transitionNoteSchema = z.object({ note: z.string().trim().max(4000).optional() });
export const requestChangesBodySchema = z.object({
  note: z.string().trim().min(1, { message: 'Say what needs changing.' }).max(4000),
});

/** Why a reading is left out of the run: a written reason, kept with the run. */
export const excludeBodySchema = z.object({
  reason: z.string().trim().min(5, { message: 'Give the reason in a few words.' }).max(1000),
});

export const readingFileSchema = z.object({
  id: z.string(),
  originalName: z.string(),
  sha256: z.string(),
  sizeBytes: z.number().int(),
  uploadedBy: z.string(),
  uploadedAt: z.string(),
  state: z.enum(['pending', 'analysed', 'failed']),
  issues: z.array(z.object({ line: z.number().nullable(), code: z.string(), severity: z.enum(['error', 'warning']), message: z.string() })),
});
export type ReadingFile = z.infer<typeof readingFileSchema>;

export const readingSchema = z.object({
  id: z.string(),
  distanceCm: z.number(),
  xCm: z.number(),
  yCm: z.number(),
  slot: z.enum(READING_SLOTS),
  state: z.enum(['missing', 'pending', 'analysed', 'failed', 'excluded']),
  excludedReason: z.string().nullable(),
  /** mW/cm² per band and combined; null where not measured. */
  values: z.record(z.string(), z.number().nullable()),
  peakNm: z.number().nullable(),
  file: readingFileSchema.nullable(),
  /** Earlier files for this point, newest first. */
  history: z.array(readingFileSchema),
  commentCount: z.number().int(),
});
export type Reading = z.infer<typeof readingSchema>;
export const readingListResponseSchema = z.object({ readings: z.array(readingSchema) });

export const spectrumResponseSchema = z.object({
  readingId: z.string(),
  fileName: z.string(),
  unit: z.string().nullable(),
  wavelengthNm: z.array(z.number()),
  irradianceWm2Nm: z.array(z.number()),
});

export const flagSchema = z.object({
  code: z.enum(FLAG_CODES),
  severity: z.enum(['warning', 'blocking']),
  message: z.string(),
  point: z.object({ distanceCm: z.number(), xCm: z.number(), yCm: z.number(), slot: z.string().optional() }).nullable(),
  value: z.number().nullable(),
});

const uniformitySchema = z.object({
  minOverMean: z.number().nullable(),
  minOverMax: z.number().nullable(),
  cv: z.number().nullable(),
  nonUniformityPct: z.number().nullable(),
});

const planeFiguresSchema = z.object({
  peakMwCm2: z.number().nullable(),
  centerMwCm2: z.number().nullable(),
  spreadWidthCm: z.record(z.string(), z.number()),
  widthAtEdge: z.array(z.number()),
  footprint: uniformitySchema.nullable(),
  /** Area-weighted over the interpolated map (comparable across grids); `footprint` is readings-only. */
  footprintArea: uniformitySchema
    .extend({
      coveredShare: z.number().nullable(),
      edgesWithoutReading: z.array(z.string()),
      issues: z.array(z.object({ line: z.number().nullable(), code: z.string(), severity: z.enum(['error', 'warning']), message: z.string() })),
    })
    .nullable(),
});

export const runAnalysisSchema = z.object({
  planes: z.array(z.object({ distanceCm: z.number(), points: z.number().int(), bands: z.record(z.string(), planeFiguresSchema.nullable()) })),
  falloffExponent: z.record(z.string(), z.number().nullable()),
  flags: z.array(flagSchema),
  computedAt: z.string().nullable(),
  /** Readings changed since these figures were computed; new ones are on their way. */
  stale: z.boolean(),
});
export type RunAnalysis = z.infer<typeof runAnalysisSchema>;

export const uploadResultSchema = z.object({
  /** Spectrum files with the point each fills; meter files (slot "meter") fill theirs once analysed. */
  accepted: z.array(
    z.object({
      file: z.string(),
      distanceCm: z.number().nullable(),
      xCm: z.number().nullable(),
      yCm: z.number().nullable(),
      slot: z.enum([...READING_SLOTS, 'meter']),
    }),
  ),
  unmatched: z.array(z.string()),
  duplicates: z.array(z.string()),
});
export type UploadResult = z.infer<typeof uploadResultSchema>;

export const commentBodySchema = z.object({
  body: z.string().trim().min(1, { message: 'Write the comment.' }).max(4000),
  readingId: z.string().min(1).max(64).nullable().optional(),
});
export const commentSchema = z.object({
  id: z.string(),
  body: z.string(),
  readingId: z.string().nullable(),
  point: z.object({ distanceCm: z.number(), xCm: z.number(), yCm: z.number(), slot: z.enum(READING_SLOTS) }).nullable(),
  author: z.object({ id: z.string().nullable(), displayName: z.string() }),
  createdAt: z.string(),
});
export type RunComment = z.infer<typeof commentSchema>;
export const commentListResponseSchema = z.object({ comments: z.array(commentSchema) });

export const auditEventSchema = z.object({
  at: z.string(),
  actor: z.string(),
  action: z.string(),
  from: z.string().nullable(),
  to: z.string().nullable(),
  note: z.string().nullable(),
});
export type AuditEvent = z.infer<typeof auditEventSchema>;
export const auditResponseSchema = z.object({ events: z.array(auditEventSchema) });

export const readingParamsSchema = z.object({ id: z.string().min(1).max(64), readingId: z.string().min(1).max(64) });

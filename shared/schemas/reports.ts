import { z } from 'zod';

/**
 * Reports: the lab's publishing API (staff) and the read-only public API. A public report is one
 * published version: its write-up and its figures as frozen at publication.
 */
export const REPORT_STATUSES = ['draft', 'published', 'retracted'] as const;

const n = z.number();
const nn = z.number().nullable();
const figures = z.object({
  minOverMean: nn,
  minOverMax: nn,
  cv: nn,
  nonUniformityPct: nn,
});
export const planeFiguresSchema = z.object({
  peakMwCm2: nn,
  centerMwCm2: nn,
  spreadWidthCm: z.record(z.string(), n),
  widthAtEdge: z.array(n),
  footprint: figures.nullable(),
  footprintArea: figures
    .extend({ coveredShare: nn, edgesWithoutReading: z.array(z.string()), issues: z.array(z.object({ line: nn, code: z.string(), severity: z.string(), message: z.string() })) })
    .nullable(),
});
export const reportPlaneSchema = z.object({ distanceCm: n, points: n, bands: z.record(z.string(), planeFiguresSchema.nullable()) });

const instrument = z.object({
  name: z.string(),
  kind: z.enum(['spectroradiometer', 'irradiance_meter']),
  serial: z.string(),
  wavelengthRangeNm: z.object({ from: n, to: n }).nullable(),
  cosineCorrector: z.string().nullable(),
  calibratedOn: z.string(),
  calibrationDueOn: z.string(),
  calibrationUncertaintyPct: n,
});

export const reportModelSchema = z.object({
  name: z.string(),
  makerName: z.string(),
  category: z.string(),
  emittingAreaCm: z.object({ width: n, height: n }),
  ledCount: nn,
  nominalWavelengths: z.array(z.object({ nm: n, sharePct: nn })),
  claims: z.object({ irradianceMwCm2: nn, atDistanceCm: nn, beamAngleDeg: nn, beamAngleKind: z.enum(['full', 'half']).nullable() }),
  price: z.object({ amountMinor: n, currency: z.string() }).nullable(),
  powerW: nn,
  links: z.array(z.string()),
});

export const keyFiguresSchema = z.object({
  centerMwCm2At15: nn,
  centerMwCm2At30: nn,
  redSharePct: nn,
  spread50CmAt15: nn,
  footprintUniformity: nn,
  measuredOverClaimed: nn,
  pricePer100Cm2At30: nn,
  currency: z.string().nullable(),
});
export type KeyFigures = z.infer<typeof keyFiguresSchema>;

export const reportSnapshotSchema = z.object({
  model: reportModelSchema,
  units: z.array(
    z.object({
      serial: z.string(),
      obtained: z.string(),
      receivedOn: z.string().nullable(),
      firmware: z.string().nullable(),
      measuredOn: z.string(),
      measuredBy: z.string(),
      instrument,
      conditions: z.object({ roomTempC: nn, warmupMinutes: nn, mainsVoltageV: nn }),
    }),
  ),
  instrument,
  grid: z.object({ distancesCm: z.array(n), xCm: z.array(n), yCm: z.array(n) }),
  bands: z.record(z.string(), z.object({ loNm: n, hiNm: n })),
  planes: z.array(reportPlaneSchema),
  falloffExponent: z.record(z.string(), nn),
  pointExponents: z.array(z.object({ distanceCm: n, exponent: n })),
  readings: z.array(z.object({ unitSerial: z.string(), distanceCm: n, xCm: n, yCm: n, values: z.record(z.string(), nn) })),
  spectrum: z
    .object({
      distanceCm: n,
      xCm: n,
      yCm: n,
      wavelengthNm: z.array(n),
      irradianceWm2Nm: z.array(n),
      peaks: z.array(z.object({ peakNm: n, fwhmNm: nn, centroidNm: nn })),
    })
    .nullable(),
  beamAngle: z.object({ fittedFullAngleDeg: n, claimedFullAngleDeg: nn, claimNearerAs: z.enum(['full', 'half']).nullable(), residualRms: n }).nullable(),
  claims: z.array(z.object({ key: z.string(), label: z.string(), claimed: z.string(), measured: z.string(), ratio: nn, note: z.string().nullable() })),
  doseTargetsJCm2: z.array(n),
  doseTable: z.array(
    z.object({
      distanceCm: n,
      isoline50MwCm2: nn,
      times: z.array(z.object({ doseJcm2: n, centerSeconds: nn, isoline50Seconds: nn })),
    }),
  ),
  uncertainty: z
    .object({
      components: z.array(z.object({ key: z.string(), label: z.string(), type: z.enum(['A', 'B']), inputRelative: n, sensitivity: n, contributionRelative: n })),
      combinedRelative: n,
      expandedRelative: n,
      coverageFactor: n,
      effectiveDegreesOfFreedom: nn,
      distanceCm: n,
      statement: z.string(),
    })
    .nullable(),
  irScreening: z
    .object({
      distanceCm: n,
      measuredWm2: nn,
      maxSecondsMeasured: nn,
      reason: z.string().nullable(),
      upperBoundWm2: nn,
      maxSecondsAtUpperBound: nn,
      note: z.string().nullable(),
    })
    .nullable(),
  unitSpread: z.array(z.object({ figure: z.string(), unit: z.string(), values: z.array(z.object({ serial: z.string(), value: nn })), min: nn, max: nn, spreadPct: nn })).nullable(),
  keyFigures: keyFiguresSchema,
});
export type ReportSnapshotData = z.infer<typeof reportSnapshotSchema>;

/**
 * How the tested unit and its bench time were paid for: by readers' pledges toward requests
 * marked tested with this report (paid, not refunded), or by the lab itself. Computed when asked,
 * not frozen with the figures: a request may be marked tested after publication.
 */
export const reportFundingSchema = z.discriminatedUnion('kind', [
  z.object({
    kind: z.literal('readers'),
    /** Distinct readers with a paid pledge. */
    readers: z.number().int(),
    /** What they paid, per currency (integer minor units). */
    amounts: z.array(z.object({ amountMinor: z.number().int(), currency: z.string() })),
  }),
  z.object({ kind: z.literal('lab') }),
]);
export type ReportFunding = z.infer<typeof reportFundingSchema>;

export const reportVersionInfoSchema = z.object({ version: z.number().int(), publishedAt: z.string(), changeNote: z.string().nullable() });

/** GET /api/public/reports/:slug (and …/versions/:n): one published version. */
export const publicReportSchema = reportSnapshotSchema.extend({
  slug: z.string(),
  title: z.string(),
  summary: z.string(),
  bodyHtml: z.string(),
  version: z.number().int(),
  latestVersion: z.number().int(),
  publishedAt: z.string(),
  firstPublishedAt: z.string(),
  changeNote: z.string().nullable(),
  versions: z.array(reportVersionInfoSchema),
  retracted: z.object({ at: z.string(), reason: z.string() }).nullable(),
  category: z.string(),
  citation: z.string(),
  funding: reportFundingSchema,
  /** Only on a staff preview: the version that would be published. */
  preview: z.boolean().optional(),
});
export type PublicReport = z.infer<typeof publicReportSchema>;
export const publicReportResponseSchema = z.object({ report: publicReportSchema });

export const publicReportSummarySchema = z.object({
  slug: z.string(),
  title: z.string(),
  summary: z.string(),
  version: z.number().int(),
  publishedAt: z.string(),
  firstPublishedAt: z.string(),
  category: z.string(),
  maker: z.string(),
  model: z.string(),
  units: z.number().int(),
  keyFigures: keyFiguresSchema,
  /** A small coverage picture: the combined band's readings at the nearest plane. */
  thumbnail: z.object({ distanceCm: n, points: z.array(z.object({ xCm: n, yCm: n, value: n })), emittingAreaCm: z.object({ width: n, height: n }) }).nullable(),
});
export type PublicReportSummary = z.infer<typeof publicReportSummarySchema>;
export const publicReportListSchema = z.object({ reports: z.array(publicReportSummarySchema) });

// Staff side.
export const reportBodySchema = z.object({
  runIds: z.array(z.string().min(1).max(64)).min(1, { message: 'Choose at least one approved run.' }).max(8),
  title: z.string().trim().min(3, { message: 'Give the report a title.' }).max(200),
  summary: z.string().trim().min(10, { message: 'Write a summary of a sentence or two.' }).max(1000),
  bodyMarkdown: z.string().max(100_000).default(''),
});
export type ReportBody = z.input<typeof reportBodySchema>;

export const reportDraftPatchSchema = z.object({
  title: z.string().trim().min(3).max(200).optional(),
  summary: z.string().trim().min(10).max(1000).optional(),
  bodyMarkdown: z.string().max(100_000).optional(),
});

export const correctionBodySchema = z.object({
  changeNote: z.string().trim().min(5, { message: 'Say what the correction changes.' }).max(2000),
  title: z.string().trim().min(3).max(200).optional(),
  summary: z.string().trim().min(10).max(1000).optional(),
  bodyMarkdown: z.string().max(100_000).optional(),
});
export const retractBodySchema = z.object({ reason: z.string().trim().min(10, { message: 'Give the reason readers will see.' }).max(2000) });

export const labReportSchema = z.object({
  id: z.string(),
  slug: z.string(),
  status: z.enum(REPORT_STATUSES),
  version: z.number().int(),
  title: z.string(),
  summary: z.string(),
  bodyMarkdown: z.string(),
  modelId: z.string(),
  modelName: z.string(),
  makerName: z.string(),
  runIds: z.array(z.string()),
  publishedAt: z.string().nullable(),
  retractedAt: z.string().nullable(),
  retractionReason: z.string().nullable(),
  createdAt: z.string(),
  updatedAt: z.string(),
});
export type LabReport = z.infer<typeof labReportSchema>;
export const labReportResponseSchema = z.object({ report: labReportSchema });
export const labReportListSchema = z.object({ reports: z.array(labReportSchema) });

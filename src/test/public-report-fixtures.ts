import type { KeyFigures, PublicReport, PublicReportSummary } from '#shared/schemas/reports.ts';

/**
 * Fictional published reports for the client tests, as the public API answers them. Readings
 * come from a made-up bell-shaped beam (not a physical model): the tests check what the pages
 * do with the numbers, not the numbers themselves.
 */
const XS = [-20, -10, 0, 10, 20];
const YS = [-10, 0, 10];
const DISTANCES = [15, 30];

export function beamValue(peakAt15: number, widthCm: number, distanceCm: number, xCm: number, yCm: number): number {
  const falloff = (15 / distanceCm) ** 1.2;
  const spread = widthCm * (distanceCm / 15);
  return peakAt15 * falloff * Math.exp(-(xCm * xCm + yCm * yCm) / (2 * spread * spread));
}

export function someKeyFigures(extra: Partial<KeyFigures> = {}): KeyFigures {
  return {
    centerMwCm2At15: 80,
    centerMwCm2At30: 40,
    redSharePct: 50,
    spread50CmAt15: 30,
    footprintUniformity: 0.4,
    measuredOverClaimed: 0.6,
    pricePer100Cm2At30: 35,
    currency: 'EUR',
    ...extra,
  };
}

export function aReportSummary(slug: string, extra: Partial<PublicReportSummary> = {}): PublicReportSummary {
  return {
    slug,
    title: `Report on ${slug}`,
    summary: `What we found when we measured ${slug}.`,
    version: 1,
    publishedAt: '2026-03-01T10:00:00.000Z',
    firstPublishedAt: '2026-03-01T10:00:00.000Z',
    category: 'panel',
    maker: 'Aldermoor Light Co.',
    model: slug,
    units: 1,
    keyFigures: someKeyFigures(),
    thumbnail: {
      distanceCm: 15,
      points: YS.flatMap((y) => XS.map((x) => ({ xCm: x, yCm: y, value: beamValue(80, 15, 15, x, y) }))),
      emittingAreaCm: { width: 30, height: 20 },
    },
    ...extra,
  };
}

/** A whole published report: one unit, the grid above at 15 and 30 cm, combined band only. */
export function aPublicReport(slug: string, opts: { title?: string; peakAt15?: number; widthCm?: number; keyFigures?: Partial<KeyFigures> } = {}): PublicReport {
  const peak = opts.peakAt15 ?? 80;
  const width = opts.widthCm ?? 15;
  const readings = DISTANCES.flatMap((d) =>
    YS.flatMap((y) => XS.map((x) => ({ unitSerial: 'SN-1', distanceCm: d, xCm: x, yCm: y, values: { combined: beamValue(peak, width, d, x, y) } }))),
  );
  const instrument = {
    name: 'Bench spectroradiometer',
    kind: 'spectroradiometer' as const,
    serial: 'SR-1',
    wavelengthRangeNm: { from: 350, to: 1100 },
    cosineCorrector: 'PTFE diffuser',
    calibratedOn: '2026-01-10',
    calibrationDueOn: '2027-01-10',
    calibrationUncertaintyPct: 4.5,
  };
  return {
    slug,
    title: opts.title ?? `Report on ${slug}`,
    summary: 'A summary.',
    bodyHtml: '<p>Write-up.</p>',
    version: 1,
    latestVersion: 1,
    publishedAt: '2026-03-01T10:00:00.000Z',
    firstPublishedAt: '2026-03-01T10:00:00.000Z',
    changeNote: null,
    versions: [{ version: 1, publishedAt: '2026-03-01T10:00:00.000Z', changeNote: null }],
    retracted: null,
    category: 'panel',
    citation: `Benchlight (2026). ${slug}.`,
    funding: { kind: 'lab' as const },
    model: {
      name: slug,
      makerName: 'Aldermoor Light Co.',
      category: 'panel',
      emittingAreaCm: { width: 30, height: 20 },
      ledCount: 120,
      nominalWavelengths: [],
      claims: { irradianceMwCm2: null, atDistanceCm: null, beamAngleDeg: null, beamAngleKind: null },
      price: null,
      powerW: null,
      links: [],
    },
    units: [
      {
        serial: 'SN-1',
        obtained: 'bought_retail',
        receivedOn: null,
        firmware: null,
        measuredOn: '2026-02-01',
        measuredBy: 'A tester',
        instrument,
        conditions: { roomTempC: null, warmupMinutes: null, mainsVoltageV: null },
      },
    ],
    instrument,
    grid: { distancesCm: DISTANCES, xCm: XS, yCm: YS },
    bands: { red: { loNm: 600, hiNm: 700 }, nir: { loNm: 700, hiNm: 1100 } },
    planes: DISTANCES.map((d) => ({
      distanceCm: d,
      points: XS.length * YS.length,
      bands: {
        combined: {
          peakMwCm2: beamValue(peak, width, d, 0, 0),
          centerMwCm2: beamValue(peak, width, d, 0, 0),
          spreadWidthCm: { '80': width * 0.6, '50': width * 1.2, '25': width * 1.6 },
          widthAtEdge: [],
          footprint: null,
          footprintArea: null,
        },
      },
    })),
    falloffExponent: { combined: 1.2 },
    pointExponents: [],
    readings,
    spectrum: null,
    beamAngle: null,
    claims: [],
    doseTargetsJCm2: [4, 10, 20, 60],
    doseTable: [],
    uncertainty: null,
    irScreening: null,
    unitSpread: null,
    keyFigures: someKeyFigures({ centerMwCm2At15: peak, ...opts.keyFigures }),
  };
}

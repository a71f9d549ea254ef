import { buildReportSnapshot, type SnapshotModel, type SnapshotRunInput } from '#shared/lab/report-snapshot.ts';
import type { PublicReport } from '#shared/schemas/reports.ts';

/**
 * A small published report for component tests, computed by the same snapshot code the server
 * freezes at publication, from a synthetic unit: a smooth bell of light over a 7 × 5 grid at 15,
 * 30 and 60 cm, a red and a near-infrared line in the spectrum, and (optionally) a second unit a
 * few per cent dimmer. Invented numbers; no real device.
 */
const XS = [-45, -30, -15, 0, 15, 30, 45];
const YS = [-40, -20, 0, 20, 40];
const DISTANCES = [15, 30, 60];
/** Centre irradiance, mW/cm², and the bell's widths (σ, cm) at each distance. */
const CENTER: Record<number, number> = { 15: 80, 30: 60, 60: 35 };
const SIGMA: Record<number, { x: number; y: number }> = { 15: { x: 22, y: 16 }, 30: { x: 28, y: 21 }, 60: { x: 38, y: 30 } };
const RED_SHARE = 0.55;

const model: SnapshotModel = {
  name: 'Lumen test panel',
  makerName: 'Fixture Optics',
  category: 'panel',
  emittingAreaCm: { width: 40, height: 30 },
  ledCount: 120,
  nominalWavelengths: [
    { nm: 660, sharePct: 55 },
    { nm: 850, sharePct: 45 },
  ],
  claims: { irradianceMwCm2: 100, atDistanceCm: 15, beamAngleDeg: 60, beamAngleKind: 'full' },
  price: { amountMinor: 49900, currency: 'EUR' },
  powerW: 150,
  links: [],
};

const instrument: SnapshotRunInput['instrument'] = {
  name: 'Fixture bench spectroradiometer',
  kind: 'spectroradiometer',
  serial: 'FX-SR-0001',
  wavelengthRangeNm: { from: 350, to: 1050 },
  cosineCorrector: 'PTFE diffuser',
  calibratedOn: '2026-02-11',
  calibrationDueOn: '2027-02-11',
  calibrationUncertaintyPct: 4,
};

function gauss(x: number, mu: number, fwhm: number): number {
  const s = fwhm / 2.354820045;
  return Math.exp(-((x - mu) ** 2) / (2 * s * s));
}

function spectrum(): NonNullable<SnapshotRunInput['spectrum']> {
  const wavelengthNm: number[] = [];
  const irradianceWm2Nm: number[] = [];
  for (let nm = 350; nm <= 1050; nm += 1) {
    wavelengthNm.push(nm);
    irradianceWm2Nm.push(12 * gauss(nm, 660, 18) + 6 * gauss(nm, 850, 40));
  }
  return { distanceCm: 15, xCm: 0, yCm: 0, wavelengthNm, irradianceWm2Nm };
}

function run(serial: string, scale: number, measuredOn: string): SnapshotRunInput {
  const readings = DISTANCES.flatMap((d) =>
    YS.flatMap((y) =>
      XS.map((x) => {
        const combined = scale * CENTER[d] * Math.exp(-(x * x) / (2 * SIGMA[d].x ** 2) - (y * y) / (2 * SIGMA[d].y ** 2));
        return { distanceCm: d, xCm: x, yCm: y, values: { combined, red: RED_SHARE * combined, nir: (1 - RED_SHARE) * combined } };
      }),
    ),
  );
  return {
    unit: { serial, obtained: 'bought_retail', receivedOn: '2026-09-01', firmware: null },
    instrument,
    grid: { distancesCm: DISTANCES, xCm: XS, yCm: YS },
    bands: { red: { loNm: 600, hiNm: 700 }, nir: { loNm: 700, hiNm: 1100 } },
    conditions: { roomTempC: 22, warmupMinutes: 10, mainsVoltageV: 230 },
    measuredOn,
    measuredBy: 'Fixture Tester',
    readings,
    centerChecks: [{ distanceCm: 30, values: [60 * scale, 60.4 * scale] }],
    spectrum: spectrum(),
  };
}

export interface ReportFixtureOptions {
  units?: 1 | 2;
  /** Number of published versions; the fixture is the latest unless `version` says otherwise. */
  versions?: number;
  version?: number;
  retracted?: { at: string; reason: string } | null;
  preview?: boolean;
  funding?: PublicReport['funding'];
}

export const FIXTURE_SLUG = 'fixture-optics-lumen-test-panel';

export function reportFixture(options: ReportFixtureOptions = {}): PublicReport {
  const units = options.units ?? 2;
  const runs = units === 2 ? [run('FX-0001', 1, '2026-10-01'), run('FX-0002', 0.96, '2026-10-03')] : [run('FX-0001', 1, '2026-10-01')];
  const snapshot = buildReportSnapshot(model, runs);
  const count = options.versions ?? 1;
  const version = options.version ?? count;
  const versions = Array.from({ length: count }, (_, i) => ({
    version: i + 1,
    publishedAt: `2026-11-${String(10 + i).padStart(2, '0')}T09:00:00.000Z`,
    changeNote: i === 0 ? null : `Corrected the claim comparison (version ${i + 1}).`,
  }));
  const current = versions[version - 1];
  // Through JSON, as the API sends it (no Float64Arrays, no undefined).
  const figures = JSON.parse(JSON.stringify(snapshot)) as typeof snapshot;
  return {
    ...figures,
    slug: FIXTURE_SLUG,
    title: 'Lumen test panel: even light at 30 cm',
    summary: 'A synthetic panel measured at 15, 30 and 60 cm for the component tests of the report page.',
    bodyHtml: '<h2>What we tested</h2><p>Two units on a 7 × 5 grid.</p>',
    version,
    latestVersion: count,
    publishedAt: current.publishedAt,
    firstPublishedAt: versions[0].publishedAt,
    changeNote: current.changeNote,
    versions,
    retracted: options.retracted ?? null,
    category: 'panel',
    citation: options.preview
      ? ''
      : `Benchlight independent test lab (2026). “Lumen test panel: even light at 30 cm”, version ${version}. https://bench.test/reports/${FIXTURE_SLUG}/versions/${version}`,
    funding: options.funding ?? { kind: 'lab' },
    ...(options.preview ? { preview: true } : {}),
  };
}

import { lazy, Suspense, useMemo, useState } from 'react';
import { COMBINED_BAND } from '#shared/lab/band-values.ts';
import { snapshotPoints } from '#shared/lab/report-snapshot.ts';
import { POSITION_TOLERANCE_CM } from '#shared/measurement/plane/plane-points.ts';
import type { PublicReport } from '#shared/schemas/reports.ts';
import { SegmentedChoice } from '#src/components/segmented-choice.tsx';
import { Spinner } from '#src/components/spinner.tsx';
import { useDisplayUnits } from '#src/lib/display-units.tsx';
import { formatFigure } from '#src/lib/format.ts';
import { bandKeys, bandName } from '../utils/bands.ts';
import { ReportSection } from './report-section.tsx';
import { caption, thNum, th, thRow, tdNum } from './table-styles.ts';

// Chart code (recharts) loads only when a report page draws it.
const ProfileChart = lazy(() => import('#src/components/figures/profile-chart.tsx').then((m) => ({ default: m.ProfileChart })));
const FalloffChart = lazy(() => import('#src/components/figures/falloff-chart.tsx').then((m) => ({ default: m.FalloffChart })));

/** The row the profile follows: y = 0 when measured, else the measured row nearest it. */
function profileRowCm(ys: readonly number[]): number {
  if (ys.some((y) => Math.abs(y) < POSITION_TOLERANCE_CM)) return 0;
  return [...ys].sort((a, b) => Math.abs(a) - Math.abs(b) || a - b)[0] ?? 0;
}

/** The lateral profile at every distance, and centre irradiance against distance beside the inverse-square law. */
export function ProfileSection({ report }: { report: PublicReport }) {
  const units = useDisplayUnits();
  const [band, setBand] = useState<string>(COMBINED_BAND);
  const rowCm = profileRowCm(report.grid.yCm);

  const series = useMemo(() => {
    const points = snapshotPoints(report, band).filter((p) => Math.abs(p.yCm - rowCm) < POSITION_TOLERANCE_CM);
    const distances = [...new Set(points.map((p) => p.distanceCm))].sort((a, b) => a - b);
    return distances.map((d) => ({
      distanceCm: d,
      points: points
        .filter((p) => p.distanceCm === d)
        .sort((a, b) => a.xCm - b.xCm)
        .map((p) => ({ xCm: p.xCm, value: p.value })),
    }));
  }, [report, band, rowCm]);

  const centers = report.planes
    .map((p) => ({ distanceCm: p.distanceCm, value: p.bands[band]?.centerMwCm2 ?? null }))
    .filter((c): c is { distanceCm: number; value: number } => c.value !== null);
  const exponentBands = bandKeys(report).filter((b) => report.falloffExponent[b] !== undefined);

  return (
    <ReportSection
      id="profile"
      title="Profile and falloff"
      lede="How the light spreads across the unit's face, and how fast it falls with distance. A point source follows the inverse-square law; a broad emitting area falls off more slowly close up."
    >
      <SegmentedChoice legend="Band" options={bandKeys(report).map((b) => ({ value: b, label: bandName(b) }))} value={band} onChange={setBand} />
      <Suspense fallback={<Spinner label="Drawing the charts…" />}>
        {/* One above the other: each chart is drawn at a fixed width wider than half the page. */}
        <div className="space-y-10">
          <ProfileChart series={series} rowLabel={`the centre row (y = ${units.formatLength(rowCm)})`} units={units} />
          <FalloffChart centers={centers} units={units} />
        </div>
      </Suspense>
      <div className="grid gap-8 lg:grid-cols-2">
        <table className="w-full border-collapse">
          <caption className={caption}>Falloff exponent, fitted over all distances</caption>
          <thead>
            <tr>
              <th scope="col" className={th}>Band</th>
              <th scope="col" className={thNum}>Exponent</th>
            </tr>
          </thead>
          <tbody>
            {exponentBands.map((b) => (
              <tr key={b}>
                <th scope="row" className={thRow}>{bandName(b)}</th>
                <td className={tdNum}>{report.falloffExponent[b] === null ? '—' : formatFigure(report.falloffExponent[b] as number)}</td>
              </tr>
            ))}
          </tbody>
        </table>
        {report.pointExponents.length > 0 ? (
          <table className="w-full border-collapse">
            <caption className={caption}>Local falloff exponent at each distance (combined band)</caption>
            <thead>
              <tr>
                <th scope="col" className={th}>Distance</th>
                <th scope="col" className={thNum}>Exponent</th>
              </tr>
            </thead>
            <tbody>
              {report.pointExponents.map((p) => (
                <tr key={p.distanceCm}>
                  <th scope="row" className={thRow}>{units.formatLength(p.distanceCm)}</th>
                  <td className={tdNum}>{formatFigure(p.exponent)}</td>
                </tr>
              ))}
            </tbody>
          </table>
        ) : null}
      </div>
      <p className="max-w-measure font-sans text-sm text-ink-soft">
        The exponent c says how irradiance E falls with distance d near a distance: E ∝ 1/dᶜ. It is 2 for a point source (the
        inverse-square law) and smaller where the emitting area is large compared with the distance.
      </p>
    </ReportSection>
  );
}

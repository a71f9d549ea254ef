import { lazy, Suspense, useMemo, useState } from 'react';
import { analyzeGrid } from '#shared/measurement/check/analyze-grid.ts';
import type { Reading, Run, RunAnalysis } from '#shared/schemas/runs.ts';
import { CoverageMapFigure } from '#src/components/figures/coverage-map-figure.tsx';
import { PlaneFiguresTable, SpreadWidthsTable } from '#src/components/figures/plane-tables.tsx';
import { SegmentedChoice } from '#src/components/segmented-choice.tsx';
import { formatFigure, formatLength } from '#src/lib/format.ts';

const ProfileChart = lazy(() => import('#src/components/figures/profile-chart.tsx').then((m) => ({ default: m.ProfileChart })));
const FalloffChart = lazy(() => import('#src/components/figures/falloff-chart.tsx').then((m) => ({ default: m.FalloffChart })));

const BAND_LABEL: Record<string, string> = { combined: 'Combined', red: 'Red', nir: 'Near-infrared' };

/**
 * The figures the public will see, for staff: per band and distance the coverage map with its
 * 80/50/25 % isolines, the spread widths and uniformity, the lateral profile and the falloff
 * against inverse square. Maps are drawn from the readings with the shared analysis; the numbers
 * in the tables are the server's, computed the same way.
 */
export function RunFigures({ run, readings, analysis }: { run: Run; readings: readonly Reading[]; analysis: RunAnalysis }) {
  // A meter reads one broadband value: only the combined band has figures.
  const bands =
    run.instrument.kind === 'irradiance_meter'
      ? ['combined']
      : ['combined', ...Object.entries(run.bands).sort(([, a], [, b]) => a.loNm - b.loNm).map(([name]) => name)];
  const [band, setBand] = useState('combined');
  const distances = analysis.planes.map((p) => p.distanceCm);
  const [picked, setPicked] = useState<number | null>(null);
  const distance = picked !== null && distances.includes(picked) ? picked : (distances[0] ?? null);
  const footprint = { widthCm: run.unit.emittingAreaCm.width, heightCm: run.unit.emittingAreaCm.height };

  const grid = useMemo(() => {
    const points = readings
      .filter((r) => r.slot === 'grid' && r.state === 'analysed' && r.values[band] !== null && r.values[band] !== undefined)
      .map((r) => ({ distanceCm: r.distanceCm, xCm: r.xCm, yCm: r.yCm, value: r.values[band] as number }));
    return analyzeGrid(points, { footprint });
  }, [readings, band, footprint.widthCm, footprint.heightCm]);

  if (distance === null) return <p className="font-sans text-sm text-ink-soft">The figures appear once readings are analysed.</p>;
  const plane = grid.planes.find((p) => Math.abs(p.distanceCm - distance) < 1e-6);
  const serverPlane = analysis.planes.find((p) => Math.abs(p.distanceCm - distance) < 1e-6);
  const row = plane?.analysis.spreadRowYCm ?? 0;
  const profile = grid.planes.map((p) => ({
    distanceCm: p.distanceCm,
    points: p.points.filter((q) => Math.abs(q.yCm - row) < 1e-6).sort((a, b) => a.xCm - b.xCm).map((q) => ({ xCm: q.xCm, value: q.value })),
  }));
  const centers = analysis.planes
    .map((p) => ({ distanceCm: p.distanceCm, value: p.bands[band]?.centerMwCm2 ?? null }))
    .filter((c): c is { distanceCm: number; value: number } => c.value !== null);

  return (
    <div className="space-y-8">
      <div className="flex flex-wrap gap-6">
        <SegmentedChoice legend="Band" options={bands.map((b) => ({ value: b, label: BAND_LABEL[b] ?? b }))} value={band} onChange={setBand} />
        <SegmentedChoice legend="Plane (distance)" options={distances.map((d) => ({ value: d, label: `${formatLength(d)} cm` }))} value={distance} onChange={setPicked} />
      </div>
      {analysis.stale ? <p className="font-sans text-sm text-signal">Readings changed: the figures are being recomputed…</p> : null}
      {plane && serverPlane?.bands[band] ? (
        <>
          <div className="grid grid-cols-1 gap-8 xl:grid-cols-[minmax(0,3fr)_minmax(0,2fr)] xl:items-start">
            <CoverageMapFigure plane={plane} />
            <PlaneFiguresTable analysis={plane.analysis} distanceCm={distance} footprint={footprint} />
          </div>
          <SpreadWidthsTable analysis={plane.analysis} plane={plane} />
        </>
      ) : (
        <p className="font-sans text-sm text-ink-soft">No {BAND_LABEL[band]?.toLowerCase() ?? band} values at {formatLength(distance)} cm.</p>
      )}
      <Suspense fallback={<p className="font-sans text-sm text-ink-soft">Drawing the charts…</p>}>
        <div className="grid gap-8 xl:grid-cols-2">
          <ProfileChart series={profile} rowLabel={`y = ${formatLength(row)} cm`} />
          <FalloffChart centers={centers} />
        </div>
      </Suspense>
      <p className="font-sans text-sm">
        Falloff exponent ({BAND_LABEL[band] ?? band}):{' '}
        <span className="font-semibold">{analysis.falloffExponent[band] === null || analysis.falloffExponent[band] === undefined ? '—' : formatFigure(analysis.falloffExponent[band] as number)}</span>{' '}
        <span className="text-ink-soft">(2 is the inverse-square law of a point source)</span>
      </p>
    </div>
  );
}

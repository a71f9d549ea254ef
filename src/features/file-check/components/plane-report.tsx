import type { FootprintCm } from '#shared/measurement/plane/uniformity.ts';
import type { GridPlane } from '#shared/measurement/check/analyze-grid.ts';
import { formatLength } from '#src/lib/format.ts';
import { CoverageMapFigure } from '#src/components/figures/coverage-map-figure.tsx';
import { PlaneFiguresTable, PlaneReadingsTable, SpreadWidthsTable } from '#src/components/figures/plane-tables.tsx';

/** Everything about one plane: its map, its figures, and its readings as numbers. */
export function PlaneReport({ plane, footprint }: { plane: GridPlane; footprint: FootprintCm | null }) {
  const d = formatLength(plane.distanceCm);
  return (
    <section aria-labelledby={`plane-${d}-heading`} className="space-y-6">
      <h3 id={`plane-${d}-heading`} className="text-xl font-semibold">
        Coverage at {d} cm
      </h3>
      <div className="grid grid-cols-1 gap-8 xl:grid-cols-[minmax(0,3fr)_minmax(0,2fr)] xl:items-start">
        <CoverageMapFigure plane={plane} />
        <PlaneFiguresTable analysis={plane.analysis} distanceCm={plane.distanceCm} footprint={footprint} />
      </div>
      <SpreadWidthsTable analysis={plane.analysis} plane={plane} />
      <details className="rounded-md border border-rule bg-paper-raised px-4 py-3">
        <summary className="cursor-pointer font-sans text-sm font-semibold text-signal">
          The measured readings at {d} cm as a table
        </summary>
        <div className="mt-3">
          <PlaneReadingsTable plane={plane} />
        </div>
      </details>
    </section>
  );
}

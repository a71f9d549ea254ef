import type { GridPlane } from '#shared/measurement/check/analyze-grid.ts';
import { CoverageMapFigure } from '#src/components/figures/coverage-map-figure.tsx';
import { useDisplayUnits } from '#src/lib/display-units.tsx';
import { sharedExtent } from '../utils/compare-planes.ts';
import { SharedScaleLegend } from './shared-scale-legend.tsx';

export interface ComparedPlane {
  key: string;
  label: string;
  plane: GridPlane | null;
}

/**
 * The coverage maps of the compared reports at one distance, side by side on one colour scale
 * (0 to the largest peak among them) and one frame, so colour and size read the same in each.
 */
export function CompareMaps({ planes, distanceCm }: { planes: readonly ComparedPlane[]; distanceCm: number }) {
  const units = useDisplayUnits();
  const drawn = planes.map((p) => p.plane).filter((p): p is GridPlane => p !== null);
  const peaks = drawn.map((p) => p.coverage.peak).filter((v): v is number => v !== null && v > 0);
  const scaleMax = peaks.length ? Math.max(...peaks) : null;
  const extent = sharedExtent(drawn);
  return (
    <div className="space-y-5">
      {scaleMax !== null ? <SharedScaleLegend scaleMax={scaleMax} /> : null}
      <ul className="grid gap-8 xl:grid-cols-2">
        {planes.map((p) => {
          const isoline50 = p.plane?.coverage.isolines.find((i) => i.levelPct === 50);
          return (
            <li key={p.key} className="min-w-0 space-y-2">
              <h3 className="font-sans text-base font-semibold">{p.label}</h3>
              {p.plane ? (
                <>
                  <p className="font-sans text-xs text-ink-soft">
                    Peak {units.formatIrradiance(p.plane.coverage.peak)}
                    {isoline50 ? `; ${units.formatArea(isoline50.areaCm2)} at or above half of it` : ''}.
                  </p>
                  <CoverageMapFigure
                    plane={p.plane}
                    scaleMax={scaleMax ?? undefined}
                    extentCm={extent}
                    legend={false}
                    lengthUnit={units.length}
                    title={`Coverage map of ${p.label} at ${units.formatLength(distanceCm)}`}
                  />
                </>
              ) : (
                <p className="font-sans text-sm text-ink-soft">Not measured at {units.formatLength(distanceCm)}.</p>
              )}
            </li>
          );
        })}
      </ul>
    </div>
  );
}

import { useMemo, useState } from 'react';
import { COMBINED_BAND } from '#shared/lab/band-values.ts';
import { bodyZoneCoverage } from '#shared/measurement/plane/zone-coverage.ts';
import type { PublicReport } from '#shared/schemas/reports.ts';
import { BodyCoverageFigure } from '#src/components/figures/body-coverage-figure.tsx';
import { BODY_ZONE_LABELS } from '#src/components/figures/body-zones.ts';
import { SegmentedChoice } from '#src/components/segmented-choice.tsx';
import { useDisplayUnits } from '#src/lib/display-units.tsx';
import { formatPercent } from '#src/lib/format.ts';
import { planeAt, useBandGrid } from '../hooks/use-band-grid.ts';
import { useBodyChoice } from '../hooks/use-body-choice.ts';
import { bandKeys, bandName, bandPhrase } from '../utils/bands.ts';
import { PLACEMENT_LABELS } from '../utils/body-placement.ts';
import { BodyControls } from './body-controls.tsx';
import { PlaneFiguresTable } from './plane-figures-table.tsx';
import { ReadingsTable } from './readings-table.tsx';
import { ReportSection } from './report-section.tsx';
import { ZoneCoverageTable, type CoverageLevel } from './zone-coverage-table.tsx';

/** Zones summed up in words under the controls, as the reader changes them. */
const SUMMARY_ZONES = ['chest', 'abdomen'] as const;

/**
 * Coverage per distance: the reader picks a distance and a band, a body size and where the unit
 * faces the body; the map with its isolines is drawn over the body outline, and a table gives the
 * covered share of each body zone at each level. Maps are the first unit's readings.
 */
export function CoverageSection({ report }: { report: PublicReport }) {
  const units = useDisplayUnits();
  const bands = bandKeys(report);
  const distances = [...report.grid.distancesCm].sort((a, b) => a - b);
  const [band, setBand] = useState<string>(COMBINED_BAND);
  const [pickedDistance, setDistance] = useState<number>(distances.includes(30) ? 30 : distances[0]);
  const distance = distances.includes(pickedDistance) ? pickedDistance : distances[0];
  const body = useBodyChoice();

  const grid = useBandGrid(report, band);
  const plane = planeAt(grid, distance);
  const figures = report.planes.find((p) => Math.abs(p.distanceCm - distance) < 1e-6)?.bands[band] ?? null;
  const levels: CoverageLevel[] = useMemo(
    () => (plane ? plane.coverage.isolines.filter((i) => i.levelPct !== null).map((i) => ({ pct: i.levelPct as number, valueMwCm2: i.value })) : []),
    [plane],
  );
  // The last level, −∞, counts every sample with a value: the share inside the measured grid.
  const zones = useMemo(
    () => (plane ? bodyZoneCoverage(plane.coverage.field.valueAt, body.overlay, [...levels.map((l) => l.valueMwCm2), Number.NEGATIVE_INFINITY]) : []),
    [plane, body.overlay, levels],
  );

  const where = `${units.formatLength(distance)}, ${bandPhrase(report, band)}`;
  const placement =
    body.form.placement === 'custom' ? `at ${units.formatLength(body.unitCenterHeightCm)} above the floor` : `at the ${PLACEMENT_LABELS[body.form.placement].toLowerCase()}`;
  const placementText = `The unit's centre faces the body ${placement} (${units.formatLength(body.unitCenterHeightCm)} above the floor).`;
  const fifty = levels.findIndex((l) => l.pct === 50);
  const summary =
    fifty >= 0
      ? SUMMARY_ZONES.map((name) => {
          const z = zones.find((x) => x.name === name);
          const s = z?.shares[fifty];
          return s === null || s === undefined ? null : `${formatPercent(s)} of the ${BODY_ZONE_LABELS[name].toLowerCase()}`;
        })
          .filter(Boolean)
          .join(' and ')
      : '';

  return (
    <ReportSection
      id="coverage"
      title="Coverage per distance"
      lede="Where the light lands on a body in front of the unit. Pick a distance and a band, then a body size and where the unit's centre faces it; the table under the figure gives the share of each part of the body that gets at least 80, 50 or 25 % of the plane's peak."
    >
      <div className="flex flex-wrap gap-x-8 gap-y-4">
        <SegmentedChoice
          legend="Distance from the emitting surface"
          options={distances.map((d) => ({ value: d, label: units.formatLength(d) }))}
          value={distance}
          onChange={setDistance}
        />
        <SegmentedChoice legend="Band" options={bands.map((b) => ({ value: b, label: bandName(b) }))} value={band} onChange={setBand} />
      </div>
      <BodyControls form={body.form} setForm={body.setForm} setSize={body.setSize} setPlacement={body.setPlacement} errors={body.errors} />
      {summary ? (
        <p aria-live="polite" className="max-w-measure font-sans text-sm font-semibold text-ink">
          At {units.formatLength(distance)}, {summary} get at least 50 % of the peak ({bandName(band).toLowerCase()} band).
        </p>
      ) : null}

      {plane && figures ? (
        <>
          <div className="grid grid-cols-1 gap-8 xl:grid-cols-[minmax(0,3fr)_minmax(0,2fr)] xl:items-start">
            <BodyCoverageFigure
              plane={plane}
              overlay={body.overlay}
              emittingAreaCm={report.model.emittingAreaCm}
              label={bandPhrase(report, band)}
              placementText={placementText}
            />
            <PlaneFiguresTable figures={figures} plane={plane} title={`Figures at ${where}`} />
          </div>
          <ZoneCoverageTable zones={zones} levels={levels} title={`Covered share of each body zone at ${where}`} />
          <p className="max-w-measure font-sans text-xs text-ink-soft">
            Each zone is sampled every 5 mm; a sample outside the measured grid counts as not covered, because nothing is
            extrapolated. The outline and its zones are a drawing aid of round proportions, not anthropometric data.
          </p>
          <ReadingsTable plane={plane} title={`Readings at ${where}`} />
        </>
      ) : (
        <p className="font-sans text-sm text-ink-soft">
          No {bandName(band).toLowerCase()} readings at {units.formatLength(distance)}.
        </p>
      )}
    </ReportSection>
  );
}

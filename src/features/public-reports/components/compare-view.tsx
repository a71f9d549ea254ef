import { lazy, Suspense, useMemo } from 'react';
import { Link } from 'react-router-dom';
import type { PublicReport } from '#shared/schemas/reports.ts';
import { Alert } from '#src/components/alert.tsx';
import { Button } from '#src/components/button.tsx';
import { ErrorState } from '#src/components/error-state.tsx';
import { SegmentedChoice } from '#src/components/segmented-choice.tsx';
import { Spinner } from '#src/components/spinner.tsx';
import { UnitsToggle } from '#src/components/units-toggle.tsx';
import { isApiError } from '#src/lib/api-client.ts';
import { useDisplayUnits } from '#src/lib/display-units.tsx';
import { formatDate } from '#src/lib/format.ts';
import { usePublicReportsBySlug } from '../api/get-public-report.ts';
import { usePublicReports } from '../api/get-public-reports.ts';
import { MIN_COMPARED, useCompareSelection } from '../hooks/use-compare-selection.ts';
import { allDistances, defaultDistance, planeAt, profileRow, reportGrid } from '../utils/compare-planes.ts';
import { CompareFiguresTable, type ComparedReport } from './compare-figures-table.tsx';
import { CompareMaps } from './compare-maps.tsx';
import { ComparePicker } from './compare-picker.tsx';
import { MeasurementsNote } from './measurements-note.tsx';

// Chart code loads only when a comparison is drawn.
const ProfileOverlayChart = lazy(() => import('./profile-overlay-chart.tsx').then((m) => ({ default: m.ProfileOverlayChart })));

/** Two to four published reports side by side on the same scales; the choice lives in the URL. */
export function CompareView() {
  const selection = useCompareSelection();
  const list = usePublicReports();
  const results = usePublicReportsBySlug(selection.slugs);
  const units = useDisplayUnits();

  const loaded = results.map((r) => r.data).filter((r): r is PublicReport => r !== undefined);
  const loadedKey = loaded.map((r) => `${r.slug}@${r.version}`).join('|');
  // useQueries hands back new arrays on every render: analyse again only when other versions arrive.
  const compared: ComparedReport[] = useMemo(() => loaded.map((report) => ({ report, grid: reportGrid(report) })), [loadedKey]);
  const distances = allDistances(compared.map((c) => c.grid));
  const distance =
    selection.distanceCm !== null && distances.some((d) => Math.abs(d - selection.distanceCm!) < 1e-6)
      ? selection.distanceCm
      : defaultDistance(compared.map((c) => c.grid));
  const pending = results.some((r) => r.isPending);
  const failed = selection.slugs.map((slug, i) => ({ slug, result: results[i] })).filter((f) => f.result?.isError);

  return (
    <div className="space-y-section">
      {list.isError ? (
        <ErrorState inline title="The list of reports could not be loaded" error={list.error} onRetry={() => void list.refetch()} />
      ) : list.isPending ? (
        <Spinner label="Loading the list of reports…" />
      ) : (
        <ComparePicker selection={selection} reports={list.data} />
      )}

      {failed.map(({ slug, result }) => (
        <Alert key={slug} tone="warning" title={`“${slug}” cannot be compared`}>
          <p>
            {isApiError(result?.error) && result.error.code === 'not_found'
              ? 'No published report has this address: it may never have been published, or the link is mistyped.'
              : 'It could not be loaded. Try again in a moment.'}
          </p>
          <Button variant="secondary" size="sm" className="mt-2" onClick={() => selection.remove(slug)}>
            Remove it from the comparison
          </Button>
        </Alert>
      ))}

      {selection.slugs.length < MIN_COMPARED ? (
        <div className="max-w-measure space-y-2 text-lg text-ink-soft">
          <p>
            Choose {selection.slugs.length === 0 ? 'two to four reports' : 'at least one more report'} to see their profiles, maps and key
            figures side by side, on the same scales.
          </p>
          {selection.slugs.length === 0 && list.data && list.data.length >= MIN_COMPARED ? (
            <p>
              <Link to={`/compare?${list.data.slice(0, MIN_COMPARED).map((r) => `r=${encodeURIComponent(r.slug)}`).join('&')}`}>
                Compare the two newest reports
              </Link>
            </p>
          ) : null}
        </div>
      ) : pending ? (
        <Spinner label="Loading the reports…" />
      ) : compared.length >= MIN_COMPARED && distance !== null ? (
        <>
          {compared
            .filter((c) => c.report.retracted)
            .map((c) => (
              <Alert key={c.report.slug} tone="warning" title={`${c.report.title} was retracted on ${formatDate(c.report.retracted!.at)}`}>
                {c.report.retracted!.reason}
              </Alert>
            ))}
          <div className="flex flex-wrap items-end gap-8">
            <SegmentedChoice
              legend="Distance for the profiles and maps"
              options={distances.map((d) => ({ value: d, label: units.formatLength(d) }))}
              value={distance}
              onChange={selection.setDistance}
            />
            <UnitsToggle />
          </div>
          <MeasurementsNote />

          <section aria-labelledby="compare-figures" className="space-y-3">
            <h2 id="compare-figures" className="text-xl font-semibold">
              Key figures
            </h2>
            <CompareFiguresTable compared={compared} distanceCm={distance} />
          </section>

          <section aria-labelledby="compare-profiles" className="space-y-3">
            <h2 id="compare-profiles" className="text-xl font-semibold">
              Lateral profiles at {units.formatLength(distance)}
            </h2>
            <p className="max-w-measure text-sm text-ink-soft">
              Irradiance along each unit's centre row (y = 0), as measured, every report on the same axes. A flat top means even
              light across the unit; the width at half height is the 50 % spread.
            </p>
            <Suspense fallback={<Spinner label="Drawing the chart…" />}>
              <ProfileOverlayChart
                distanceLabel={units.formatLength(distance)}
                xUnit={units.length}
                yUnit={units.irradiance}
                series={compared.flatMap((c) => {
                  const plane = planeAt(c.grid, distance);
                  if (!plane) return [];
                  const row = profileRow(plane);
                  return [
                    {
                      key: c.report.slug,
                      label: c.report.title,
                      rowY: units.lengthValue(row.rowYCm),
                      points: row.points.map((p) => ({ x: units.lengthValue(p.xCm), value: units.irradianceValue(p.value) })),
                    },
                  ];
                })}
              />
            </Suspense>
          </section>

          <section aria-labelledby="compare-maps" className="space-y-3">
            <h2 id="compare-maps" className="text-xl font-semibold">
              Coverage maps at {units.formatLength(distance)}
            </h2>
            <p className="max-w-measure text-sm text-ink-soft">
              One colour scale and one frame for every map: the same colour is the same irradiance, and a centimetre is as long on
              each. The isolines mark 80, 50 and 25 % of each unit's own peak.
            </p>
            <CompareMaps
              distanceCm={distance}
              planes={compared.map((c) => ({ key: c.report.slug, label: c.report.title, plane: planeAt(c.grid, distance) }))}
            />
          </section>
        </>
      ) : null}
    </div>
  );
}

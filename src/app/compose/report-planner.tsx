import { lazy, Suspense, useMemo } from 'react';
import { COMBINED_BAND } from '#shared/lab/band-values.ts';
import { snapshotPoints } from '#shared/lab/report-snapshot.ts';
import type { MeasuredPlane } from '#shared/measurement/planner/types.ts';
import type { PublicReport } from '#shared/schemas/reports.ts';
import { Spinner } from '#src/components/spinner.tsx';

// The planner (and its solver) loads only when a report page draws it.
const PlannerSection = lazy(() => import('#src/features/planner/components/planner-section.tsx').then((m) => ({ default: m.PlannerSection })));

/** The report's primary unit, combined band, one plane per measured distance, as the planner reads them. */
export function reportPlannerPlanes(report: Pick<PublicReport, 'readings' | 'units'>): MeasuredPlane[] {
  const byDistance = new Map<number, MeasuredPlane & { points: { xCm: number; yCm: number; value: number }[] }>();
  for (const p of snapshotPoints(report, COMBINED_BAND)) {
    const plane = byDistance.get(p.distanceCm) ?? { distanceCm: p.distanceCm, points: [] };
    plane.points.push({ xCm: p.xCm, yCm: p.yCm, value: p.value });
    byDistance.set(p.distanceCm, plane);
  }
  return [...byDistance.values()].sort((a, b) => a.distanceCm - b.distanceCm);
}

/** The session planner on a report page, over the frozen readings of that version. */
export function ReportPlanner({ report }: { report: PublicReport }) {
  const planes = useMemo(() => reportPlannerPlanes(report), [report]);
  if (planes.length === 0) return null;
  const unit = report.units[0];
  return (
    <Suspense fallback={<Spinner label="Loading the session planner…" />}>
      <PlannerSection
        planes={planes}
        unitLabel={`${report.model.makerName} ${report.model.name}${unit ? `, unit ${unit.serial}` : ''}`}
        unitSizeCm={{ widthCm: report.model.emittingAreaCm.width, heightCm: report.model.emittingAreaCm.height }}
      />
    </Suspense>
  );
}

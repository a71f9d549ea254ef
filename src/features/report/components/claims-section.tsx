import { COMBINED_BAND } from '#shared/lab/band-values.ts';
import type { PublicReport } from '#shared/schemas/reports.ts';
import { useDisplayUnits } from '#src/lib/display-units.tsx';
import { formatFigure, formatLength } from '#src/lib/format.ts';
import { planeAt, useBandGrid } from '../hooks/use-band-grid.ts';
import { claimsForDisplay } from '../utils/claims-display.ts';
import { withReaderLengths } from '../utils/reader-lengths.ts';
import { ReportSection } from './report-section.tsx';
import { caption, td, th, thNum, thRow, tdNum } from './table-styles.ts';
import { ScrollRegion } from './scroll-region.tsx';

/** The maker's claims beside what we measured, in one table; the fitted beam angle beside the claimed one. */
export function ClaimsSection({ report }: { report: PublicReport }) {
  const units = useDisplayUnits();
  const combined = useBandGrid(report, COMBINED_BAND);
  const at30 = planeAt(combined, 30);
  const area50 = at30?.coverage.isolines.find((i) => i.levelPct === 50)?.areaCm2 ?? null;
  const rows = claimsForDisplay(report, units, area50);
  const beam = report.beamAngle;
  return (
    <ReportSection
      id="claims"
      title="Claims against measurements"
      lede="What the maker states, and what our bench measured, side by side. A ratio is given where the two are the same kind of figure."
    >
      <ScrollRegion label="Claims and measurements, scrollable">
        <table className="w-full border-collapse">
          <caption className={caption}>Claims and measurements</caption>
          <thead>
            <tr>
              <th scope="col" className={th}>Figure</th>
              <th scope="col" className={th}>Claimed</th>
              <th scope="col" className={th}>Measured</th>
              <th scope="col" className={thNum}>Measured ÷ claimed</th>
            </tr>
          </thead>
          <tbody>
            {rows.map((r) => (
              <tr key={r.key}>
                <th scope="row" className={thRow}>{r.label}</th>
                <td className={td}>{r.claimed}</td>
                <td className={td}>
                  <span className="font-semibold">{r.measured}</span>
                  {r.note ? <p className="mt-1 font-sans text-xs text-ink-soft">{withReaderLengths(r.note, units.formatLength)}</p> : null}
                </td>
                <td className={tdNum}>{r.ratio === null ? '—' : formatFigure(r.ratio)}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </ScrollRegion>
      {beam ? (
        <p className="max-w-measure font-sans text-sm text-ink-soft">
          The effective beam angle ({formatLength(beam.fittedFullAngleDeg)}°, full angle at half intensity) is the LED emission
          pattern that best reproduces our lateral profiles and the falloff with distance for this emitting area; the fitted
          model differs from the readings by {formatFigure(beam.residualRms * 100)} % RMS. It describes the unit as a whole,
          not one LED's data sheet.
        </p>
      ) : null}
    </ReportSection>
  );
}

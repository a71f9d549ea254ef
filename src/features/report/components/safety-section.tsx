import type { PublicReport } from '#shared/schemas/reports.ts';
import { Cautions } from '#src/components/cautions.tsx';
import { useDisplayUnits } from '#src/lib/display-units.tsx';
import { formatFigure } from '#src/lib/format.ts';
import { formatMinutes } from '../utils/format-minutes.ts';
import { withReaderLengths } from '../utils/reader-lengths.ts';
import { ReportSection } from './report-section.tsx';
import { caption, td, thNum, th, thRow, tdNum } from './table-styles.ts';
import { ScrollRegion } from './scroll-region.tsx';

const pct = (fraction: number) => `${formatFigure(fraction * 100)} %`;
const seconds = (s: number | null) => (s === null ? '—' : `${formatMinutes(s)} (${formatFigure(s)} s)`);

/** The uncertainty statement and its budget, the infrared eye screening and the cautions. */
export function SafetySection({ report }: { report: PublicReport }) {
  const units = useDisplayUnits();
  const u = report.uncertainty;
  const ir = report.irScreening;
  // E_IR is published in W/m² (the standard's unit); 1 mW/cm² = 10 W/m².
  const irradiance = (wm2: number | null) => (wm2 === null ? '—' : units.formatIrradiance(wm2 / 10));
  return (
    <ReportSection id="safety" title="Safety and certainty">
      <div className="space-y-4">
        <h3 className="text-xl font-semibold">How certain the figures are</h3>
        {u ? (
          <>
            <p className="max-w-measure">{withReaderLengths(u.statement, units.formatLength)}</p>
            <ScrollRegion label="Uncertainty budget, scrollable">
              <table className="w-full border-collapse">
                <caption className={caption}>
                  Uncertainty budget for irradiance at {units.formatLength(u.distanceCm)} (relative standard uncertainties, k = 1)
                </caption>
                <thead>
                  <tr>
                    <th scope="col" className={th}>Component</th>
                    <th scope="col" className={th}>Type</th>
                    <th scope="col" className={thNum}>Standard uncertainty</th>
                    <th scope="col" className={thNum}>Sensitivity</th>
                    <th scope="col" className={thNum}>Contribution</th>
                  </tr>
                </thead>
                <tbody>
                  {u.components.map((c) => (
                    <tr key={c.key}>
                      <th scope="row" className={thRow}>{c.label}</th>
                      <td className={td}>{c.type}</td>
                      <td className={tdNum}>{pct(c.inputRelative)}</td>
                      <td className={tdNum}>{formatFigure(c.sensitivity)}</td>
                      <td className={tdNum}>{pct(Math.abs(c.contributionRelative))}</td>
                    </tr>
                  ))}
                  <tr>
                    <th scope="row" className={thRow}>Combined standard uncertainty</th>
                    <td className={td} colSpan={3} />
                    <td className={`${tdNum} font-semibold`}>{pct(u.combinedRelative)}</td>
                  </tr>
                  <tr>
                    <th scope="row" className={thRow}>Expanded uncertainty (k = {formatFigure(u.coverageFactor)}, about 95 %)</th>
                    <td className={td} colSpan={3} />
                    <td className={`${tdNum} font-semibold`}>{pct(u.expandedRelative)}</td>
                  </tr>
                </tbody>
              </table>
            </ScrollRegion>
            <p className="max-w-measure font-sans text-xs text-ink-soft">
              Following the GUM (JCGM 100:2008): type A from repeated readings, type B from certificates and known limits; the
              distance enters through the local falloff exponent.
            </p>
          </>
        ) : (
          <p className="font-sans text-sm text-ink-soft">No uncertainty budget was published with this version.</p>
        )}
      </div>

      <div className="space-y-4">
        <h3 className="text-xl font-semibold">Infrared eye-hazard screening</h3>
        <p className="max-w-measure">
          <strong>A screening estimate, not a risk-group classification.</strong> It applies the infrared limit for the eye of
          IEC 62471 (780–3000 nm) to the centre spectrum; a classification needs the standard's own measurement conditions.
        </p>
        {ir ? (
          <>
            <table className="w-full max-w-3xl border-collapse">
              <caption className={caption}>Infrared irradiance at the eye, at {units.formatLength(ir.distanceCm)} from the centre</caption>
              <thead>
                <tr>
                  <th scope="col" className={th}>Estimate</th>
                  <th scope="col" className={thNum}>E_IR</th>
                  <th scope="col" className={thNum}>Longest exposure within the limit</th>
                </tr>
              </thead>
              <tbody>
                <tr>
                  <th scope="row" className={thRow}>As measured</th>
                  <td className={tdNum}>{irradiance(ir.measuredWm2)}</td>
                  <td className={tdNum}>{seconds(ir.maxSecondsMeasured)}</td>
                </tr>
                <tr>
                  <th scope="row" className={thRow}>Upper bound</th>
                  <td className={tdNum}>{irradiance(ir.upperBoundWm2)}</td>
                  <td className={tdNum}>{seconds(ir.maxSecondsAtUpperBound)}</td>
                </tr>
              </tbody>
            </table>
            {ir.reason ? <p className="max-w-measure font-sans text-sm text-ink-soft">{ir.reason}</p> : null}
            {ir.note ? (
              <p className="max-w-measure rounded border-l-4 border-warn bg-warn-tint px-4 py-2 font-sans text-sm">
                <span className="font-semibold">The instrument may under-read: </span>
                {ir.note}
              </p>
            ) : null}
          </>
        ) : (
          <p className="font-sans text-sm text-ink-soft">No spectrum was recorded, so there is no infrared screening.</p>
        )}
      </div>

      <Cautions headingLevel={3} />
    </ReportSection>
  );
}

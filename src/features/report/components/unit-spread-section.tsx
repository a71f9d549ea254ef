import type { PublicReport } from '#shared/schemas/reports.ts';
import { useDisplayUnits } from '#src/lib/display-units.tsx';
import { formatFigure } from '#src/lib/format.ts';
import { withReaderLengths } from '../utils/reader-lengths.ts';
import { ReportSection } from './report-section.tsx';
import { caption, thNum, th, thRow, tdNum } from './table-styles.ts';
import { ScrollRegion } from './scroll-region.tsx';

/** For a report over several units: each key figure per unit and how far apart they are. */
export function UnitSpreadSection({ report }: { report: PublicReport }) {
  const units = useDisplayUnits();
  const rows = report.unitSpread;
  if (!rows || rows.length === 0) return null;
  const serials = report.units.map((u) => u.serial);
  const value = (v: number | null, unit: string) => {
    if (v === null) return '—';
    if (unit === 'mW/cm²') return units.formatIrradiance(v);
    if (unit === 'cm') return units.formatLength(v);
    return unit ? `${formatFigure(v)} ${unit}` : formatFigure(v);
  };
  return (
    <ReportSection
      id="spread"
      title="Unit-to-unit spread"
      lede={`This report covers ${serials.length} units of the model. The spread is (largest − smallest) ÷ mean; the maps and the spectrum above are the first unit's.`}
    >
      <ScrollRegion label="Unit-to-unit spread, scrollable">
        <table className="w-full border-collapse">
          <caption className={caption}>Key figures per unit</caption>
          <thead>
            <tr>
              <th scope="col" className={th}>Figure</th>
              {serials.map((s) => (
                <th key={s} scope="col" className={thNum}>
                  {s}
                </th>
              ))}
              <th scope="col" className={thNum}>Spread</th>
            </tr>
          </thead>
          <tbody>
            {rows.map((r) => (
              <tr key={r.figure}>
                <th scope="row" className={thRow}>{withReaderLengths(r.figure, units.formatLength)}</th>
                {serials.map((s) => (
                  <td key={s} className={tdNum}>
                    {value(r.values.find((v) => v.serial === s)?.value ?? null, r.unit)}
                  </td>
                ))}
                <td className={`${tdNum} font-semibold`}>{r.spreadPct === null ? '—' : `${formatFigure(r.spreadPct)} %`}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </ScrollRegion>
    </ReportSection>
  );
}

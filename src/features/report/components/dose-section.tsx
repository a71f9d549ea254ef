import { COMBINED_BAND } from '#shared/lab/band-values.ts';
import type { PublicReport } from '#shared/schemas/reports.ts';
import { Cautions } from '#src/components/cautions.tsx';
import { useDisplayUnits } from '#src/lib/display-units.tsx';
import { formatTick } from '#src/lib/format.ts';
import { minutesText } from '../utils/format-minutes.ts';
import { ReportSection } from './report-section.tsx';
import { caption } from './table-styles.ts';
import { ScrollRegion } from './scroll-region.tsx';

const cell = 'border-b border-rule px-2 py-2 text-right align-top font-sans text-sm tabular-nums whitespace-nowrap';
const sub = 'bl-label border-b border-rule px-2 py-2 text-right align-bottom';

/**
 * Minutes to reach each target dose at the centre and on the 50 % isoline, per distance: the
 * arithmetic H = E·t on the measured irradiance (combined band), with the cautions beside it.
 */
export function DoseSection({ report }: { report: PublicReport }) {
  const units = useDisplayUnits();
  const targets = report.doseTargetsJCm2;
  const centerAt = (d: number) => report.planes.find((p) => Math.abs(p.distanceCm - d) < 1e-6)?.bands[COMBINED_BAND]?.centerMwCm2 ?? null;
  return (
    <ReportSection
      id="dose"
      title="Dose table"
      lede={
        <p>
          How many minutes the measured irradiance (red and near-infrared together) takes to add up to each dose, at the
          centre and on the 50 % isoline. <strong>These are arithmetic on our measurements (dose = irradiance × time), not
          treatment advice</strong>; local regulations and licensed practice come first.
        </p>
      }
    >
      <div className="grid grid-cols-1 gap-8 xl:grid-cols-[minmax(0,2fr)_minmax(0,1fr)] xl:items-start">
        <ScrollRegion label="Dose table, scrollable">
          <table className="w-full border-collapse">
            <caption className={caption}>Minutes to reach each dose (radiant exposure, J/cm²)</caption>
            <thead>
              <tr>
                <th scope="col" rowSpan={2} className="bl-label border-b border-rule px-2 py-2 text-left align-bottom">
                  Distance
                  <span className="block font-normal normal-case tracking-normal">irradiance at the centre / on the 50 % isoline</span>
                </th>
                {targets.map((t) => (
                  <th key={t} scope="colgroup" colSpan={2} className="bl-label border-b border-rule px-2 pt-2 text-center">
                    {formatTick(t)} J/cm²
                  </th>
                ))}
              </tr>
              <tr>
                {targets.map((t) => (
                  <DoseSubheaders key={t} />
                ))}
              </tr>
            </thead>
            <tbody>
              {report.doseTable.map((row) => (
                <tr key={row.distanceCm}>
                  <th scope="row" className="border-b border-rule px-2 py-2 text-left align-top font-sans text-sm">
                    <span className="font-semibold">{units.formatLength(row.distanceCm)}</span>
                    <span className="block whitespace-nowrap text-xs font-normal text-ink-soft">
                      {units.formatIrradiance(centerAt(row.distanceCm))} / {units.formatIrradiance(row.isoline50MwCm2)}
                    </span>
                  </th>
                  {targets.map((t) => {
                    const time = row.times.find((x) => x.doseJcm2 === t);
                    return [
                      <td key={`${t}c`} className={`${cell} font-semibold`}>{minutesText(time?.centerSeconds)}</td>,
                      <td key={`${t}i`} className={cell}>{minutesText(time?.isoline50Seconds)}</td>,
                    ];
                  })}
                </tr>
              ))}
            </tbody>
          </table>
          <p className="mt-2 font-sans text-xs text-ink-soft">
            Minutes, rounded to a tenth below 10 and to whole minutes above. On the 50 % isoline the irradiance is half the
            plane's peak, so the time there is twice the time at the peak; beyond the isoline it is longer still.
          </p>
        </ScrollRegion>
        <Cautions headingLevel={3} title="Cautions for these times" />
      </div>
    </ReportSection>
  );
}

/** The second header row: centre and isoline under each dose. */
function DoseSubheaders() {
  return (
    <>
      <th scope="col" className={sub}>Centre</th>
      <th scope="col" className={sub}>50 % isoline</th>
    </>
  );
}

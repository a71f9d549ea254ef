import type { BodyZoneCoverage } from '#shared/measurement/plane/zone-coverage.ts';
import { BODY_ZONE_LABELS } from '#src/components/figures/body-zones.ts';
import { useDisplayUnits } from '#src/lib/display-units.tsx';
import { formatPercent } from '#src/lib/format.ts';
import { caption, thNum, th, thRow, tdNum } from './table-styles.ts';
import { ScrollRegion } from './scroll-region.tsx';

export interface CoverageLevel {
  pct: number;
  /** The level's irradiance, mW/cm². */
  valueMwCm2: number;
}

const share = (v: number | null | undefined) => (v === null || v === undefined ? '—' : formatPercent(v));

/**
 * Per body zone, the share of its area at or above each isoline level, and the share inside the
 * measured grid (the rest counts as not covered). `zones[i].shares` holds the levels in order,
 * then the in-grid share last.
 */
export function ZoneCoverageTable({ zones, levels, title }: { zones: readonly BodyZoneCoverage[]; levels: readonly CoverageLevel[]; title: string }) {
  const units = useDisplayUnits();
  return (
    <ScrollRegion label={`${title}, scrollable`}>
      <table className="w-full border-collapse">
        <caption className={caption}>{title}</caption>
        <thead>
          <tr>
            <th scope="col" className={th}>Body zone</th>
            <th scope="col" className={thNum}>Zone area</th>
            {levels.map((l) => (
              <th key={l.pct} scope="col" className={thNum}>
                ≥ {l.pct} % of peak
                <span className="block font-normal normal-case tracking-normal">≥ {units.formatIrradiance(l.valueMwCm2)}</span>
              </th>
            ))}
            <th scope="col" className={thNum}>Inside the measured grid</th>
          </tr>
        </thead>
        <tbody>
          {zones.map((z) => (
            <tr key={z.name}>
              <th scope="row" className={thRow}>{BODY_ZONE_LABELS[z.name]}</th>
              <td className={tdNum}>{units.formatArea(z.areaCm2)}</td>
              {levels.map((l, i) => (
                <td key={l.pct} className={`${tdNum} font-semibold`}>
                  {share(z.shares[i])}
                </td>
              ))}
              <td className={tdNum}>{share(z.shares[levels.length])}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </ScrollRegion>
  );
}

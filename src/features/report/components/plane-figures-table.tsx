import type { GridPlane } from '#shared/measurement/check/analyze-grid.ts';
import { STANDARD_LEVELS_PCT } from '#shared/measurement/plane/levels.ts';
import type { PublicReport } from '#shared/schemas/reports.ts';
import { useDisplayUnits } from '#src/lib/display-units.tsx';
import { formatFigure } from '#src/lib/format.ts';
import { withReaderLengths } from '../utils/reader-lengths.ts';
import { caption, td, th, thRow } from './table-styles.ts';

type PlaneFigures = NonNullable<PublicReport['planes'][number]['bands'][string]>;

const ratio = (v: number | null | undefined) => (v === null || v === undefined ? '—' : formatFigure(v));
const pct = (v: number | null | undefined) => (v === null || v === undefined ? '—' : `${formatFigure(v)} %`);

/**
 * One plane's figures as published (peak, centre, spread widths, uniformity over the emitting
 * area), with the area at or above each level from the map. "≥" marks a width or area that runs
 * into the edge of the measured grid: the true value is larger.
 */
export function PlaneFiguresTable({ figures, plane, title }: { figures: PlaneFigures; plane: GridPlane | null; title: string }) {
  const units = useDisplayUnits();
  const a = figures.footprintArea;
  const r = figures.footprint;
  return (
    <div className="space-y-3">
      <table className="w-full border-collapse">
        <caption className={caption}>{title}</caption>
        <tbody>
          <tr>
            <th scope="row" className={thRow}>Peak</th>
            <td colSpan={2} className={`${td} font-semibold`}>{units.formatIrradiance(figures.peakMwCm2)}</td>
          </tr>
          <tr>
            <th scope="row" className={thRow}>Centre</th>
            <td colSpan={2} className={`${td} font-semibold`}>
              {figures.centerMwCm2 === null ? 'not measured' : units.formatIrradiance(figures.centerMwCm2)}
            </td>
          </tr>
          <tr>
            <th scope="col" className={th}>Level</th>
            <th scope="col" className={th}>Spread width (centre row)</th>
            <th scope="col" className={th}>Area at or above</th>
          </tr>
          {STANDARD_LEVELS_PCT.map((level) => {
            const width = figures.spreadWidthCm[String(level)];
            const index = plane ? plane.coverage.isolines.findIndex((i) => i.levelPct === level) : -1;
            const iso = plane && index >= 0 ? plane.coverage.isolines[index] : null;
            const isoAtEdge = plane && index >= 0 ? plane.isolineAtEdge[index] : false;
            return (
              <tr key={level}>
                <th scope="row" className={thRow}>{level} % of peak</th>
                <td className={td}>
                  {width === undefined ? '—' : `${figures.widthAtEdge.includes(level) ? '≥ ' : ''}${units.formatLength(width)}`}
                </td>
                <td className={td}>{iso ? `${isoAtEdge ? '≥ ' : ''}${units.formatArea(iso.areaCm2)}` : '—'}</td>
              </tr>
            );
          })}
          {a || r ? (
            <>
              <tr>
                <th scope="col" className={th}>Uniformity over the emitting area</th>
                <th scope="col" className={th}>Over the area (map)</th>
                <th scope="col" className={th}>Readings only</th>
              </tr>
              <tr>
                <th scope="row" className={thRow}>Min ÷ mean (U₀)</th>
                <td className={`${td} font-semibold`}>{ratio(a?.minOverMean)}</td>
                <td className={td}>{ratio(r?.minOverMean)}</td>
              </tr>
              <tr>
                <th scope="row" className={thRow}>Min ÷ max</th>
                <td className={td}>{ratio(a?.minOverMax)}</td>
                <td className={td}>{ratio(r?.minOverMax)}</td>
              </tr>
              <tr>
                <th scope="row" className={thRow}>Coefficient of variation</th>
                <td className={td}>{ratio(a?.cv)}</td>
                <td className={td}>{ratio(r?.cv)}</td>
              </tr>
              <tr>
                <th scope="row" className={thRow}>Non-uniformity</th>
                <td className={td}>{pct(a?.nonUniformityPct)}</td>
                <td className={td}>{pct(r?.nonUniformityPct)}</td>
              </tr>
            </>
          ) : null}
        </tbody>
      </table>
      {figures.widthAtEdge.length > 0 || (plane?.isolineAtEdge ?? []).some(Boolean) ? (
        <p className="font-sans text-xs text-ink-soft">≥: the region reaches the edge of the measured grid, so it is at least this large.</p>
      ) : null}
      {a && a.issues.length > 0 ? (
        <ul className="space-y-1 font-sans text-xs text-warn">
          {a.issues.map((i) => (
            <li key={i.code}>{withReaderLengths(i.message, units.formatLength)}</li>
          ))}
        </ul>
      ) : null}
    </div>
  );
}

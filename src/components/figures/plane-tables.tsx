import type { ReactNode } from 'react';
import type { PlaneAnalysis } from '#shared/measurement/plane/analyze-plane.ts';
import { mergeRepeatedPoints } from '#shared/measurement/plane/plane-points.ts';
import type { FootprintCm } from '#shared/measurement/plane/uniformity.ts';
import type { GridPlane } from '#shared/measurement/check/analyze-grid.ts';
import { formatFigure, formatLength, formatPercent } from '#src/lib/format.ts';
import { Irradiance } from './irradiance.tsx';
import { TRADE_CHART_UNITS, type ChartUnits } from './chart-units.ts';
import { cn } from '#src/lib/cn.ts';

const th = 'bl-label border-b border-rule px-3 py-2 text-left align-bottom';
const td = 'border-b border-rule px-3 py-2 text-sm align-top';

function Row({ label, children }: { label: string; children: ReactNode }) {
  return (
    <tr>
      <th scope="row" className="border-b border-rule px-3 py-2 text-left align-top font-sans text-sm font-semibold text-ink-soft">
        {label}
      </th>
      <td colSpan={2} className={td}>
        {children}
      </td>
    </tr>
  );
}

/** One uniformity figure: over the area (the headline) and from the readings alone, side by side. */
function UniformityRow({ label, area, readings }: { label: string; area: ReactNode; readings: ReactNode }) {
  return (
    <tr>
      <th scope="row" className="border-b border-rule px-3 py-2 text-left align-top font-sans text-sm font-semibold text-ink-soft">
        {label}
      </th>
      <td className={`${td} font-semibold`}>{area}</td>
      <td className={`${td} text-ink-soft`}>{readings}</td>
    </tr>
  );
}

const ratio = (v: number | null | undefined) => (v === null || v === undefined ? '—' : formatFigure(v));
const percentOf = (v: number | null | undefined) => (v === null || v === undefined ? '—' : formatPercent(v));
const pct = (v: number | null | undefined) => (v === null || v === undefined ? '—' : `${formatFigure(v)} %`);

/**
 * Peak, centre and, when an emitting area is given, the uniformity inside it: first from the
 * interpolated map, area-weighted (comparable across grids), then from the readings alone.
 */
export function PlaneFiguresTable({
  analysis,
  distanceCm,
  footprint,
}: {
  analysis: PlaneAnalysis;
  distanceCm: number;
  footprint: FootprintCm | null;
}) {
  const u = analysis.footprint;
  const a = analysis.footprintArea;
  return (
    <div className="space-y-3">
      <table className="w-full border-collapse">
        <caption className="pb-2 text-left font-sans text-sm font-semibold text-ink">
          Plane at {formatLength(distanceCm)} cm
        </caption>
        <tbody>
          <Row label="Measured positions">{analysis.points}</Row>
          <Row label="Peak">{analysis.peak === null ? '—' : <Irradiance mwCm2={analysis.peak} />}</Row>
          <Row label="Centre (x 0, y 0)">
            {analysis.center === null ? <span className="text-ink-muted">not measured</span> : <Irradiance mwCm2={analysis.center} />}
          </Row>
          {footprint && u ? (
            <>
              <tr>
                <th scope="col" className={th}>
                  Uniformity over {formatLength(footprint.widthCm)} × {formatLength(footprint.heightCm)} cm
                </th>
                <th scope="col" className={th}>
                  Over the area (map, area-weighted)
                </th>
                <th scope="col" className={th}>
                  Readings only ({u.points} inside)
                </th>
              </tr>
              <UniformityRow label="Minimum / mean (U₀)" area={ratio(a?.minOverMean)} readings={ratio(u.minOverMean)} />
              <UniformityRow label="Minimum / maximum" area={ratio(a?.minOverMax)} readings={ratio(u.minOverMax)} />
              <UniformityRow label="Coefficient of variation" area={percentOf(a?.cv)} readings={percentOf(u.cv)} />
              <UniformityRow
                label="Non-uniformity (max − min) / (max + min)"
                area={pct(a?.nonUniformityPct)}
                readings={pct(u.nonUniformityPct)}
              />
              {a && a.coveredShare < 1 ? <Row label="Area the readings cover">{formatPercent(a.coveredShare)}</Row> : null}
            </>
          ) : (
            <Row label="Uniformity over the emitting area">
              <span className="text-ink-muted">Give the emitting area (W × H) above to see it.</span>
            </Row>
          )}
        </tbody>
      </table>
      {footprint && a && a.issues.length > 0 ? (
        <ul aria-label={`Uniformity warnings at ${formatLength(distanceCm)} cm`} className="space-y-1">
          {a.issues.map((i) => (
            <li key={i.code} className="font-sans text-xs text-warn">
              {i.message}
            </li>
          ))}
        </ul>
      ) : null}
    </div>
  );
}

/** Per level: the spread width along the centre row and the area at or above the level. */
export function SpreadWidthsTable({ analysis, plane }: { analysis: PlaneAnalysis; plane: GridPlane }) {
  const row = analysis.spreadRowYCm;
  return (
    <div className="overflow-x-auto">
      <table className="w-full border-collapse">
        <caption className="pb-2 text-left font-sans text-sm font-semibold text-ink">
          Spread widths and areas at {formatLength(plane.distanceCm)} cm
        </caption>
        <thead>
          <tr>
            <th scope="col" className={th}>Level</th>
            <th scope="col" className={th}>Threshold</th>
            <th scope="col" className={th}>
              Spread width{row === null ? '' : ` along y = ${formatLength(row)} cm`}
            </th>
            <th scope="col" className={th}>Area at or above</th>
          </tr>
        </thead>
        <tbody>
          {analysis.spreadWidths.map((w) => {
            const index = plane.coverage.isolines.findIndex((iso) => iso.levelPct === w.pct);
            const iso = index >= 0 ? plane.coverage.isolines[index] : null;
            return (
              <tr key={w.pct}>
                <th scope="row" className="border-b border-rule px-3 py-2 text-left align-top font-sans text-sm font-semibold">
                  {w.pct} % of peak
                </th>
                <td className={`${td} whitespace-nowrap`}>{formatFigure(w.threshold)} mW/cm²</td>
                <td className={td}>
                  {w.leftCm === null || w.rightCm === null ? (
                    <span className="text-ink-muted">0 cm: no reading on this row reaches it</span>
                  ) : (
                    <>
                      <span className="font-semibold">
                        {w.atEdge ? '≥ ' : ''}
                        {formatLength(w.widthCm)} cm
                      </span>{' '}
                      <span className="font-sans text-xs text-ink-muted">
                        (x {formatLength(w.leftCm)} to {formatLength(w.rightCm)} cm)
                      </span>
                      {analysis.widthAtEdge.includes(w.pct) ? (
                        <p className="font-sans text-xs text-warn">
                          Reached the edge of the grid: the region goes on past the last reading, so the true width is
                          larger.
                        </p>
                      ) : null}
                    </>
                  )}
                </td>
                <td className={td}>
                  {iso === null ? (
                    '—'
                  ) : (
                    <>
                      <span className="font-semibold">
                        {plane.isolineAtEdge[index] ? '≥ ' : ''}
                        {formatFigure(iso.areaCm2)} cm²
                      </span>
                      {plane.isolineAtEdge[index] ? (
                        <p className="font-sans text-xs text-warn">Reaches the edge of the grid: at least this much.</p>
                      ) : null}
                    </>
                  )}
                </td>
              </tr>
            );
          })}
        </tbody>
      </table>
    </div>
  );
}

/**
 * The measured readings of a plane laid out as on the bench: rows by y (top = highest), columns
 * by x. In the trade's units (mW/cm², cm) unless `units` gives the reader's; `title` names it.
 */
export function PlaneReadingsTable({ plane, title, units = TRADE_CHART_UNITS, className }: { plane: GridPlane; title?: string; units?: ChartUnits; className?: string }) {
  const merged = mergeRepeatedPoints(plane.points);
  const xs = [...new Set(merged.map((p) => p.xCm))].sort((a, b) => a - b);
  const ys = [...new Set(merged.map((p) => p.yCm))].sort((a, b) => b - a);
  const at = new Map(merged.map((p) => [`${p.xCm}|${p.yCm}`, p.value]));
  const len = (cm: number) => formatLength(units.lengthValue(cm));
  const name = title ?? `Readings at ${formatLength(plane.distanceCm)} cm`;
  return (
    <div role="region" aria-label={name} tabIndex={0} className={cn('overflow-x-auto', className)}>
      <table className="border-collapse font-sans text-xs tabular-nums">
        <caption className="pb-2 text-left text-sm font-semibold text-ink">
          {name}, {units.irradiance} (rows: y, columns: x, in {units.length})
        </caption>
        <thead>
          <tr>
            <th scope="col" className="px-2 py-1 text-right text-ink-soft">y \ x</th>
            {xs.map((x) => (
              <th key={x} scope="col" className="border-b border-rule px-2 py-1 text-right">
                {len(x)}
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          {ys.map((y) => (
            <tr key={y}>
              <th scope="row" className="border-r border-rule px-2 py-1 text-right">
                {len(y)}
              </th>
              {xs.map((x) => {
                const v = at.get(`${x}|${y}`);
                return (
                  <td key={x} className="px-2 py-1 text-right">
                    {v === undefined ? <span className="text-ink-muted">—</span> : formatFigure(units.irradianceValue(v))}
                  </td>
                );
              })}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}

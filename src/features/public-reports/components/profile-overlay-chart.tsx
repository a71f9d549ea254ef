import { useId } from 'react';
import { CartesianGrid, Line, LineChart, Tooltip, XAxis, YAxis } from 'recharts';
import { DATA_COLORS } from '#src/components/figures/data-colors.ts';
import { formatFigure, formatLength, formatTick } from '#src/lib/format.ts';
import { seriesStyle } from '../utils/series-style.ts';

export interface OverlaySeries {
  key: string;
  label: string;
  /** Where along y the row lies, in the chart's length unit (most often 0). */
  rowY: number;
  /** Already in the chart's units. */
  points: { x: number; value: number }[];
}

/**
 * Lateral profiles of several reports on one chart at one distance: the readings along each
 * unit's centre row, as measured (no smoothing), one line per report on the same axes. The table
 * under it holds the same numbers.
 */
export function ProfileOverlayChart({
  series,
  distanceLabel,
  xUnit,
  yUnit,
}: {
  series: readonly OverlaySeries[];
  distanceLabel: string;
  xUnit: string;
  yUnit: string;
}) {
  const titleId = useId();
  const xs = [...new Set(series.flatMap((s) => s.points.map((p) => p.x)))].sort((a, b) => a - b);
  const valueAt = (s: OverlaySeries, x: number) => s.points.find((p) => p.x === x)?.value ?? null;
  return (
    <figure className="space-y-2">
      <figcaption id={titleId} className="font-sans text-sm font-semibold text-ink">
        Lateral profiles at {distanceLabel}: irradiance ({yUnit}) across each unit's centre row
      </figcaption>
      {/* The key as a list of our own: in the reports' order, wrapping cleanly, each line drawn as on the chart. */}
      <ul aria-label="Key to the lines" className="flex flex-wrap gap-x-6 gap-y-1 font-sans text-xs">
        {series.map((s, i) => {
          const style = seriesStyle(i);
          return (
            <li key={s.key} className="flex items-center gap-2">
              <svg width={36} height={10} aria-hidden="true">
                <line x1={2} x2={34} y1={5} y2={5} stroke={style.color} strokeWidth={2} strokeDasharray={style.dash} />
              </svg>
              <span>
                <span aria-hidden="true" style={{ color: style.color }}>
                  {style.marker}{' '}
                </span>
                {s.label}
              </span>
            </li>
          );
        })}
      </ul>
      <div role="img" aria-labelledby={titleId} className="overflow-x-auto" data-chart="profile-overlay">
        <LineChart width={720} height={320} margin={{ top: 10, right: 20, bottom: 24, left: 10 }}>
          <CartesianGrid stroke={DATA_COLORS.rule} strokeDasharray="2 4" />
          <XAxis
            dataKey="x"
            type="number"
            domain={['dataMin', 'dataMax']}
            allowDuplicatedCategory={false}
            tickFormatter={formatTick}
            label={{ value: `x (${xUnit})`, position: 'insideBottom', offset: -12, fill: DATA_COLORS.ink }}
            stroke={DATA_COLORS.inkMuted}
          />
          <YAxis domain={[0, 'auto']} tickFormatter={formatTick} stroke={DATA_COLORS.inkMuted} width={60} />
          <Tooltip formatter={(v) => `${formatFigure(Number(v))} ${yUnit}`} labelFormatter={(x) => `x ${formatLength(Number(x))} ${xUnit}`} />
          {series.map((s, i) => {
            const style = seriesStyle(i);
            return (
              <Line
                key={s.key}
                data={s.points}
                dataKey="value"
                name={s.label}
                stroke={style.color}
                strokeDasharray={style.dash}
                strokeWidth={2}
                dot={{ r: 3 }}
                isAnimationActive={false}
              />
            );
          })}
        </LineChart>
      </div>
      <details className="font-sans text-xs">
        <summary className="cursor-pointer font-semibold text-signal">The profiles as a table</summary>
        <div role="region" aria-label="Lateral profiles as a table" tabIndex={0} className="relative overflow-x-auto">
          <table className="mt-2 border-collapse tabular-nums">
            <caption className="sr-only">
              Lateral profiles at {distanceLabel}, {yUnit}; an empty cell: no reading at that x
            </caption>
            <thead>
              <tr>
                <th scope="col" className="px-2 text-left">
                  x ({xUnit})
                </th>
                {series.map((s) => (
                  <th key={s.key} scope="col" className="px-2 text-right">
                    {s.label}
                    {s.rowY !== 0 ? ` (row y = ${formatLength(s.rowY)} ${xUnit})` : ''}
                  </th>
                ))}
              </tr>
            </thead>
            <tbody>
              {xs.map((x) => (
                <tr key={x}>
                  <th scope="row" className="px-2 text-left font-normal">
                    {formatLength(x)}
                  </th>
                  {series.map((s) => {
                    const v = valueAt(s, x);
                    return (
                      <td key={s.key} className="px-2 text-right">
                        {v === null ? '—' : formatFigure(v)}
                      </td>
                    );
                  })}
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      </details>
    </figure>
  );
}

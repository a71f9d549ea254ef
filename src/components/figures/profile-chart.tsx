import { useId } from 'react';
import { CartesianGrid, Legend, Line, LineChart, Tooltip, XAxis, YAxis } from 'recharts';
import { formatFigure, formatLength, formatTick } from '#src/lib/format.ts';
import { TRADE_CHART_UNITS, type ChartUnits } from './chart-units.ts';
import { DATA_COLORS } from './data-colors.ts';
import { niceTicks } from './map-geometry.ts';

export interface ProfileSeries {
  distanceCm: number;
  /** Readings along the row, sorted by x. */
  points: { xCm: number; value: number }[];
}

const LINE_COLORS = [DATA_COLORS.signal, DATA_COLORS.ember, DATA_COLORS.infra, DATA_COLORS.ink, DATA_COLORS.inkMuted];
const DASHES = ['', '6 3', '2 3', '8 3 2 3', '1 2'];

/**
 * The lateral profile: irradiance along the centre row, one line per distance, as measured (no
 * smoothing). Lines differ by dash as well as colour; the numbers are in the table below it.
 * Series are given in cm and mW/cm²; `units` (the reader's choice) converts what is drawn and printed.
 */
export function ProfileChart({
  series,
  unit,
  rowLabel,
  units,
}: {
  series: readonly ProfileSeries[];
  /** Label of the values' unit when `units` is not given (default mW/cm²). */
  unit?: string;
  rowLabel: string;
  units?: ChartUnits;
}) {
  const titleId = useId();
  const u = units ?? TRADE_CHART_UNITS;
  const valueUnit = units ? units.irradiance : (unit ?? TRADE_CHART_UNITS.irradiance);
  const distanceLabel = (cm: number) => `${formatLength(u.lengthValue(cm))} ${u.length}`;
  const xs = [...new Set(series.flatMap((s) => s.points.map((p) => p.xCm)))].sort((a, b) => a - b);
  const data = xs.map((x) => {
    const row: Record<string, number | null> = { x: u.lengthValue(x) };
    for (const s of series) {
      const v = s.points.find((p) => p.xCm === x)?.value;
      row[`d${s.distanceCm}`] = v === undefined ? null : u.irradianceValue(v);
    }
    return row;
  });
  // Round ticks in the unit shown (recharts' own ticks follow the data, e.g. 0.472 in).
  const xTicks = data.length > 1 ? niceTicks(data[0].x as number, data[data.length - 1].x as number, 8) : undefined;
  return (
    <figure className="space-y-2">
      <figcaption id={titleId} className="font-sans text-sm font-semibold text-ink">
        Lateral profile along {rowLabel} ({valueUnit})
      </figcaption>
      <div role="img" aria-labelledby={titleId} className="overflow-x-auto" data-chart="profile">
        <LineChart width={640} height={280} data={data} margin={{ top: 10, right: 20, bottom: 24, left: 10 }}>
          <CartesianGrid stroke={DATA_COLORS.rule} strokeDasharray="2 4" />
          <XAxis dataKey="x" type="number" domain={['dataMin', 'dataMax']} ticks={xTicks} tickFormatter={formatTick} label={{ value: `x (${u.length})`, position: 'insideBottom', offset: -12, fill: DATA_COLORS.ink }} stroke={DATA_COLORS.inkMuted} />
          <YAxis domain={[0, 'auto']} tickFormatter={formatTick} stroke={DATA_COLORS.inkMuted} width={56} />
          <Tooltip formatter={(v) => `${formatFigure(Number(v))} ${valueUnit}`} labelFormatter={(x) => `x ${formatLength(Number(x))} ${u.length}`} />
          <Legend verticalAlign="top" height={28} itemSorter={(item) => Number(String(item.dataKey).slice(1))} />
          {series.map((s, i) => (
            <Line
              key={s.distanceCm}
              dataKey={`d${s.distanceCm}`}
              name={distanceLabel(s.distanceCm)}
              stroke={LINE_COLORS[i % LINE_COLORS.length]}
              strokeDasharray={DASHES[i % DASHES.length]}
              strokeWidth={2}
              dot={{ r: 3 }}
              connectNulls
              isAnimationActive={false}
            />
          ))}
        </LineChart>
      </div>
      <details className="font-sans text-xs">
        <summary className="cursor-pointer font-semibold text-signal">The profile as a table</summary>
        <table className="mt-2 border-collapse tabular-nums">
          <caption className="sr-only">Lateral profile, {valueUnit}</caption>
          <thead>
            <tr>
              <th scope="col" className="px-2 text-left">x ({u.length})</th>
              {series.map((s) => (
                <th key={s.distanceCm} scope="col" className="px-2 text-right">
                  {distanceLabel(s.distanceCm)}
                </th>
              ))}
            </tr>
          </thead>
          <tbody>
            {data.map((row) => (
              <tr key={row.x}>
                <th scope="row" className="px-2 text-left font-normal">{formatLength(row.x as number)}</th>
                {series.map((s) => (
                  <td key={s.distanceCm} className="px-2 text-right">
                    {row[`d${s.distanceCm}`] === null ? '—' : formatFigure(row[`d${s.distanceCm}`] as number)}
                  </td>
                ))}
              </tr>
            ))}
          </tbody>
        </table>
      </details>
    </figure>
  );
}

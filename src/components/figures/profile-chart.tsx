import { useId } from 'react';
import { CartesianGrid, Legend, Line, LineChart, Tooltip, XAxis, YAxis } from 'recharts';
import { formatFigure, formatLength, formatTick } from '#src/lib/format.ts';
import { DATA_COLORS } from './data-colors.ts';

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
 */
export function ProfileChart({ series, unit = 'mW/cm²', rowLabel }: { series: readonly ProfileSeries[]; unit?: string; rowLabel: string }) {
  const titleId = useId();
  const xs = [...new Set(series.flatMap((s) => s.points.map((p) => p.xCm)))].sort((a, b) => a - b);
  const data = xs.map((x) => {
    const row: Record<string, number | null> = { x };
    for (const s of series) row[`d${s.distanceCm}`] = s.points.find((p) => p.xCm === x)?.value ?? null;
    return row;
  });
  return (
    <figure className="space-y-2">
      <figcaption id={titleId} className="font-sans text-sm font-semibold text-ink">
        Lateral profile along {rowLabel} ({unit})
      </figcaption>
      <div role="img" aria-labelledby={titleId} className="overflow-x-auto" data-chart="profile">
        <LineChart width={640} height={280} data={data} margin={{ top: 10, right: 20, bottom: 24, left: 10 }}>
          <CartesianGrid stroke={DATA_COLORS.rule} strokeDasharray="2 4" />
          <XAxis dataKey="x" type="number" domain={['dataMin', 'dataMax']} tickFormatter={formatTick} label={{ value: 'x (cm)', position: 'insideBottom', offset: -12, fill: DATA_COLORS.ink }} stroke={DATA_COLORS.inkMuted} />
          <YAxis domain={[0, 'auto']} tickFormatter={formatTick} stroke={DATA_COLORS.inkMuted} width={56} />
          <Tooltip formatter={(v) => `${formatFigure(Number(v))} ${unit}`} labelFormatter={(x) => `x ${formatLength(Number(x))} cm`} />
          <Legend verticalAlign="top" height={28} />
          {series.map((s, i) => (
            <Line
              key={s.distanceCm}
              dataKey={`d${s.distanceCm}`}
              name={`${formatLength(s.distanceCm)} cm`}
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
          <caption className="sr-only">Lateral profile, {unit}</caption>
          <thead>
            <tr>
              <th scope="col" className="px-2 text-left">x (cm)</th>
              {series.map((s) => (
                <th key={s.distanceCm} scope="col" className="px-2 text-right">
                  {formatLength(s.distanceCm)} cm
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

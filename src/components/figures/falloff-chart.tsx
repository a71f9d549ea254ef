import { useId } from 'react';
import { CartesianGrid, Legend, Line, LineChart, Tooltip, XAxis, YAxis } from 'recharts';
import { formatFigure, formatLength, formatTick } from '#src/lib/format.ts';
import { TRADE_CHART_UNITS, type ChartUnits } from './chart-units.ts';
import { DATA_COLORS } from './data-colors.ts';

/**
 * Centre irradiance against distance on log–log axes, with the inverse-square law drawn through
 * the nearest measured plane: a point source's E ∝ 1/d² is a straight line of slope −2 there, and a
 * broad emitting area falls more slowly close up (its points lie above the line further out).
 */
export function FalloffChart({
  centers,
  unit,
  units,
}: {
  /** Centre irradiance per distance, cm and mW/cm² (or `unit` when `units` is not given). */
  centers: readonly { distanceCm: number; value: number }[];
  unit?: string;
  /** The reader's units: converts what is drawn and printed (the inverse-square line is unit-free). */
  units?: ChartUnits;
}) {
  const titleId = useId();
  const u = units ?? TRADE_CHART_UNITS;
  const valueUnit = units ? units.irradiance : (unit ?? TRADE_CHART_UNITS.irradiance);
  const pts = [...centers]
    .filter((c) => c.value > 0)
    .sort((a, b) => a.distanceCm - b.distanceCm)
    .map((c) => ({ distanceCm: u.lengthValue(c.distanceCm), value: u.irradianceValue(c.value) }));
  if (pts.length === 0) return <p className="font-sans text-sm text-ink-soft">No centre reading yet.</p>;
  const ref = pts[0];
  // The inverse-square curve is drawn on a fine set of distances so it reads as a line.
  const lo = ref.distanceCm;
  const hi = pts[pts.length - 1].distanceCm;
  const steps = 24;
  const distances = [...new Set([...pts.map((p) => p.distanceCm), ...Array.from({ length: steps + 1 }, (_, i) => lo * (hi / lo) ** (i / steps))])].sort((a, b) => a - b);
  const data = distances.map((d) => ({
    d,
    measured: pts.find((p) => Math.abs(p.distanceCm - d) < 1e-9)?.value ?? null,
    inverseSquare: ref.value * (ref.distanceCm / d) ** 2,
  }));
  return (
    <figure className="space-y-2">
      <figcaption id={titleId} className="font-sans text-sm font-semibold text-ink">
        Centre irradiance against distance ({valueUnit}, log–log), with the inverse-square law through {formatLength(ref.distanceCm)} {u.length}
      </figcaption>
      <div role="img" aria-labelledby={titleId} className="overflow-x-auto" data-chart="falloff">
        <LineChart width={520} height={280} data={data} margin={{ top: 10, right: 20, bottom: 24, left: 10 }}>
          <CartesianGrid stroke={DATA_COLORS.rule} strokeDasharray="2 4" />
          <XAxis dataKey="d" type="number" scale="log" domain={[lo, hi]} ticks={pts.map((p) => p.distanceCm)} tickFormatter={formatLength} label={{ value: `distance (${u.length})`, position: 'insideBottom', offset: -12, fill: DATA_COLORS.ink }} stroke={DATA_COLORS.inkMuted} />
          <YAxis type="number" scale="log" domain={['auto', 'auto']} tickFormatter={formatTick} stroke={DATA_COLORS.inkMuted} width={56} />
          <Tooltip formatter={(v) => `${formatFigure(Number(v))} ${valueUnit}`} labelFormatter={(d) => `${formatLength(Number(d))} ${u.length}`} />
          <Legend verticalAlign="top" height={28} />
          <Line dataKey="inverseSquare" name="Inverse square" stroke={DATA_COLORS.inkMuted} strokeDasharray="5 4" dot={false} isAnimationActive={false} />
          <Line dataKey="measured" name="Measured centre" stroke={DATA_COLORS.signal} strokeWidth={2} dot={{ r: 4 }} connectNulls isAnimationActive={false} />
        </LineChart>
      </div>
      <table className="border-collapse font-sans text-xs tabular-nums">
        <caption className="sr-only">Centre irradiance and the inverse-square law, {valueUnit}</caption>
        <thead>
          <tr>
            <th scope="col" className="px-2 text-left">Distance</th>
            <th scope="col" className="px-2 text-right">Measured</th>
            <th scope="col" className="px-2 text-right">Inverse square</th>
          </tr>
        </thead>
        <tbody>
          {pts.map((p) => (
            <tr key={p.distanceCm}>
              <th scope="row" className="px-2 text-left font-normal">
                {formatLength(p.distanceCm)} {u.length}
              </th>
              <td className="px-2 text-right">{formatFigure(p.value)}</td>
              <td className="px-2 text-right">{formatFigure(ref.value * (ref.distanceCm / p.distanceCm) ** 2)}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </figure>
  );
}

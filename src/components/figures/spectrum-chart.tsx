import { useId, useMemo } from 'react';
import { Area, AreaChart, CartesianGrid, ReferenceArea, ReferenceDot, Tooltip, XAxis, YAxis } from 'recharts';
import type { Spectrum } from '#shared/measurement/import/spectrum-import.ts';
import { DEFAULT_BANDS } from '#shared/measurement/spectral/band-list.ts';
import { TRADE_CHART_UNITS, type ChartUnits } from './chart-units.ts';
import { DATA_COLORS } from './data-colors.ts';
import { downsampleMinMax } from './downsample.ts';
import { formatCount, formatFigure, formatLength, formatTick } from '#src/lib/format.ts';

/** Enough points for a line a few hundred pixels wide; more only slows the page. */
export const MAX_CHART_POINTS = 1500;

const BANDS = [
  { key: 'red', label: 'Red', color: DATA_COLORS.ember },
  { key: 'nir', label: 'Near-infrared', color: DATA_COLORS.infra },
] as const;

function wavelengthTicks(lo: number, hi: number): number[] {
  const step = hi - lo > 600 ? 100 : hi - lo > 200 ? 50 : 20;
  const ticks: number[] = [];
  for (let t = Math.ceil(lo / step) * step; t <= hi; t += step) ticks.push(t);
  return ticks;
}

/** "660 nm": how a peak is labelled on the chart and named in lists. */
export function peakLabel(peakNm: number): string {
  return `${formatLength(peakNm)} nm`;
}

/**
 * Spectral irradiance against wavelength, with the red and near-infrared bands shaded and, when
 * given, the emission peaks marked and labelled with their wavelength.
 * Drawn in mW/cm²/nm (1 W/m²/nm = 0.1 mW/cm²/nm) to match the band figures, or per nm in the
 * reader's irradiance unit when `units` is given (W/m²/nm).
 */
export function SpectrumChart({
  spectrum,
  fileName,
  peaks = [],
  units,
}: {
  spectrum: Spectrum;
  fileName: string;
  peaks?: readonly { peakNm: number }[];
  units?: ChartUnits;
}) {
  const titleId = useId();
  const u = units ?? TRADE_CHART_UNITS;
  const spectralUnit = `${u.irradiance}/nm`;
  const n = spectrum.wavelengthNm.length;
  const lo = spectrum.wavelengthNm[0];
  const hi = spectrum.wavelengthNm[n - 1];

  const { points, negatives } = useMemo(() => {
    const thinned = downsampleMinMax(spectrum.wavelengthNm, spectrum.irradianceWm2Nm, MAX_CHART_POINTS);
    let below = 0;
    for (let i = 0; i < n; i++) if (spectrum.irradianceWm2Nm[i] < 0) below++;
    // Display only: negative noise is drawn at zero; every figure uses the signed values.
    return { points: thinned.map((p) => ({ nm: p.x, value: Math.max(0, u.irradianceValue(p.y / 10)) })), negatives: below };
  }, [spectrum, n, u]);

  // Each peak sits on the drawn line at the sample nearest its wavelength (display only).
  const marks = peaks.map((p) => {
    let best = 0;
    for (let i = 1; i < n; i++) {
      if (Math.abs(spectrum.wavelengthNm[i] - p.peakNm) < Math.abs(spectrum.wavelengthNm[best] - p.peakNm)) best = i;
    }
    return { nm: p.peakNm, value: Math.max(0, u.irradianceValue(spectrum.irradianceWm2Nm[best] / 10)) };
  });

  const shaded = BANDS.map((b) => ({ ...b, from: Math.max(DEFAULT_BANDS[b.key].loNm, lo), to: Math.min(DEFAULT_BANDS[b.key].hiNm, hi) })).filter(
    (b) => b.to > b.from,
  );

  return (
    <figure aria-labelledby={titleId} className="space-y-2">
      <p id={titleId} className="sr-only">
        Spectrum chart of {fileName}
        {marks.length > 0 ? `; emission peaks at ${marks.map((m) => peakLabel(m.nm)).join(', ')}` : ''}
      </p>
      <div className="h-72 w-full font-sans" data-chart="spectrum">
        <AreaChart
          responsive
          style={{ width: '100%', height: '100%' }}
          data={points}
          margin={{ top: 24, right: 16, bottom: 28, left: 24 }}
        >
          <CartesianGrid stroke={DATA_COLORS.rule} strokeDasharray="2 4" />
          {shaded.map((b) => (
            <ReferenceArea
              key={b.key}
              x1={b.from}
              x2={b.to}
              fill={b.color}
              fillOpacity={0.1}
              stroke={b.color}
              strokeOpacity={0.35}
              label={{ value: `${b.label} ${DEFAULT_BANDS[b.key].loNm}–${DEFAULT_BANDS[b.key].hiNm} nm`, position: 'top', fill: b.color, fontSize: 12, fontWeight: 600 }}
            />
          ))}
          <XAxis
            dataKey="nm"
            type="number"
            domain={[lo, hi]}
            ticks={wavelengthTicks(lo, hi)}
            tick={{ fill: DATA_COLORS.inkMuted, fontSize: 12 }}
            stroke={DATA_COLORS.inkMuted}
            label={{ value: 'Wavelength (nm)', position: 'insideBottom', offset: -16, fill: DATA_COLORS.ink, fontSize: 12 }}
          />
          <YAxis
            tickFormatter={(v: number) => formatTick(v)}
            tick={{ fill: DATA_COLORS.inkMuted, fontSize: 12 }}
            stroke={DATA_COLORS.inkMuted}
            width={56}
            label={{ value: spectralUnit, angle: -90, position: 'insideLeft', offset: -12, fill: DATA_COLORS.ink, fontSize: 12 }}
          />
          <Tooltip
            formatter={(v) => [`${formatFigure(Number(v))} ${spectralUnit}`, 'Spectral irradiance']}
            labelFormatter={(nm) => `${formatLength(Number(nm))} nm`}
          />
          <Area
            type="linear"
            dataKey="value"
            stroke={DATA_COLORS.signal}
            strokeWidth={1.5}
            fill={DATA_COLORS.signal}
            fillOpacity={0.12}
            isAnimationActive={false}
            dot={false}
          />
          {marks.map((m) => (
            <ReferenceDot
              key={m.nm}
              x={m.nm}
              y={m.value}
              r={3.5}
              fill={DATA_COLORS.ink}
              stroke={DATA_COLORS.paper}
              label={{ value: peakLabel(m.nm), position: 'right', fill: DATA_COLORS.ink, fontSize: 12, fontWeight: 600 }}
            />
          ))}
        </AreaChart>
      </div>
      <figcaption className="font-sans text-xs text-ink-soft">
        Spectral irradiance ({spectralUnit}) against wavelength; red {DEFAULT_BANDS.red.loNm}–{DEFAULT_BANDS.red.hiNm} nm and
        near-infrared {DEFAULT_BANDS.nir.loNm}–{DEFAULT_BANDS.nir.hiNm} nm shaded.{' '}
        {negatives > 0
          ? `${formatCount(negatives)} ${negatives === 1 ? 'value' : 'values'} below zero (detector noise) are drawn at zero; the figures use them as measured.`
          : 'Values below zero would be drawn at zero; this file has none.'}
        {points.length < n ? ` The line is drawn from ${formatCount(points.length)} of ${formatCount(n)} samples (the highest and lowest of each slice); the figures use every sample.` : ''}
      </figcaption>
    </figure>
  );
}

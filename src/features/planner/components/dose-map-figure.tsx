import { useId, useMemo } from 'react';
import { bodyOverlay } from '#shared/measurement/plane/body-outline.ts';
import type { BodySizeCm, SessionPlan } from '#shared/measurement/planner/types.ts';
import { DATA_COLORS } from '#src/components/figures/data-colors.ts';
import { mapFrame, niceTicks, polygonsPath, type MapFrame } from '#src/components/figures/map-geometry.ts';
import { formatFigure, formatLength, formatPercent } from '#src/lib/format.ts';
import { planSummary } from '../utils/plan-text.ts';
import { DoseLegend } from './dose-legend.tsx';
import { doseStep, roundUp, stepColor } from './dose-scale.ts';
import { BELOW_TARGET_PATTERN, NOT_MEASURED_PATTERN, PatternDefs } from './map-patterns.tsx';
import { DoseTable } from './dose-table.tsx';

/** Room around the target on the map, cm: enough to see where it sits on the body. */
const MARGIN_CM = 8;

interface Cells {
  byStep: Map<number, string[]>;
  below: string[];
  unmeasured: string[];
}

function cellPaths(plan: SessionPlan, frame: MapFrame, scaleMax: number, doseJCm2: number): Cells {
  const { x0Cm, y0Cm, stepCm, nx, values } = plan.doseMap;
  const size = stepCm * frame.scale;
  const out: Cells = { byStep: new Map(), below: [], unmeasured: [] };
  values.forEach((dose, k) => {
    if (dose === null) return;
    const i = k % nx;
    const j = Math.floor(k / nx);
    const x = frame.px(x0Cm + i * stepCm - stepCm / 2);
    const y = frame.py(y0Cm + j * stepCm + stepCm / 2);
    // A hair wider than the cell so anti-aliasing leaves no seams between neighbours.
    const d = `M${x.toFixed(2)} ${y.toFixed(2)}h${(size + 0.3).toFixed(2)}v${(size + 0.3).toFixed(2)}h${(-(size + 0.3)).toFixed(2)}z`;
    if (Number.isNaN(dose)) {
      out.unmeasured.push(d);
      return;
    }
    const step = doseStep(dose, scaleMax);
    const list = out.byStep.get(step) ?? [];
    list.push(d);
    out.byStep.set(step, list);
    if (dose < doseJCm2 * (1 - 1e-6)) out.below.push(d);
  });
  return out;
}

/**
 * The dose a plan gives over the chosen zones, drawn on the body outline: cells coloured by dose,
 * hatched below the target dose, grey outside the measured grid, and the unit's positions
 * numbered. The same doses are in a table below it, and the figure's description sums them up.
 */
export function DoseMapFigure({
  plan,
  body,
  doseJCm2,
  maxDoseMultiple,
  compact = false,
}: {
  plan: SessionPlan;
  body: BodySizeCm;
  doseJCm2: number;
  maxDoseMultiple: number | null;
  compact?: boolean;
}) {
  const titleId = useId();
  const descId = useId();
  const patternPrefix = `mp${useId().replace(/:/g, '')}`;
  const clipId = `mc${useId().replace(/:/g, '')}`;
  const scaleMax = roundUp(Math.max(plan.doseJCm2.max, doseJCm2));
  const capJCm2 = maxDoseMultiple === null ? null : maxDoseMultiple * doseJCm2;

  const drawing = useMemo(() => {
    const { x0Cm, y0Cm, stepCm, nx, ny } = plan.doseMap;
    const xs = [x0Cm - stepCm / 2, x0Cm + (nx - 0.5) * stepCm, ...plan.positions.map((p) => p.xCm)];
    const ys = [y0Cm - stepCm / 2, y0Cm + (ny - 0.5) * stepCm, ...plan.positions.map((p) => p.yCm)];
    const bounds = {
      minXCm: Math.min(...xs) - MARGIN_CM,
      maxXCm: Math.max(...xs) + MARGIN_CM,
      minYCm: Math.min(...ys) - MARGIN_CM,
      maxYCm: Math.max(...ys) + MARGIN_CM,
    };
    const frame = compact ? mapFrame(bounds, 300, 260) : mapFrame(bounds, 560, 420);
    const overlay = bodyOverlay(body);
    return {
      bounds,
      frame,
      cells: cellPaths(plan, frame, scaleMax, doseJCm2),
      outline: polygonsPath([[overlay.outline]], frame),
      zones: polygonsPath(overlay.zones.map((z) => [z.polygon]), frame),
      xTicks: niceTicks(bounds.minXCm, bounds.maxXCm, compact ? 5 : 8),
      yTicks: niceTicks(bounds.minYCm, bounds.maxYCm, compact ? 5 : 7),
    };
  }, [plan, body, scaleMax, doseJCm2, compact]);

  const { frame, cells, outline, zones, xTicks, yTicks } = drawing;
  const { plot } = frame;
  const d = formatLength(plan.distanceCm);
  const summary =
    `${planSummary(plan)} Dose over the chosen zones from ${formatFigure(plan.doseJCm2.min)} to ${formatFigure(plan.doseJCm2.max)} J/cm² ` +
    `(mean ${formatFigure(plan.doseJCm2.mean)}); ${formatPercent(plan.coveredShare)} of the area reaches ${formatFigure(doseJCm2)} J/cm²` +
    (capJCm2 === null ? '' : `, ${formatPercent(plan.overCapShare)} is above the cap of ${formatFigure(capJCm2)} J/cm²`) +
    (plan.outsideGridShare > 0 ? `; ${formatPercent(plan.outsideGridShare)} lies outside the measured grid.` : '.');

  return (
    <figure className="min-w-0 space-y-3">
      <div role="region" aria-label={`Dose map at ${d} cm, scrollable`} tabIndex={0} className="overflow-x-auto" data-chart="dose-map">
        <svg
          role="img"
          aria-labelledby={`${titleId} ${descId}`}
          viewBox={`0 0 ${frame.width.toFixed(0)} ${frame.height.toFixed(0)}`}
          className={compact ? 'h-auto w-full' : 'h-auto w-full min-w-[24rem]'}
          style={{ maxWidth: `${Math.ceil(frame.width)}px` }}
          fontFamily="Inter, system-ui, sans-serif"
        >
          <title id={titleId}>Dose map of the plan at {d} cm</title>
          <desc id={descId}>{summary}</desc>
          <PatternDefs prefix={patternPrefix} />
          <clipPath id={clipId}>
            <rect x={plot.left} y={plot.top} width={plot.right - plot.left} height={plot.bottom - plot.top} />
          </clipPath>
          <g clipPath={`url(#${clipId})`}>
            <path d={outline} fill={DATA_COLORS.paper} stroke={DATA_COLORS.inkMuted} strokeWidth={1.25} />
            <g shapeRendering="crispEdges">
              {[...cells.byStep.entries()].map(([step, parts]) => (
                <path key={step} d={parts.join('')} fill={stepColor(step)} />
              ))}
              <path d={cells.unmeasured.join('')} fill={`url(#${patternPrefix}${NOT_MEASURED_PATTERN})`} />
              <path d={cells.below.join('')} fill={`url(#${patternPrefix}${BELOW_TARGET_PATTERN})`} />
            </g>
            <path d={zones} fill="none" stroke={DATA_COLORS.ink} strokeWidth={0.75} strokeDasharray="3 3" />
            {plan.positions.map((p, k) => (
              <g key={`${p.xCm}|${p.yCm}`}>
                <circle cx={frame.px(p.xCm)} cy={frame.py(p.yCm)} r={9} fill={DATA_COLORS.paper} stroke={DATA_COLORS.ink} strokeWidth={1.5} />
                <text x={frame.px(p.xCm)} y={frame.py(p.yCm) + 4} textAnchor="middle" fontSize={11} fontWeight={600} fill={DATA_COLORS.ink}>
                  {k + 1}
                </text>
              </g>
            ))}
          </g>
          <rect x={plot.left} y={plot.top} width={plot.right - plot.left} height={plot.bottom - plot.top} fill="none" stroke={DATA_COLORS.inkMuted} />
          <g fontSize={11} fill={DATA_COLORS.inkMuted}>
            {xTicks.map((t) => (
              <text key={`x${t}`} x={frame.px(t)} y={plot.bottom + 17} textAnchor="middle">
                {formatLength(t)}
              </text>
            ))}
            {yTicks.map((t) => (
              <text key={`y${t}`} x={plot.left - 8} y={frame.py(t) + 4} textAnchor="end">
                {formatLength(t)}
              </text>
            ))}
          </g>
          <text x={(plot.left + plot.right) / 2} y={frame.height - 6} textAnchor="middle" fontSize={12} fill={DATA_COLORS.ink}>
            x (cm)
          </text>
          <text transform={`translate(14 ${(plot.top + plot.bottom) / 2}) rotate(-90)`} textAnchor="middle" fontSize={12} fill={DATA_COLORS.ink}>
            y (cm)
          </text>
        </svg>
      </div>
      <DoseLegend scaleMax={scaleMax} doseJCm2={doseJCm2} capJCm2={capJCm2} />
      <figcaption className="font-sans text-xs text-ink-soft">
        Seen facing the unit: x across, y up, origin at the torso centre; each cell is 2 × 2 cm. Dashed lines outline the
        body zones.
      </figcaption>
      {compact ? null : (
        <details className="rounded-md border border-rule bg-paper-raised px-4 py-3">
          <summary className="cursor-pointer font-sans text-sm font-semibold text-signal">The doses as a table</summary>
          <div className="mt-3">
            <DoseTable plan={plan} />
          </div>
        </details>
      )}
    </figure>
  );
}

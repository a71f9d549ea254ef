import type { SessionPlan } from '#shared/measurement/planner/types.ts';
import { cn } from '#src/lib/cn.ts';
import { formatFigure, formatLength, formatPercent } from '#src/lib/format.ts';
import { STRATEGY_LABELS, minutesText, planKey } from '../utils/plan-text.ts';

const th = 'bl-label border-b border-rule px-3 py-2 text-left align-bottom';
const td = 'border-b border-rule px-3 py-2 text-sm align-top tabular-nums';

/** Ranked plans, one per row; a row's button shows that plan on the dose map. */
export function PlansTable({
  plans,
  caption,
  selectedKey,
  onSelect,
  rankOf,
}: {
  plans: readonly SessionPlan[];
  caption: string;
  selectedKey: string | null;
  onSelect: (key: string) => void;
  /** Rank of a plan among all plans (1 = fewest minutes). */
  rankOf: (plan: SessionPlan) => number;
}) {
  return (
    <div className="overflow-x-auto">
      <table className="w-full border-collapse">
        <caption className="pb-2 text-left font-sans text-sm font-semibold text-ink">{caption}</caption>
        <thead>
          <tr>
            <th scope="col" className={th}>Rank</th>
            <th scope="col" className={th}>Plan</th>
            <th scope="col" className={th}>Distance</th>
            <th scope="col" className={th}>Positions × minutes</th>
            <th scope="col" className={th}>Total</th>
            <th scope="col" className={th}>Reaches H*</th>
            <th scope="col" className={th}>Dose min / mean / max (J/cm²)</th>
            <th scope="col" className={th}>Above cap</th>
            <th scope="col" className={th}>
              <span className="sr-only">Show on the map</span>
            </th>
          </tr>
        </thead>
        <tbody>
          {plans.map((plan) => {
            const key = planKey(plan);
            const selected = key === selectedKey;
            const each = plan.positions.map((p) => p.minutes);
            const minutes =
              plan.strategy === 'placements' && each.length > 1
                ? `${each.length} positions, ${minutesText(Math.min(...each))}–${minutesText(Math.max(...each))}`
                : plan.strategy === 'units'
                  ? `${plan.units} units × ${minutesText(plan.totalMinutes)}, together`
                  : `1 × ${minutesText(plan.totalMinutes)}`;
            return (
              <tr key={key} className={cn(selected && 'bg-signal-tint')} aria-current={selected ? 'true' : undefined}>
                <td className={td}>{rankOf(plan)}</td>
                <th scope="row" className="border-b border-rule px-3 py-2 text-left align-top font-sans text-sm font-semibold">
                  {STRATEGY_LABELS[plan.strategy]}
                </th>
                <td className={cn(td, 'whitespace-nowrap')}>
                  {formatLength(plan.distanceCm)} cm
                  {plan.interpolated ? <span className="block font-sans text-xs text-ink-muted">between measured planes</span> : null}
                </td>
                <td className={td}>{minutes}</td>
                <td className={cn(td, 'whitespace-nowrap font-semibold')}>{minutesText(plan.totalMinutes)}</td>
                <td className={td}>
                  {formatPercent(plan.coveredShare)}
                  {plan.outsideGridShare > 0 ? (
                    <span className="block font-sans text-xs text-warn">{formatPercent(plan.outsideGridShare)} outside the grid</span>
                  ) : null}
                </td>
                <td className={cn(td, 'whitespace-nowrap')}>
                  {formatFigure(plan.doseJCm2.min)} / {formatFigure(plan.doseJCm2.mean)} / {formatFigure(plan.doseJCm2.max)}
                </td>
                <td className={cn(td, plan.overCapShare > 0 && 'font-semibold text-warn')}>{formatPercent(plan.overCapShare)}</td>
                <td className={td}>
                  <button
                    type="button"
                    aria-pressed={selected}
                    onClick={() => onSelect(key)}
                    className="min-h-9 rounded border border-control bg-paper-raised px-3 font-sans text-xs font-semibold text-ink hover:bg-paper-sunk aria-pressed:bg-signal aria-pressed:text-white"
                  >
                    {selected ? 'On the map' : 'Show on map'}
                    <span className="sr-only">
                      : {STRATEGY_LABELS[plan.strategy]} at {formatLength(plan.distanceCm)} cm
                    </span>
                  </button>
                </td>
              </tr>
            );
          })}
        </tbody>
      </table>
    </div>
  );
}

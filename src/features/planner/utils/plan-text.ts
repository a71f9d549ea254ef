/** How plans are named and described on the page and on the printed card. */
import type { PlanStrategy, SessionPlan } from '#shared/measurement/planner/types.ts';
import { formatFigure, formatLength } from '#src/lib/format.ts';

export const STRATEGY_LABELS: Readonly<Record<PlanStrategy, string>> = {
  single: 'One position, centred',
  placements: 'Moved between positions',
  units: 'Units side by side',
};

/** A stable key for a plan within one result: one plan per strategy and distance. */
export function planKey(plan: Pick<SessionPlan, 'strategy' | 'distanceCm'>): string {
  return `${plan.strategy}@${plan.distanceCm}`;
}

/** "x −5, y 10 cm" for a position of the unit's centre. */
export function positionText(p: { xCm: number; yCm: number }): string {
  return `x ${formatLength(p.xCm)}, y ${formatLength(p.yCm)} cm`;
}

/** Minutes as the page prints them: three significant figures. */
export function minutesText(minutes: number): string {
  return `${formatFigure(minutes)} min`;
}

/** One line on what the reader does. */
export function planSummary(plan: SessionPlan): string {
  const d = `${formatLength(plan.distanceCm)} cm`;
  if (plan.strategy === 'single') return `One unit at ${d}, centred on the area, for ${minutesText(plan.totalMinutes)}.`;
  if (plan.strategy === 'units') {
    return `${plan.units} units side by side at ${d}, all on together for ${minutesText(plan.totalMinutes)}.`;
  }
  return `One unit at ${d}, moved between ${plan.positions.length} ${plan.positions.length === 1 ? 'position' : 'positions'}, ${minutesText(plan.totalMinutes)} in all.`;
}

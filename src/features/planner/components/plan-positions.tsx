import type { SessionPlan } from '#shared/measurement/planner/types.ts';
import { minutesText, positionText } from '../utils/plan-text.ts';

/** What to do, position by position: where the centre of the unit faces and for how long. */
export function PlanPositions({ plan }: { plan: SessionPlan }) {
  return (
    <ol className="list-decimal space-y-0.5 pl-6 font-sans text-sm">
      {plan.positions.map((p) => (
        <li key={`${p.xCm}|${p.yCm}`}>
          {plan.strategy === 'units' ? 'A unit centred at ' : 'Centre of the unit at '}
          {positionText(p)}: {minutesText(p.minutes)}
        </li>
      ))}
    </ol>
  );
}

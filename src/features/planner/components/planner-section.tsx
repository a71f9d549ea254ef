import { useId, useMemo, useState } from 'react';
import type { MeasuredPlane, SessionPlan, SessionPlanResult } from '#shared/measurement/planner/types.ts';
import { Button } from '#src/components/button.tsx';
import { formatCount, formatFigure, formatLength } from '#src/lib/format.ts';
import { usePrintCard } from '../hooks/use-print-card.ts';
import { useSessionPlans } from '../hooks/use-session-plans.ts';
import { STRATEGY_LABELS, planKey, planSummary } from '../utils/plan-text.ts';
import { ZONE_LABELS, initialForm, readForm, withPlanes, type PlannerDefaults } from '../utils/planner-form.ts';
import { DoseMapFigure } from './dose-map-figure.tsx';
import { PlanCard } from './plan-card.tsx';
import { PlanPositions } from './plan-positions.tsx';
import { PlannerControls } from './planner-controls.tsx';
import { PlannerNotice } from './planner-notice.tsx';
import { PlansTable } from './plans-table.tsx';

export interface PlannerSectionProps {
  /** The unit's measured planes: readings per distance, mW/cm². */
  planes: readonly MeasuredPlane[];
  /** The unit's name, for the printed card. */
  unitLabel?: string;
  /** The unit's emitting area, for units side by side; read from the nearest plane when absent. */
  unitSizeCm?: { widthCm: number; heightCm: number } | null;
  /** Starting choices (default chest and abdomen, medium body, 10 J/cm², 90 %). */
  defaults?: PlannerDefaults;
  headingLevel?: 2 | 3;
}

function bestOfEachStrategy(plans: readonly SessionPlan[]): SessionPlan[] {
  const seen = new Set<string>();
  return plans.filter((p) => !seen.has(p.strategy) && seen.add(p.strategy));
}

function statusText(state: ReturnType<typeof useSessionPlans>, result: SessionPlanResult | null): string {
  if (state.status === 'idle') return 'Complete the choices above to see plans.';
  if (state.status === 'error') return `The planner stopped: ${state.message}`;
  if (state.status === 'running') return 'Working out the plans…';
  return result && result.plans.length > 0
    ? `${formatCount(result.plans.length)} plans, ranked by total minutes.`
    : 'No plan reaches the chosen share with these choices.';
}

/**
 * The session planner for one unit, self-contained: the reader picks body zones, body size, a
 * target dose and a covered share; the planner (in a web worker) ranks plans by total minutes;
 * the chosen plan is drawn as a dose map over the body outline and can be printed as a card.
 */
export function PlannerSection({ planes, unitLabel, unitSizeCm, defaults, headingLevel = 2 }: PlannerSectionProps) {
  const headingId = useId();
  const Heading = headingLevel === 2 ? 'h2' : 'h3';
  const Sub = headingLevel === 2 ? 'h3' : 'h4';
  const [form, setForm] = useState(() => initialForm(defaults));
  const read = useMemo(() => readForm(form), [form]);
  const input = useMemo(() => withPlanes(read.input, planes, unitSizeCm), [read.input, planes, unitSizeCm]);
  const state = useSessionPlans(input);
  const result = state.status === 'done' ? state.result : state.status === 'running' ? state.previous : null;
  const [picked, setPicked] = useState<string | null>(null);
  const { printing, print } = usePrintCard();

  const plans = result?.plans ?? [];
  const selected = plans.find((p) => planKey(p) === picked) ?? plans[0] ?? null;
  const rank = new Map(plans.map((p, i) => [planKey(p), i + 1]));
  const rankOf = (p: SessionPlan) => rank.get(planKey(p)) ?? 0;
  const settings = read.input;
  const zonesText = form.zones.map((z) => ZONE_LABELS[z].toLowerCase()).join(' + ');

  return (
    <section aria-labelledby={headingId} className="space-y-6">
      <div className="max-w-measure space-y-2">
        <Heading id={headingId} className="text-2xl font-semibold">
          Session planner
        </Heading>
        <p className="text-ink-soft">
          At what distance, in how many positions and for how many minutes this unit’s measured light adds up to a chosen dose
          over a chosen part of the body, without overdoing the centre.
        </p>
      </div>

      <PlannerControls form={form} setForm={setForm} errors={read.errors} />

      <p aria-live="polite" className="font-sans text-sm font-semibold text-ink">
        {statusText(state, result)}
      </p>

      {selected && settings && read.body && read.doseJCm2 !== null ? (
        <div className={state.status === 'running' ? 'space-y-8 opacity-60' : 'space-y-8'}>
          <PlannerNotice headingLevel={headingLevel === 2 ? 3 : 2} />
          <PlansTable
            plans={bestOfEachStrategy(plans)}
            caption={`Best plan of each kind for ${zonesText} at ${formatFigure(read.doseJCm2)} J/cm²`}
            selectedKey={planKey(selected)}
            onSelect={setPicked}
            rankOf={rankOf}
          />
          <details className="rounded-md border border-rule bg-paper-raised px-4 py-3">
            <summary className="cursor-pointer font-sans text-sm font-semibold text-signal">
              All {formatCount(plans.length)} plans, every distance, ranked
            </summary>
            <div className="mt-3">
              <PlansTable plans={plans} caption="Every plan, fewest total minutes first" selectedKey={planKey(selected)} onSelect={setPicked} rankOf={rankOf} />
            </div>
          </details>

          <section aria-label="The plan on the map" className="grid grid-cols-1 gap-8 xl:grid-cols-[minmax(0,3fr)_minmax(0,2fr)] xl:items-start">
            <DoseMapFigure plan={selected} body={read.body} doseJCm2={read.doseJCm2} maxDoseMultiple={settings.caps?.maxDoseMultiple ?? null} />
            <div className="space-y-3">
              <Sub className="text-xl font-semibold">
                {STRATEGY_LABELS[selected.strategy]}, {formatLength(selected.distanceCm)} cm
              </Sub>
              <p>{planSummary(selected)}</p>
              {selected.interpolated ? (
                <p className="font-sans text-sm text-ink-soft">
                  {formatLength(selected.distanceCm)} cm lies between two measured planes: the light there is interpolated
                  point by point along a power law of distance.
                </p>
              ) : null}
              <PlanPositions plan={selected} />
              {result?.unitSizeCm && selected.strategy === 'units' ? (
                <p className="font-sans text-xs text-ink-muted">
                  The units sit edge to edge, each taken as {formatLength(result.unitSizeCm.widthCm)} ×{' '}
                  {formatLength(result.unitSizeCm.heightCm)} cm
                  {result.unitSizeCm.estimated
                    ? ': the width of the light at half its peak at the nearest distance, an estimate of the emitting area'
                    : ''}
                  .
                </p>
              ) : null}
              <Button variant="secondary" onClick={print}>
                Print plan card
              </Button>
            </div>
          </section>
        </div>
      ) : null}

      {result && result.skipped.length > 0 ? (
        <details className="rounded-md border border-rule bg-paper-raised px-4 py-3">
          <summary className="cursor-pointer font-sans text-sm font-semibold text-signal">
            Plans not possible ({formatCount(result.skipped.length)})
          </summary>
          <ul className="mt-2 space-y-1 font-sans text-sm">
            {result.skipped.map((s) => (
              <li key={`${s.strategy}@${s.distanceCm}`}>
                {STRATEGY_LABELS[s.strategy]} at {formatLength(s.distanceCm)} cm: {s.reason}.
              </li>
            ))}
          </ul>
        </details>
      ) : null}

      {printing && selected && settings && read.body && read.doseJCm2 !== null ? (
        <PlanCard
          plan={selected}
          settings={{
            unitLabel: unitLabel ?? null,
            zonesText,
            body: read.body,
            doseJCm2: read.doseJCm2,
            coverShare: settings.coverShare ?? 0.9,
            maxDoseMultiple: settings.caps?.maxDoseMultiple ?? null,
          }}
        />
      ) : null}
    </section>
  );
}

import type { ReactNode } from 'react';
import { createPortal } from 'react-dom';
import type { BodySizeCm, SessionPlan } from '#shared/measurement/planner/types.ts';
import { formatFigure, formatLength, formatPercent } from '#src/lib/format.ts';
import { STRATEGY_LABELS, minutesText, planSummary } from '../utils/plan-text.ts';
import { DoseMapFigure } from './dose-map-figure.tsx';
import { PlanPositions } from './plan-positions.tsx';
import { PlannerNotice } from './planner-notice.tsx';
import './plan-card.css';

export interface PlanCardSettings {
  unitLabel: string | null;
  zonesText: string;
  body: BodySizeCm;
  doseJCm2: number;
  coverShare: number;
  maxDoseMultiple: number | null;
}

/** The class on <html> that makes print show the card alone (plan-card.css). */
export const PRINTING_CLASS = 'bl-printing-plan-card';

function Row({ label, children }: { label: string; children: ReactNode }) {
  return (
    <tr>
      <th scope="row" className="border-b border-rule py-1 pr-4 text-left align-top font-semibold">
        {label}
      </th>
      <td className="border-b border-rule py-1 align-top">{children}</td>
    </tr>
  );
}

/**
 * One page for the chosen plan: what to do, the figures, a small dose map, and the cautions.
 * Rendered beside the page's root (a portal into <body>) so print can leave the rest out.
 */
export function PlanCard({ plan, settings }: { plan: SessionPlan; settings: PlanCardSettings }) {
  const { unitLabel, zonesText, body, doseJCm2, coverShare, maxDoseMultiple } = settings;
  const card = (
    <div className="bl-plan-card font-sans text-ink" data-testid="plan-card">
      <h1 className="mb-1 font-serif text-xl font-semibold">Session plan card{unitLabel ? `: ${unitLabel}` : ''}</h1>
      <p className="mb-3 text-sm">{planSummary(plan)}</p>
      <div className="grid grid-cols-[3fr_2fr] gap-6">
        <div className="space-y-3">
          <table className="w-full border-collapse text-sm">
            <tbody>
              <Row label="Area">
                {zonesText}; body {formatLength(body.shoulderWidthCm)} cm across the shoulders, {formatLength(body.heightCm)} cm tall
              </Row>
              <Row label="Target dose H*">
                {formatFigure(doseJCm2)} J/cm² over {formatPercent(coverShare)} of the area
              </Row>
              <Row label="Plan">
                {STRATEGY_LABELS[plan.strategy]} at {formatLength(plan.distanceCm)} cm
                {plan.interpolated ? ' (between measured planes)' : ''}
              </Row>
              <Row label="Total time">{minutesText(plan.totalMinutes)}</Row>
              <Row label="Reaches H*">
                {formatPercent(plan.coveredShare)}
                {plan.outsideGridShare > 0 ? `; ${formatPercent(plan.outsideGridShare)} outside the measured grid` : ''}
              </Row>
              <Row label="Dose">
                {formatFigure(plan.doseJCm2.min)} to {formatFigure(plan.doseJCm2.max)} J/cm², mean {formatFigure(plan.doseJCm2.mean)}
              </Row>
              <Row label="Above the cap">
                {maxDoseMultiple === null ? 'no cap set' : `${formatPercent(plan.overCapShare)} (cap ${formatFigure(maxDoseMultiple * doseJCm2)} J/cm²)`}
              </Row>
            </tbody>
          </table>
          <div>
            <h2 className="mb-1 text-sm font-semibold">Positions (numbered on the map)</h2>
            <PlanPositions plan={plan} />
          </div>
        </div>
        <DoseMapFigure plan={plan} body={body} doseJCm2={doseJCm2} maxDoseMultiple={maxDoseMultiple} compact />
      </div>
      <div className="mt-4">
        <PlannerNotice headingLevel={2} />
      </div>
    </div>
  );
  return typeof document === 'undefined' ? card : createPortal(card, document.body);
}

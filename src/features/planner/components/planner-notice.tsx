import { Cautions } from '#src/components/cautions.tsx';

/** Shown with every plan, on the page and on the printed card. */
export function PlannerNotice({ headingLevel = 3 }: { headingLevel?: 2 | 3 }) {
  return (
    <div className="space-y-3">
      <p className="font-sans text-sm font-semibold text-ink">
        These plans are arithmetic on our measurements of this unit, not treatment advice. They say how long the measured light
        takes to add up to the dose you chose; they do not say that dose is right for you. Local rules and licensed practice come
        first.
      </p>
      <Cautions headingLevel={headingLevel} title="Cautions for these plans" />
    </div>
  );
}

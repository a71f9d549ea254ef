import { useId } from 'react';
import { cn } from '../lib/cn.ts';

/**
 * The cautions that go wherever irradiance, dose, session time or a plan is shown: eyes, the
 * invisible near-infrared, heat, photosensitivity, measurements not advice, local rules first.
 * Keep every point when editing.
 */
export const CAUTIONS = [
  {
    id: 'eyes',
    text: 'Protect your eyes and never look into the emitters, even briefly.',
  },
  {
    id: 'nir',
    text: 'Near-infrared light is invisible: the blink reflex may not protect you from it.',
  },
  {
    id: 'heat',
    text: 'Heat adds up with closeness and with time; move back or stop if skin gets hot.',
  },
  {
    id: 'clinician',
    text: 'If you take photosensitising medicines or have a light-sensitive condition, ask a clinician first.',
  },
  {
    id: 'not-advice',
    text: 'Our results are measurements of devices, not treatment advice.',
  },
  {
    id: 'regulation',
    text: 'Local regulations and licensed practice come first.',
  },
] as const;

export function Cautions({
  headingLevel = 2,
  className,
  title = 'Cautions',
}: {
  headingLevel?: 2 | 3;
  className?: string;
  title?: string;
}) {
  const Heading = headingLevel === 2 ? 'h2' : 'h3';
  const headingId = useId();
  return (
    <section aria-labelledby={headingId} className={cn('border-l-4 border-warn pl-4', className)}>
      <Heading id={headingId} className="bl-label mb-2 text-ink">
        {title}
      </Heading>
      <ul className="grid gap-1.5 text-sm sm:grid-cols-2 sm:gap-x-8">
        {CAUTIONS.map((c) => (
          <li key={c.id} className="relative pl-4">
            <span aria-hidden="true" className="absolute left-0 text-warn">
              ▸
            </span>
            {c.text}
          </li>
        ))}
      </ul>
    </section>
  );
}

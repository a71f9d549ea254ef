import type { EmptyMeaning } from '../utils/key-figures.ts';

/** An empty cell says why it is empty, in words as well as the dash. */
export function EmptyFigure({ meaning }: { meaning: EmptyMeaning }) {
  return (
    <span className="whitespace-nowrap font-sans text-xs text-ink-muted">
      <span aria-hidden="true">— </span>
      {meaning}
    </span>
  );
}

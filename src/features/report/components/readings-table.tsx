import type { GridPlane } from '#shared/measurement/check/analyze-grid.ts';
import { PlaneReadingsTable } from '#src/components/figures/plane-tables.tsx';
import { useDisplayUnits } from '#src/lib/display-units.tsx';

/** A plane's readings laid out as on the bench (rows by y, highest first; columns by x), in the reader's units, folded away. */
export function ReadingsTable({ plane, title }: { plane: GridPlane; title: string }) {
  const units = useDisplayUnits();
  return (
    <details className="font-sans text-sm">
      <summary className="cursor-pointer font-semibold text-signal">The readings as a table</summary>
      <PlaneReadingsTable plane={plane} title={title} units={units} className="mt-2" />
    </details>
  );
}

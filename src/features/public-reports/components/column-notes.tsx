import { Link } from 'react-router-dom';
import { useDisplayUnits } from '#src/lib/display-units.tsx';
import { KEY_FIGURES } from '../utils/key-figures.ts';

/** What each column of the index holds, and what an empty cell means. */
export function ColumnNotes() {
  const units = useDisplayUnits();
  return (
    <section aria-labelledby="column-notes" className="max-w-measure space-y-3">
      <h2 id="column-notes" className="text-xl font-semibold">
        About the columns
      </h2>
      <dl className="space-y-3 text-sm">
        <div>
          <dt className="font-sans font-semibold">Report, category, maker, model</dt>
          <dd className="text-ink-soft">
            The report's title links to the full report with its maps, charts and data. A report may cover several units of
            one model; its figures are those of the first unit, and the report gives the spread between units.
          </dd>
        </div>
        {KEY_FIGURES.map((f) => (
          <div key={f.id}>
            <dt className="font-sans font-semibold">{f.heading(units)}</dt>
            <dd className="text-ink-soft">
              {f.note(units)} Empty: <span className="font-sans text-xs">{f.empty}</span>.
            </dd>
          </div>
        ))}
        <div>
          <dt className="font-sans font-semibold">Report date</dt>
          <dd className="text-ink-soft">When the version shown was published; a corrected report says which version it is.</dd>
        </div>
      </dl>
      <p className="text-sm text-ink-soft">
        Figures are rounded to about three significant digits; the <Link to="/methodology">methodology</Link> gives every definition.
      </p>
    </section>
  );
}

import { useId, useState } from 'react';
import type { PublicReportSummary } from '#shared/schemas/reports.ts';
import { Button } from '#src/components/button.tsx';
import { Select } from '#src/components/select-field.tsx';
import { MAX_COMPARED, type CompareSelection } from '../hooks/use-compare-selection.ts';
import { seriesStyle } from '../utils/series-style.ts';

/** The reports chosen, each removable, and a list to add another (two to four in all). */
export function ComparePicker({ selection, reports }: { selection: CompareSelection; reports: readonly PublicReportSummary[] }) {
  const selectId = `s${useId().replace(/:/g, '')}`;
  const available = reports.filter((r) => !selection.slugs.includes(r.slug));
  const [choice, setChoice] = useState('');
  const picked = available.some((r) => r.slug === choice) ? choice : (available[0]?.slug ?? '');
  const full = selection.slugs.length >= MAX_COMPARED;
  const titleOf = (slug: string) => reports.find((r) => r.slug === slug)?.title ?? slug;

  return (
    <section aria-labelledby="compare-choice" className="space-y-4 rounded-md border border-rule bg-paper-raised px-5 py-4">
      <h2 id="compare-choice" className="text-lg font-semibold">
        Reports compared ({selection.slugs.length} of at most {MAX_COMPARED})
      </h2>
      {selection.slugs.length > 0 ? (
        <ul className="flex flex-wrap gap-3">
          {selection.slugs.map((slug, i) => (
            <li key={slug} className="flex items-center gap-2 rounded-full border border-rule-strong bg-paper py-1 pr-1 pl-3 font-sans text-sm">
              <span aria-hidden="true" style={{ color: seriesStyle(i).color }}>
                {seriesStyle(i).marker}
              </span>
              {titleOf(slug)}
              <Button variant="quiet" size="sm" aria-label={`Remove ${titleOf(slug)}`} onClick={() => selection.remove(slug)}>
                Remove
              </Button>
            </li>
          ))}
        </ul>
      ) : null}
      {full ? (
        <p className="font-sans text-sm text-ink-soft">Four reports is the most this page compares: remove one to add another.</p>
      ) : available.length === 0 ? (
        <p className="font-sans text-sm text-ink-soft">Every published report is in the comparison.</p>
      ) : (
        <form
          className="flex flex-wrap items-end gap-3"
          onSubmit={(e) => {
            e.preventDefault();
            if (picked) selection.add(picked);
          }}
        >
          <div className="flex min-w-64 flex-col gap-1.5">
            <label htmlFor={selectId} className="font-sans text-sm font-semibold">
              Add a report
            </label>
            <Select
              id={selectId}
              value={picked}
              onChange={(e) => setChoice(e.target.value)}
              options={available.map((r) => ({ value: r.slug, label: `${r.title} (${r.maker})` }))}
            />
          </div>
          <Button type="submit" variant="secondary">
            Add to the comparison
          </Button>
        </form>
      )}
    </section>
  );
}

import type { ReactNode } from 'react';
import type { SortDir } from '#src/lib/list-search-params.ts';
import { cn } from '#src/lib/cn.ts';

/**
 * A column header that sorts on the server: a real button (Enter and Space work), the sort in
 * force told by aria-sort on the cell and by an arrow beside the label, never by colour alone.
 */
export function SortHeader({
  children,
  sorted,
  align = 'start',
  hintId,
  onToggle,
}: {
  children: ReactNode;
  /** The direction when the table is sorted by this column. */
  sorted: SortDir | false;
  align?: 'start' | 'end';
  hintId: string;
  onToggle: () => void;
}) {
  return (
    <button
      type="button"
      aria-describedby={hintId}
      onClick={onToggle}
      className={cn(
        'bl-label inline-flex min-h-9 items-center gap-1.5 rounded-sm text-ink hover:text-signal-strong hover:underline',
        align === 'end' && 'flex-row-reverse',
      )}
    >
      {children}
      <span aria-hidden="true" className={cn('inline-block w-3 text-center', sorted ? 'text-ink' : 'text-ink-muted')}>
        {sorted === 'asc' ? '▲' : sorted === 'desc' ? '▼' : '↕'}
      </span>
    </button>
  );
}

export function ariaSort(sorted: SortDir | false): 'ascending' | 'descending' | undefined {
  return sorted === 'asc' ? 'ascending' : sorted === 'desc' ? 'descending' : undefined;
}

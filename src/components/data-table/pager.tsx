import { useId } from 'react';
import { formatCount } from '#src/lib/format.ts';
import { Button } from '../button.tsx';
import { Select } from '../select-field.tsx';

export const DEFAULT_PAGE_SIZES = [10, 25, 50, 100] as const;

/**
 * Previous / next, "Page 2 of 5" and the page size. The buttons stay focusable at either end
 * (aria-disabled): a disabled button would drop keyboard focus on the last click.
 */
export function Pager({
  page,
  pageSize,
  total,
  noun,
  onPage,
  onPageSize,
  pageSizes = DEFAULT_PAGE_SIZES,
}: {
  page: number;
  pageSize: number;
  total: number;
  noun: string;
  onPage: (page: number) => void;
  onPageSize?: (pageSize: number) => void;
  pageSizes?: readonly number[];
}) {
  const sizeId = `p${useId().replace(/:/g, '')}`;
  const pageCount = Math.max(1, Math.ceil(total / pageSize));
  const first = total === 0 ? 0 : Math.min(total, (page - 1) * pageSize + 1);
  const last = Math.min(total, page * pageSize);
  const atStart = page <= 1;
  const atEnd = page >= pageCount;
  const sizes = pageSizes.includes(pageSize) ? pageSizes : [...pageSizes, pageSize].sort((a, b) => a - b);

  return (
    <nav aria-label={`Pages of ${noun}`} className="flex flex-wrap items-center justify-between gap-4 font-sans text-sm">
      <p className="text-ink-soft">
        {total === 0 ? `No ${noun}` : `Showing ${formatCount(first)}–${formatCount(last)} of ${formatCount(total)} ${noun}`}
      </p>
      <div className="flex flex-wrap items-center gap-3">
        {onPageSize ? (
          <div className="flex items-center gap-2">
            <label htmlFor={sizeId} className="font-semibold">
              Rows per page
            </label>
            <Select
              id={sizeId}
              className="w-24"
              options={sizes.map((n) => ({ value: String(n), label: String(n) }))}
              value={String(pageSize)}
              onChange={(event) => onPageSize(Number(event.target.value))}
            />
          </div>
        ) : null}
        <Button
          variant="secondary"
          size="sm"
          aria-disabled={atStart || undefined}
          className="aria-disabled:cursor-not-allowed aria-disabled:opacity-60"
          onClick={() => (atStart ? undefined : onPage(page - 1))}
        >
          Previous page
        </Button>
        <span>
          Page {formatCount(Math.min(page, pageCount))} of {formatCount(pageCount)}
        </span>
        <Button
          variant="secondary"
          size="sm"
          aria-disabled={atEnd || undefined}
          className="aria-disabled:cursor-not-allowed aria-disabled:opacity-60"
          onClick={() => (atEnd ? undefined : onPage(page + 1))}
        >
          Next page
        </Button>
      </div>
    </nav>
  );
}

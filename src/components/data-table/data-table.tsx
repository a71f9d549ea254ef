import { useTable, type RowData } from '@tanstack/react-table';
import { useId, useMemo, type ReactNode } from 'react';
import type { ListPage } from '#shared/schemas/list-query.ts';
import { cn } from '#src/lib/cn.ts';
import { formatCount } from '#src/lib/format.ts';
import { isNarrowed, type ListQueryBase, type ListSearch } from '#src/lib/list-search-params.ts';
import { Button } from '../button.tsx';
import { ErrorState } from '../error-state.tsx';
import { Spinner } from '../spinner.tsx';
import { dataTableFeatures, type DataTableColumn } from './columns.ts';
import { Pager } from './pager.tsx';
import { SearchBox } from './search-box.tsx';
import { SortHeader, ariaSort } from './sort-header.tsx';

/** What the table needs of a list query's result (a TanStack `useQuery` result fits). */
export interface DataTableResult<T> {
  data: ListPage<T> | undefined;
  isPending: boolean;
  isError: boolean;
  error: unknown;
  isFetching: boolean;
  refetch: () => unknown;
}

export interface DataTableProps<T extends RowData, Q extends ListQueryBase> {
  /** The table's visible caption, also the name of its scrolling region. */
  caption: string;
  /** What the rows are, for counts and messages: { one: 'maker', other: 'makers' }. */
  noun: { one: string; other: string };
  columns: DataTableColumn<T>[];
  getRowId: (row: T) => string;
  /** The column whose cells head their rows (th scope="row"), e.g. the name. */
  rowHeader?: string;
  /** The list's state in the URL (useListSearchParams). */
  list: ListSearch<Q>;
  /** Column ids the server sorts by (each a value of the list schema's `sort`). */
  sortable: readonly Q['sort'][];
  result: DataTableResult<T>;
  /** The search box's label; false for a list without search. */
  searchLabel: string | false;
  searchHint?: string;
  /** Filter controls shown beside the search. */
  filters?: ReactNode;
  /** Shown when the list holds nothing at all (not merely nothing that matches). */
  empty?: ReactNode;
  pageSizes?: readonly number[];
}

const NO_ROWS: never[] = [];

/**
 * A table over a server-side list: sort by clicking a header, search, filters and pages, all in
 * the URL; loading, empty and error states; accessible (caption, header scopes, aria-sort,
 * keyboard-reachable scrolling region, a live status line).
 */
export function DataTable<T extends RowData, Q extends ListQueryBase>(props: DataTableProps<T, Q>) {
  const { caption, noun, columns, getRowId, rowHeader, list, sortable, result, searchLabel, searchHint, filters, empty } = props;
  const { query } = list;
  const id = `t${useId().replace(/:/g, '')}`;
  const items = result.data?.items ?? NO_ROWS;
  const total = result.data?.total ?? 0;

  const sorting = useMemo(() => [{ id: query.sort, desc: query.dir === 'desc' }], [query.sort, query.dir]);
  const table = useTable({
    features: dataTableFeatures,
    columns,
    data: items,
    getRowId,
    manualSorting: true,
    enableMultiSort: false,
    enableSortingRemoval: false,
    state: { sorting },
    onSortingChange: (updater) => {
      const next = (typeof updater === 'function' ? updater(sorting) : updater)[0];
      if (next && (sortable as readonly string[]).includes(next.id)) list.setSort(next.id as Q['sort'], next.desc ? 'desc' : 'asc');
    },
  });

  const columnCount = table.getAllLeafColumns().length;
  const sortHeader = table.getColumn(query.sort)?.columnDef.header;
  // While the first page loads the spinner speaks; a second status saying the same is noise.
  const status =
    result.isPending || result.isError
      ? ''
      : [
          `${formatCount(total)} ${total === 1 ? noun.one : noun.other}${query.q ? ` matching “${query.q}”` : ''}`,
          typeof sortHeader === 'string' ? `, sorted by ${sortHeader} (${query.dir === 'asc' ? 'ascending' : 'descending'})` : '',
          result.isFetching ? '. Updating…' : '.',
        ].join('');

  return (
    <div className="space-y-4">
      {searchLabel !== false || filters ? (
        <div className="flex flex-wrap items-end gap-4">
          {searchLabel !== false ? <SearchBox label={searchLabel} hint={searchHint} value={query.q} onSearch={list.setSearch} /> : null}
          {filters}
        </div>
      ) : null}

      <p role="status" className="font-sans text-sm text-ink-soft">
        {status}
      </p>
      <span id={`${id}-sort-hint`} hidden>
        Sorts the table by this column; again to reverse.
      </span>

      {result.isPending ? (
        <Spinner label={`Loading ${noun.other}…`} />
      ) : result.isError ? (
        <ErrorState inline title={`The ${noun.other} could not be loaded`} error={result.error} onRetry={() => void result.refetch()} />
      ) : (
        <>
          <div
            role="region"
            aria-labelledby={`${id}-caption`}
            tabIndex={0}
            className="overflow-x-auto rounded-md border border-rule bg-paper-raised"
          >
            <table
              className="w-full border-collapse text-left transition-opacity aria-busy:opacity-60"
              aria-busy={result.isFetching || undefined}
            >
              <caption id={`${id}-caption`} className="px-4 pt-3 pb-2 text-left text-lg font-semibold">
                {caption}
              </caption>
              <thead className="bg-paper-sunk">
                {table.getHeaderGroups().map((group) => (
                  <tr key={group.id}>
                    {group.headers.map((header) => {
                      const columnId = header.column.id;
                      const canSort = (sortable as readonly string[]).includes(columnId);
                      const sorted = query.sort === columnId ? query.dir : false;
                      const meta = header.column.columnDef.meta;
                      const align = meta?.align ?? 'start';
                      return (
                        <th
                          key={header.id}
                          scope="col"
                          aria-sort={canSort ? ariaSort(sorted) : undefined}
                          className={cn('bl-label border-y border-rule px-4 py-2 align-bottom', align === 'end' && 'text-right')}
                        >
                          {header.isPlaceholder ? null : canSort ? (
                            <SortHeader
                              sorted={sorted}
                              align={align}
                              hintId={`${id}-sort-hint`}
                              onToggle={() => header.column.toggleSorting(sorted ? sorted === 'asc' : Boolean(meta?.descFirst))}
                            >
                              <table.FlexRender header={header} />
                            </SortHeader>
                          ) : (
                            <table.FlexRender header={header} />
                          )}
                        </th>
                      );
                    })}
                  </tr>
                ))}
              </thead>
              <tbody>
                {items.length === 0 ? (
                  <tr>
                    <td colSpan={columnCount} className="px-4 py-6">
                      <EmptyState list={list} noun={noun} empty={empty} total={total} />
                    </td>
                  </tr>
                ) : (
                  table.getRowModel().rows.map((row) => (
                    <tr key={row.id} className="border-b border-rule align-top last:border-b-0">
                      {row.getAllCells().map((cell) => {
                        const align = cell.column.columnDef.meta?.align === 'end' ? 'text-right tabular-nums' : '';
                        return cell.column.id === rowHeader ? (
                          <th key={cell.id} scope="row" className={cn('px-4 py-3 font-sans text-sm font-semibold', align)}>
                            <table.FlexRender cell={cell} />
                          </th>
                        ) : (
                          <td key={cell.id} className={cn('px-4 py-3 text-sm', align)}>
                            <table.FlexRender cell={cell} />
                          </td>
                        );
                      })}
                    </tr>
                  ))
                )}
              </tbody>
            </table>
          </div>
          {total > 0 ? (
            <Pager
              page={query.page}
              pageSize={query.pageSize}
              total={total}
              noun={noun.other}
              onPage={list.setPage}
              onPageSize={list.setPageSize}
              pageSizes={props.pageSizes}
            />
          ) : null}
        </>
      )}
    </div>
  );
}

/** Nothing to show: past the last page, nothing matching, or nothing yet. */
function EmptyState<Q extends ListQueryBase>({
  list,
  noun,
  empty,
  total,
}: {
  list: ListSearch<Q>;
  noun: { other: string };
  empty: ReactNode;
  total: number;
}) {
  if (total > 0) {
    return (
      <div className="space-y-3 font-sans text-sm">
        <p>This page is past the end of the list.</p>
        <Button variant="secondary" size="sm" onClick={() => list.setPage(1)}>
          Go to the first page
        </Button>
      </div>
    );
  }
  if (isNarrowed(list.query)) {
    return (
      <div className="space-y-3 font-sans text-sm">
        <p>No {noun.other} match this search or filter.</p>
        <Button variant="secondary" size="sm" onClick={list.clearSearch}>
          Clear search and filters
        </Button>
      </div>
    );
  }
  return <div className="font-sans text-sm">{empty ?? <p>No {noun.other} yet.</p>}</div>;
}

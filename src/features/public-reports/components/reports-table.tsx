import {
  columnFilteringFeature,
  createColumnHelper,
  createFilteredRowModel,
  createSortedRowModel,
  filterFn_equalsString,
  filterFn_includesString,
  globalFilteringFeature,
  rowSortingFeature,
  sortFn_basic,
  sortFn_text,
  tableFeatures,
  useTable,
} from '@tanstack/react-table';
import { useId, useMemo } from 'react';
import { Link } from 'react-router-dom';
import type { PublicReportSummary } from '#shared/schemas/reports.ts';
import { Button } from '#src/components/button.tsx';
import { SortHeader, ariaSort } from '#src/components/data-table/sort-header.tsx';
import { cn } from '#src/lib/cn.ts';
import { useDisplayUnits } from '#src/lib/display-units.tsx';
import { formatCount, formatDate } from '#src/lib/format.ts';
import type { ListSearch } from '#src/lib/list-search-params.ts';
import type { IndexSort, ReportsIndexSearch } from '../hooks/use-reports-index-search.ts';
import { categoryLabel } from '../utils/category.ts';
import { KEY_FIGURES, type FigureUnits } from '../utils/key-figures.ts';
import { EmptyFigure } from './empty-figure.tsx';

interface IndexColumnMeta {
  align?: 'start' | 'end';
  /** The first click sorts largest first. */
  descFirst?: boolean;
}

/** Sorting, the category and maker filters and the search run in the browser: the list is short. */
const indexFeatures = tableFeatures({
  rowSortingFeature,
  columnFilteringFeature,
  globalFilteringFeature,
  sortedRowModel: createSortedRowModel(),
  filteredRowModel: createFilteredRowModel(),
  sortFns: { basic: sortFn_basic, text: sortFn_text },
  filterFns: { equalsString: filterFn_equalsString, includesString: filterFn_includesString },
  columnMeta: {} as IndexColumnMeta,
});

const column = createColumnHelper<typeof indexFeatures, PublicReportSummary>();
/** react-table leaves `undefined` where we ask it to: empty figures sort last in both directions. */
const orUndefined = (v: number | null) => (v === null ? undefined : v);

function buildColumns(units: FigureUnits) {
  return column.columns([
    column.accessor('title', {
      id: 'title',
      header: 'Report',
      sortFn: 'text',
      cell: ({ row }) => (
        <span className="block min-w-56">
          <Link to={`/reports/${row.original.slug}`}>{row.original.title}</Link>
          {row.original.units > 1 ? <span className="block font-sans text-xs font-normal text-ink-muted">{row.original.units} units measured</span> : null}
        </span>
      ),
    }),
    column.accessor('category', {
      id: 'category',
      header: 'Category',
      sortFn: 'text',
      filterFn: 'equalsString',
      enableGlobalFilter: false,
      cell: ({ getValue }) => categoryLabel(getValue()),
    }),
    column.accessor('maker', { id: 'maker', header: 'Maker', sortFn: 'text', filterFn: 'equalsString' }),
    column.accessor('model', { id: 'model', header: 'Model', sortFn: 'text' }),
    ...KEY_FIGURES.map((f) =>
      column.accessor((r) => orUndefined(f.value(r.keyFigures)), {
        id: f.id,
        header: () => {
          const { label, detail } = f.short(units);
          return (
            <>
              <span className="block">{label}</span>
              {detail ? (
                <>
                  <span className="sr-only">,</span>{' '}
                  <span className="block text-xs font-normal text-ink-soft">{detail}</span>
                </>
              ) : null}
            </>
          );
        },
        sortFn: 'basic',
        sortUndefined: 'last',
        enableGlobalFilter: false,
        meta: { align: 'end', descFirst: f.descFirst },
        cell: ({ row }) => f.text(row.original.keyFigures, units) ?? <EmptyFigure meaning={f.empty} />,
      }),
    ),
    column.accessor('publishedAt', {
      id: 'date',
      header: 'Report date',
      sortFn: 'text',
      enableGlobalFilter: false,
      meta: { descFirst: true },
      cell: ({ row }) => (
        <span className="whitespace-nowrap">
          <time dateTime={row.original.publishedAt}>{formatDate(row.original.publishedAt)}</time>
          {row.original.version > 1 ? <span className="block font-sans text-xs text-ink-muted">version {row.original.version}</span> : null}
        </span>
      ),
    }),
  ]);
}

const NO_REPORTS: PublicReportSummary[] = [];

/**
 * Every published report as a table: a header button sorts by its column (again to reverse),
 * the filters and search narrow the rows; all of it lives in the URL (`list`).
 */
export function ReportsTable({ reports, list }: { reports: readonly PublicReportSummary[]; list: ListSearch<ReportsIndexSearch> }) {
  const units = useDisplayUnits();
  const id = `t${useId().replace(/:/g, '')}`;
  const { query } = list;
  const columns = useMemo(() => buildColumns(units), [units]);
  const sorting = useMemo(() => [{ id: query.sort, desc: query.dir === 'desc' }], [query.sort, query.dir]);
  const columnFilters = useMemo(
    () => [
      ...(query.category ? [{ id: 'category', value: query.category }] : []),
      ...(query.maker ? [{ id: 'maker', value: query.maker }] : []),
    ],
    [query.category, query.maker],
  );
  const data = useMemo(() => (reports.length ? [...reports] : NO_REPORTS), [reports]);

  const table = useTable({
    features: indexFeatures,
    columns,
    data,
    getRowId: (r) => r.slug,
    globalFilterFn: 'includesString',
    enableMultiSort: false,
    enableSortingRemoval: false,
    state: { sorting, columnFilters, globalFilter: query.q },
    onSortingChange: (updater) => {
      const next = (typeof updater === 'function' ? updater(sorting) : updater)[0];
      if (next) list.setSort(next.id as IndexSort, next.desc ? 'desc' : 'asc');
    },
  });

  const rows = table.getRowModel().rows;
  const sortedBy = KEY_FIGURES.find((f) => f.id === query.sort)?.heading(units) ?? table.getColumn(query.sort)?.columnDef.header;
  const status = `${formatCount(rows.length)} of ${formatCount(reports.length)} ${reports.length === 1 ? 'report' : 'reports'}${
    typeof sortedBy === 'string' ? `, sorted by ${sortedBy} (${query.dir === 'asc' ? 'ascending' : 'descending'})` : ''
  }.`;

  return (
    <div className="space-y-3">
      <p role="status" className="font-sans text-sm text-ink-soft">
        {status}
      </p>
      <span id={`${id}-sort-hint`} hidden>
        Sorts the table by this column; again to reverse.
      </span>
      <div role="region" aria-labelledby={`${id}-caption`} tabIndex={0} className="relative overflow-x-auto rounded-md border border-rule bg-paper-raised">
        <table className="w-full border-collapse text-left">
          <caption id={`${id}-caption`} className="px-4 pt-3 pb-2 text-left">
            <span className="block text-lg font-semibold">Published reports</span>
            <span className="block font-sans text-xs font-normal text-ink-soft">
              Combined red and near-infrared figures; an empty cell says why it is empty (not measured, no claim, or no
              price). Each column is explained below the table.
            </span>
          </caption>
          <thead className="bg-paper-sunk">
            {table.getHeaderGroups().map((group) => (
              <tr key={group.id}>
                {group.headers.map((header) => {
                  const columnId = header.column.id;
                  const sorted = query.sort === columnId ? query.dir : false;
                  const meta = header.column.columnDef.meta;
                  const align = meta?.align ?? 'start';
                  return (
                    <th
                      key={header.id}
                      scope="col"
                      aria-sort={ariaSort(sorted)}
                      className={cn('border-y border-rule px-3 py-2 align-bottom', align === 'end' && 'text-right')}
                    >
                      <SortHeader
                        sorted={sorted}
                        align={align}
                        hintId={`${id}-sort-hint`}
                        onToggle={() => header.column.toggleSorting(sorted ? sorted === 'asc' : Boolean(meta?.descFirst))}
                      >
                        {/* Sentence case: upper case would turn mW/cm² into MW/CM². */}
                        <span className="tracking-normal whitespace-nowrap normal-case">
                          <table.FlexRender header={header} />
                        </span>
                      </SortHeader>
                    </th>
                  );
                })}
              </tr>
            ))}
          </thead>
          <tbody>
            {rows.length === 0 ? (
              <tr>
                <td colSpan={table.getAllLeafColumns().length} className="px-4 py-6">
                  <div className="space-y-3 font-sans text-sm">
                    <p>No reports match this search or filter.</p>
                    <Button variant="secondary" size="sm" onClick={list.clearSearch}>
                      Clear search and filters
                    </Button>
                  </div>
                </td>
              </tr>
            ) : (
              rows.map((row) => (
                <tr key={row.id} className="border-b border-rule align-top last:border-b-0">
                  {row.getAllCells().map((cell) => {
                    const align = cell.column.columnDef.meta?.align === 'end' ? 'text-right tabular-nums' : '';
                    return cell.column.id === 'title' ? (
                      <th key={cell.id} scope="row" className="px-3 py-3 font-sans text-sm font-semibold">
                        <table.FlexRender cell={cell} />
                      </th>
                    ) : (
                      <td key={cell.id} className={cn('px-3 py-3 font-sans text-sm', align)}>
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
    </div>
  );
}

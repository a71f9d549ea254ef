import { useMemo } from 'react';
import { makerListQuerySchema, type Maker, type MakerListQuery } from '#shared/schemas/makers.ts';
import { Button } from '#src/components/button.tsx';
import { createDataTableColumnHelper } from '#src/components/data-table/columns.ts';
import { DataTable } from '#src/components/data-table/data-table.tsx';
import { formatCount, formatDate } from '#src/lib/format.ts';
import { useListSearchParams } from '#src/lib/list-search-params.ts';
import { useMakers } from '../api/get-makers.ts';

const column = createDataTableColumnHelper<Maker>();
const SORTABLE = ['name', 'modelCount', 'createdAt'] as const satisfies readonly MakerListQuery['sort'][];

function buildColumns(onEdit: (maker: Maker) => void) {
  return column.columns([
    column.accessor('name', { header: 'Name' }),
    column.accessor('website', {
      header: 'Website',
      cell: ({ getValue }) => {
        const url = getValue();
        return url ? (
          <a href={url} rel="noopener noreferrer" target="_blank" className="break-all">
            {url.replace(/^https?:\/\//, '')}
            <span className="sr-only"> (opens in a new tab)</span>
          </a>
        ) : (
          <span className="text-ink-muted">—</span>
        );
      },
    }),
    column.accessor('modelCount', {
      header: 'Models',
      meta: { align: 'end', descFirst: true },
      cell: ({ getValue }) => formatCount(getValue()),
    }),
    column.accessor('createdAt', {
      header: 'Added',
      meta: { descFirst: true },
      cell: ({ getValue }) => <time dateTime={getValue()}>{formatDate(getValue())}</time>,
    }),
    column.display({
      id: 'actions',
      header: () => <span className="sr-only">Actions</span>,
      cell: ({ row }) => (
        <Button variant="secondary" size="sm" aria-label={`Edit ${row.original.name}`} onClick={() => onEdit(row.original)}>
          Edit
        </Button>
      ),
    }),
  ]);
}

/** The makers in the catalogue: sorted, searched and paged on the server, the state in the URL. */
export function MakersTable({ onEdit }: { onEdit: (maker: Maker) => void }) {
  const list = useListSearchParams(makerListQuerySchema);
  const result = useMakers(list.query);
  const columns = useMemo(() => buildColumns(onEdit), [onEdit]);
  return (
    <DataTable
      caption="Makers"
      noun={{ one: 'maker', other: 'makers' }}
      columns={columns}
      getRowId={(m) => m.id}
      rowHeader="name"
      list={list}
      sortable={SORTABLE}
      result={result}
      searchLabel="Search makers"
      searchHint="By name."
      empty={<p>No makers in the catalogue yet. Add the first with “Add maker”.</p>}
    />
  );
}

import { useMemo } from 'react';
import {
  INSTRUMENT_KINDS,
  INSTRUMENT_KIND_LABELS,
  instrumentListQuerySchema,
  type Instrument,
  type InstrumentListQuery,
} from '#shared/schemas/instruments.ts';
import { Button } from '#src/components/button.tsx';
import { createDataTableColumnHelper } from '#src/components/data-table/columns.ts';
import { DataTable } from '#src/components/data-table/data-table.tsx';
import { SelectField } from '#src/components/select-field.tsx';
import { formatDay, formatFigure, formatLength } from '#src/lib/format.ts';
import { useListSearchParams } from '#src/lib/list-search-params.ts';
import { useInstruments } from '../api/get-instruments.ts';
import { OverdueBadge } from './overdue-badge.tsx';

const column = createDataTableColumnHelper<Instrument>();
const SORTABLE = ['name', 'kind', 'calibrationDueOn'] as const satisfies readonly InstrumentListQuery['sort'][];
const kindFilterOptions = [{ value: '', label: 'All kinds' }, ...INSTRUMENT_KINDS.map((k) => ({ value: k, label: INSTRUMENT_KIND_LABELS[k] }))];
const none = <span className="text-ink-muted">—</span>;

function buildColumns(onEdit: (instrument: Instrument) => void) {
  return column.columns([
    column.accessor('name', { header: 'Name' }),
    column.accessor('kind', { header: 'Kind', cell: ({ getValue }) => INSTRUMENT_KIND_LABELS[getValue()] }),
    column.accessor('serial', { header: 'Serial number', cell: ({ getValue }) => <span className="font-mono">{getValue()}</span> }),
    column.accessor('wavelengthRangeNm', {
      header: 'Range',
      cell: ({ getValue }) => {
        const range = getValue();
        return range ? `${formatLength(range.from)}–${formatLength(range.to)} nm` : none;
      },
    }),
    column.accessor('cosineCorrector', { header: 'Cosine corrector', cell: ({ getValue }) => getValue() ?? none }),
    column.accessor('calibratedOn', {
      header: 'Calibrated',
      cell: ({ getValue }) => <time dateTime={getValue()}>{formatDay(getValue())}</time>,
    }),
    column.accessor('calibrationDueOn', {
      header: 'Calibration due',
      cell: ({ getValue, row }) => (
        <div className="flex flex-col items-start gap-1">
          <time dateTime={getValue()}>{formatDay(getValue())}</time>
          {row.original.calibrationOverdue ? <OverdueBadge /> : null}
        </div>
      ),
    }),
    column.accessor('calibrationUncertaintyPct', {
      header: 'Uncertainty',
      meta: { align: 'end' },
      cell: ({ getValue }) => `${formatFigure(getValue())} %`,
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

/** The lab's instruments and their calibration, an overdue one marked; the state in the URL. */
export function InstrumentsTable({ onEdit }: { onEdit: (instrument: Instrument) => void }) {
  const list = useListSearchParams(instrumentListQuerySchema);
  const result = useInstruments(list.query);
  const columns = useMemo(() => buildColumns(onEdit), [onEdit]);
  const { query, setFilter } = list;
  return (
    <DataTable
      caption="Instruments"
      noun={{ one: 'instrument', other: 'instruments' }}
      columns={columns}
      getRowId={(i) => i.id}
      rowHeader="name"
      list={list}
      sortable={SORTABLE}
      result={result}
      searchLabel="Search instruments"
      searchHint="By name or serial number."
      filters={
        <div className="min-w-48">
          <SelectField
            label="Kind"
            options={kindFilterOptions}
            value={query.kind ?? ''}
            onChange={(event) => setFilter('kind', (event.target.value || undefined) as InstrumentListQuery['kind'])}
          />
        </div>
      }
      empty={<p>No instruments in the catalogue yet. Add the first with “Add instrument”.</p>}
    />
  );
}

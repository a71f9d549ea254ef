import { useMemo } from 'react';
import { OBTAINED_LABELS, deviceUnitListQuerySchema, type DeviceUnit, type DeviceUnitListQuery } from '#shared/schemas/device-units.ts';
import { Button } from '#src/components/button.tsx';
import { createDataTableColumnHelper } from '#src/components/data-table/columns.ts';
import { DataTable } from '#src/components/data-table/data-table.tsx';
import { formatDate, formatDay } from '#src/lib/format.ts';
import { useListSearchParams } from '#src/lib/list-search-params.ts';
import { useDeviceUnits } from '../api/get-device-units.ts';
import { ModelSelect } from './model-select.tsx';

const column = createDataTableColumnHelper<DeviceUnit>();
const SORTABLE = ['serial', 'model', 'maker', 'receivedOn', 'createdAt'] as const satisfies readonly DeviceUnitListQuery['sort'][];
const none = <span className="text-ink-muted">—</span>;

function buildColumns(onEdit: (unit: DeviceUnit) => void) {
  return column.columns([
    column.accessor('serial', { header: 'Serial number', cell: ({ getValue }) => <span className="font-mono">{getValue()}</span> }),
    column.accessor('modelName', { id: 'model', header: 'Model' }),
    column.accessor('makerName', { id: 'maker', header: 'Maker' }),
    column.accessor('obtained', { header: 'Obtained', cell: ({ getValue }) => OBTAINED_LABELS[getValue()] }),
    column.accessor('receivedOn', {
      header: 'Received',
      meta: { descFirst: true },
      cell: ({ getValue }) => {
        const day = getValue();
        return day ? <time dateTime={day}>{formatDay(day)}</time> : none;
      },
    }),
    column.accessor('firmware', { header: 'Firmware', cell: ({ getValue }) => getValue() ?? none }),
    column.accessor('createdAt', {
      header: 'Added',
      meta: { descFirst: true },
      cell: ({ getValue }) => <time dateTime={getValue()}>{formatDate(getValue())}</time>,
    }),
    column.display({
      id: 'actions',
      header: () => <span className="sr-only">Actions</span>,
      cell: ({ row }) => (
        <Button variant="secondary" size="sm" aria-label={`Edit unit ${row.original.serial}`} onClick={() => onEdit(row.original)}>
          Edit
        </Button>
      ),
    }),
  ]);
}

/** The units the lab holds, filtered by model; the state in the URL. */
export function DeviceUnitsTable({ onEdit }: { onEdit: (unit: DeviceUnit) => void }) {
  const list = useListSearchParams(deviceUnitListQuerySchema);
  const result = useDeviceUnits(list.query);
  const columns = useMemo(() => buildColumns(onEdit), [onEdit]);
  const { query, setFilter } = list;
  return (
    <DataTable
      caption="Units"
      noun={{ one: 'unit', other: 'units' }}
      columns={columns}
      getRowId={(u) => u.id}
      rowHeader="serial"
      list={list}
      sortable={SORTABLE}
      result={result}
      searchLabel="Search units"
      searchHint="By serial number, model or maker."
      filters={
        <div className="min-w-56">
          <ModelSelect
            label="Model"
            emptyLabel="All models"
            value={query.modelId ?? ''}
            onChange={(event) => setFilter('modelId', event.target.value || undefined)}
          />
        </div>
      }
      empty={<p>No units in the catalogue yet. Add the first with “Add unit”.</p>}
    />
  );
}

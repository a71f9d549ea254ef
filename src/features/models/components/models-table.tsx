import { useMemo } from 'react';
import { CATEGORY_LABELS, MODEL_CATEGORIES, modelListQuerySchema, type Model, type ModelListQuery } from '#shared/schemas/models.ts';
import { Button } from '#src/components/button.tsx';
import { createDataTableColumnHelper } from '#src/components/data-table/columns.ts';
import { DataTable } from '#src/components/data-table/data-table.tsx';
import { SelectField } from '#src/components/select-field.tsx';
import { formatCount, formatDate, formatFigure, formatLength, formatMoney } from '#src/lib/format.ts';
import { useListSearchParams } from '#src/lib/list-search-params.ts';
import { useModels } from '../api/get-models.ts';
import { MakerSelect } from './maker-select.tsx';

const column = createDataTableColumnHelper<Model>();
const SORTABLE = ['name', 'maker', 'category', 'createdAt'] as const satisfies readonly ModelListQuery['sort'][];
const categoryFilterOptions = [{ value: '', label: 'All categories' }, ...MODEL_CATEGORIES.map((c) => ({ value: c, label: CATEGORY_LABELS[c] }))];
const none = <span className="text-ink-muted">—</span>;

function claimText({ claims }: Model): string | null {
  const parts: string[] = [];
  if (claims.irradianceMwCm2 !== null) {
    parts.push(`${formatFigure(claims.irradianceMwCm2)} mW/cm²${claims.atDistanceCm !== null ? ` at ${formatLength(claims.atDistanceCm)} cm` : ''}`);
  }
  if (claims.beamAngleDeg !== null) parts.push(`${formatLength(claims.beamAngleDeg)}°${claims.beamAngleKind ? ` ${claims.beamAngleKind} angle` : ''}`);
  return parts.length ? parts.join('; ') : null;
}

function buildColumns(onEdit: (model: Model) => void) {
  return column.columns([
    column.accessor('name', { header: 'Name' }),
    column.accessor('makerName', { id: 'maker', header: 'Maker' }),
    column.accessor('category', { header: 'Category', cell: ({ getValue }) => CATEGORY_LABELS[getValue()] }),
    column.accessor('emittingAreaCm', {
      header: 'Emitting area',
      cell: ({ getValue }) => `${formatLength(getValue().width)} × ${formatLength(getValue().height)} cm`,
    }),
    column.accessor('ledCount', {
      header: 'LEDs',
      meta: { align: 'end' },
      cell: ({ getValue }) => {
        const n = getValue();
        return n === null ? none : formatCount(n);
      },
    }),
    column.accessor('nominalWavelengths', {
      header: 'Wavelengths',
      cell: ({ getValue }) => {
        const list = getValue();
        return list.length === 0
          ? none
          : list.map((w) => `${formatLength(w.nm)} nm${w.sharePct !== null ? ` (${formatFigure(w.sharePct)} %)` : ''}`).join(', ');
      },
    }),
    column.display({ id: 'claims', header: 'Claims', cell: ({ row }) => claimText(row.original) ?? none }),
    column.accessor('price', {
      header: 'Price',
      meta: { align: 'end' },
      cell: ({ getValue }) => {
        const price = getValue();
        return price ? formatMoney(price.amountMinor, price.currency) : none;
      },
    }),
    column.accessor('unitCount', { header: 'Units', meta: { align: 'end' }, cell: ({ getValue }) => formatCount(getValue()) }),
    column.accessor('createdAt', {
      header: 'Added',
      meta: { descFirst: true },
      cell: ({ getValue }) => <time dateTime={getValue()}>{formatDate(getValue())}</time>,
    }),
    column.display({
      id: 'actions',
      header: () => <span className="sr-only">Actions</span>,
      cell: ({ row }) => (
        <Button variant="secondary" size="sm" aria-label={`Edit ${row.original.makerName} ${row.original.name}`} onClick={() => onEdit(row.original)}>
          Edit
        </Button>
      ),
    }),
  ]);
}

/** The models in the catalogue, with maker and category filters; the state in the URL. */
export function ModelsTable({ onEdit }: { onEdit: (model: Model) => void }) {
  const list = useListSearchParams(modelListQuerySchema);
  const result = useModels(list.query);
  const columns = useMemo(() => buildColumns(onEdit), [onEdit]);
  const { query, setFilter } = list;
  return (
    <DataTable
      caption="Models"
      noun={{ one: 'model', other: 'models' }}
      columns={columns}
      getRowId={(m) => m.id}
      rowHeader="name"
      list={list}
      sortable={SORTABLE}
      result={result}
      searchLabel="Search models"
      searchHint="By model or maker name."
      filters={
        <>
          <div className="min-w-48">
            <MakerSelect
              label="Maker"
              emptyLabel="All makers"
              value={query.makerId ?? ''}
              onChange={(event) => setFilter('makerId', event.target.value || undefined)}
            />
          </div>
          <div className="min-w-44">
            <SelectField
              label="Category"
              options={categoryFilterOptions}
              value={query.category ?? ''}
              onChange={(event) => setFilter('category', (event.target.value || undefined) as ModelListQuery['category'])}
            />
          </div>
        </>
      }
      empty={<p>No models in the catalogue yet. Add the first with “Add model”.</p>}
    />
  );
}

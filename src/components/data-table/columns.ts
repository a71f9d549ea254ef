import { createColumnHelper, rowSortingFeature, tableFeatures, type ColumnDef, type RowData } from '@tanstack/react-table';

/**
 * The table features of every server-side table: sorting only, done by the server
 * (`manualSorting`); its state is the list's sort in the URL.
 */
export const dataTableFeatures = tableFeatures({
  rowSortingFeature,
  columnMeta: {} as DataTableColumnMeta,
});
export type DataTableFeatures = typeof dataTableFeatures;

export interface DataTableColumnMeta {
  /** Numbers line up on the right. */
  align?: 'start' | 'end';
  /** The first click sorts descending (counts, dates: the largest or latest first). */
  descFirst?: boolean;
}

/** One column of a DataTable (a list mixes value types, as react-table's own `columns()` does). */
export type DataTableColumn<T extends RowData> = ColumnDef<DataTableFeatures, T, any>;

/** Column helper for a DataTable: a column whose id is a sort key of the list sorts on the server. */
export function createDataTableColumnHelper<T extends RowData>() {
  return createColumnHelper<DataTableFeatures, T>();
}

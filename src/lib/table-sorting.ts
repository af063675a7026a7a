import {
  getCoreRowModel,
  getFilteredRowModel,
  getSortedRowModel,
  useReactTable,
  type ColumnFiltersState,
  type Row,
  type SortingState,
  type TableOptions,
} from '@tanstack/react-table';
import { useState } from 'react';
import { compareComponentRefs } from '../../shared/natural-order';

/** TanStack Table's sortingFn for a column of component references: the project's one natural order. */
export const byComponentRef = <T>(a: Row<T>, b: Row<T>, id: string): number =>
  compareComponentRefs(a.getValue<string>(id), b.getValue<string>(id));

/**
 * A list of rows as every table shows it: sorted by `sortBy` at first, a header toggling between ascending and
 * descending (never back to unsorted), filtered by its column filters, each row keyed by its id.
 */
export function useSortedTable<T extends { id: number }>(
  data: T[],
  columns: TableOptions<T>['columns'],
  sortBy: string,
  options: Pick<TableOptions<T>, 'sortDescFirst'> = {},
) {
  const [sorting, setSorting] = useState<SortingState>([{ id: sortBy, desc: false }]);
  const [columnFilters, setColumnFilters] = useState<ColumnFiltersState>([]);
  return useReactTable({
    data,
    columns,
    state: { sorting, columnFilters },
    onSortingChange: setSorting,
    onColumnFiltersChange: setColumnFilters,
    getCoreRowModel: getCoreRowModel(),
    getSortedRowModel: getSortedRowModel(),
    getFilteredRowModel: getFilteredRowModel(),
    getRowId: (row) => String(row.id),
    enableSortingRemoval: false,
    ...options,
  });
}

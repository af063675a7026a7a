import { flexRender } from '@tanstack/react-table';
import { useMemo, type MouseEvent } from 'react';
import { useNavigate } from 'react-router';
import { findingPath, type Finding } from '../../../../shared/schemas/findings';
import { Button } from '../../../components/button';
import { ariaSortOf, SortButton } from '../../../components/sort-button';
import { EmptyState, ErrorState, Loading } from '../../../components/states';
import { useRestorationFindings } from '../../../lib/queries/get-restoration-findings';
import { useSortedTable } from '../../../lib/table-sorting';
import { FindingCards } from './finding-cards';
import { findingColumns } from './findings-columns';
import { FindingsFilters } from './findings-filters';

export interface FindingsTableProps {
  restorationId: number;
  photos: { id: number; label: string }[];
}

const none: Finding[] = [];
const findingsCount = (n: number) => (n === 1 ? '1 finding' : `${n} findings`);

/** Every finding on a restoration: sortable, filterable, each row opening the finding on its photo. */
export function FindingsTable({ restorationId, photos }: FindingsTableProps) {
  const query = useRestorationFindings(restorationId);
  const navigate = useNavigate();
  const photoLabel = useMemo(() => {
    const labels = new Map(photos.map((p) => [p.id, p.label]));
    return (id: number) => labels.get(id) ?? `Photo ${id}`;
  }, [photos]);
  const columns = useMemo(() => findingColumns(photoLabel), [photoLabel]);
  const table = useSortedTable(query.data ?? none, columns, 'number', { sortDescFirst: false });

  if (query.isPending) return <Loading label="Fetching findings…" />;
  if (query.isError) return <ErrorState error={query.error} onRetry={() => query.refetch()} />;
  if (query.data.length === 0)
    return (
      <EmptyState title="No findings yet">
        Open a photo and mark the spot: a leaky wax capacitor, a perished lead, a dry joint. Each mark becomes a finding
        here.
      </EmptyState>
    );

  const rows = table.getRowModel().rows;
  // The title is a real link for the keyboard; a click anywhere else on the row goes to the same place.
  const openRow = (e: MouseEvent, f: Finding) => {
    if (e.target instanceof Element && e.target.closest('a, button, input, select')) return;
    void navigate(findingPath(f));
  };

  return (
    <div className="space-y-3">
      <FindingsFilters table={table} photos={photos} />
      <div className="flex flex-wrap items-center justify-between gap-2">
        <p role="status" className="text-sm text-ink-soft">
          {rows.length === query.data.length
            ? findingsCount(rows.length)
            : `Showing ${rows.length} of ${findingsCount(query.data.length)}`}
        </p>
        {table.getState().columnFilters.length > 0 && (
          <Button variant="quiet" onClick={() => table.resetColumnFilters()}>
            Clear filters
          </Button>
        )}
      </div>
      {rows.length === 0 ? (
        <EmptyState title="No findings match these filters">Loosen a filter, or clear them all.</EmptyState>
      ) : (
        <>
          <div className="hidden overflow-x-auto rounded-xl border border-rule bg-panel md:block">
            <table className="w-full text-left text-sm">
              <caption className="sr-only">
                Findings on this restoration. Column headers sort; a row opens the finding on its photo.
              </caption>
              <thead className="border-b border-rule bg-sunken">
                {table.getHeaderGroups().map((group) => (
                  <tr key={group.id}>
                    {group.headers.map((header) => (
                      <th
                        key={header.id}
                        scope="col"
                        aria-sort={ariaSortOf(header.column)}
                        className="px-2 py-1 font-semibold"
                      >
                        <SortButton header={header} />
                      </th>
                    ))}
                  </tr>
                ))}
              </thead>
              <tbody className="divide-y divide-rule">
                {rows.map((row) => (
                  <tr key={row.id} onClick={(e) => openRow(e, row.original)} className="cursor-pointer hover:bg-sunken">
                    {row.getVisibleCells().map((cell) => (
                      <td key={cell.id} className="px-3 py-2 align-middle">
                        {flexRender(cell.column.columnDef.cell, cell.getContext())}
                      </td>
                    ))}
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
          <FindingCards rows={rows} photoLabel={photoLabel} className="md:hidden" />
        </>
      )}
    </div>
  );
}

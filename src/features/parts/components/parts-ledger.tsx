import { useMutationState } from '@tanstack/react-query';
import { flexRender } from '@tanstack/react-table';
import { useMemo, useState } from 'react';
import { can, type Role } from '../../../../shared/permissions';
import { partStateLabels, type Part } from '../../../../shared/schemas/parts';
import { EmptyState, ErrorState, Loading } from '../../../components/states';
import { useSortedTable } from '../../../lib/table-sorting';
import { ariaSortOf, SortButton } from '../../../components/sort-button';
import { partKeys } from '../api/keys';
import { useParts } from '../api/get-parts';
import { useUpdatePart, type PartPatch } from '../api/update-part';
import { useCurrency } from '../hooks/use-currency';
import type { FindingChoice } from '../../../components/finding-options';
import { LedgerFilter } from './ledger-filter';
import { partColumns } from './parts-columns';
import { nextState } from './state-mark';
import { partRowId } from './same-reference-part';

export interface PartsLedgerProps {
  restorationId: number;
  role: Role;
  /** Findings the reader can see, to show a part's link as "#n". */
  findings?: FindingChoice[];
  /** Opens a part in the form (technicians). */
  onEdit?: (part: Part) => void;
}

const none: Part[] = [];
/** The reference stays in view while a narrow screen scrolls the rest of the row. */
const REF = 'componentRef';
const pinned = 'sticky left-0 z-10';

/** The parts ledger, one line per component reference: what came out, what went in, and how it tested after. */
export function PartsLedger({ restorationId, role, findings, onEdit }: PartsLedgerProps) {
  const query = useParts(restorationId);
  // The promise form: each click's refusal is reported, even when another row was clicked meanwhile.
  const { mutateAsync: update } = useUpdatePart(restorationId);
  const [currency] = useCurrency();
  const [refused, setRefused] = useState<string>();
  const canEdit = can(role, 'parts.edit');
  const busy = useMutationState({
    filters: { mutationKey: partKeys.update, status: 'pending' },
    select: (m) => (m.state.variables as { id: number }).id,
  });
  const busyIds = useMemo(() => new Set(busy), [busy]);

  const columns = useMemo(() => {
    const byId = new Map((findings ?? []).map((f) => [f.id, f]));
    const advance = (part: Part) => {
      const to = nextState(part.state);
      if (!to) return;
      setRefused(undefined);
      const patch: PartPatch = { state: to };
      update({ id: part.id, patch }).catch((e: Error) =>
        setRefused(
          `${part.componentRef} was not marked ${partStateLabels[to].toLowerCase()} and is back to ${partStateLabels[part.state].toLowerCase()}: ${e.message}`,
        ),
      );
    };
    return partColumns({
      showPrivate: canEdit,
      showCost: can(role, 'parts.costs'),
      currency,
      findingOf: (id) => byId.get(id),
      onAdvance: canEdit ? advance : undefined,
      onEdit: canEdit ? onEdit : undefined,
      busyIds,
    });
  }, [findings, canEdit, currency, onEdit, busyIds, update]);

  const table = useSortedTable(query.data ?? none, columns, REF);

  if (query.isPending) return <Loading label="Fetching the parts ledger…" />;
  if (query.isError) return <ErrorState error={query.error} onRetry={() => query.refetch()} />;
  if (query.data.length === 0)
    return (
      <EmptyState title="No parts yet.">
        Record each change as you make it: the reference, what came out, what went in, and how it tested after.
      </EmptyState>
    );

  const rows = table.getRowModel().rows;
  return (
    <div className="space-y-3">
      <LedgerFilter column={table.getColumn('state')} shown={rows.length} total={query.data.length} />
      {refused && (
        <p
          role="alert"
          className="rounded-lg border border-danger/40 bg-danger-soft px-3 py-2 text-sm font-semibold text-danger"
        >
          <span aria-hidden="true">⚠ </span>
          {refused}
        </p>
      )}
      {rows.length === 0 ? (
        <EmptyState title="No parts in this state">Choose another state, or all of them.</EmptyState>
      ) : (
        // Relative, so the screen-reader-only texts inside stay within the scrolling box on a narrow screen.
        <div className="relative overflow-x-auto rounded-xl border border-rule bg-panel">
          <table className="w-full text-left text-sm">
            <caption className="sr-only">
              Parts ledger, by component reference. Column headers with a button sort.
            </caption>
            <thead className="border-b border-rule bg-sunken">
              {table.getHeaderGroups().map((group) => (
                <tr key={group.id}>
                  {group.headers.map((header) => (
                    <th
                      key={header.id}
                      scope="col"
                      aria-sort={header.column.getCanSort() ? ariaSortOf(header.column) : undefined}
                      className={`px-2 py-1 align-bottom font-semibold ${header.column.id === REF ? `${pinned} bg-sunken` : ''}`}
                    >
                      {header.column.getCanSort() ? (
                        <SortButton header={header} />
                      ) : (
                        <span className="inline-flex min-h-11 items-center px-1">
                          {flexRender(header.column.columnDef.header, header.getContext())}
                        </span>
                      )}
                    </th>
                  ))}
                </tr>
              ))}
            </thead>
            <tbody className="divide-y divide-rule">
              {rows.map((row) => (
                <tr
                  key={row.id}
                  id={partRowId(row.original.id)}
                  aria-label={`Part ${row.original.componentRef}`}
                  className="target:bg-glow-soft"
                >
                  {row.getVisibleCells().map((cell) => (
                    <td
                      key={cell.id}
                      className={`px-3 py-2 align-top ${cell.column.id === REF ? `${pinned} bg-panel` : ''}`}
                    >
                      {flexRender(cell.column.columnDef.cell, cell.getContext())}
                    </td>
                  ))}
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      )}
    </div>
  );
}

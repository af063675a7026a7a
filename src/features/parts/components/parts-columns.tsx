import { createColumnHelper, type FilterFn } from '@tanstack/react-table';
import { mainsPositionLabels, partActionLabels, partStates, type Part } from '../../../../shared/schemas/parts';
import type { FindingChoice } from '../../../components/finding-options';
import { formatMinor, type Currency } from '../lib/money';
import { byComponentRef } from '../../../lib/table-sorting';
import { OnTheDiagramLink } from '../../../components/on-the-diagram-link';
import { StateCell } from './state-cell';
import { WarningList } from './warning-list';

const helper = createColumnHelper<Part>();

const stateFilter: FilterFn<Part> = (row, id, value) => row.getValue(id) === value;
stateFilter.autoRemove = (value) => value === undefined || value === '';

/** A part and its rating as one phrase, the rating in figures. */
function PartText({ part, rating }: { part: string; rating: string }) {
  if (!part && !rating) return <span className="text-ink-soft">—</span>;
  return (
    <span>
      {part} {rating && <span className="font-mono whitespace-nowrap">{rating}</span>}
    </span>
  );
}

export interface PartColumnsOptions {
  /** Sources: never shown to owners (the server withholds them too). */
  showPrivate: boolean;
  /** Costs: technicians only (`parts.costs`: mentors see no money, owners no costs); the server withholds them too. */
  showCost: boolean;
  currency: Currency;
  /** The finding a part is linked to, if the reader can see it (owners see only shared findings). */
  findingOf: (findingId: number) => FindingChoice | undefined;
  onAdvance?: (part: Part) => void;
  onEdit?: (part: Part) => void;
  busyIds: ReadonlySet<number>;
}

/** The ledger's columns, keyed by component reference. */
export function partColumns({
  showPrivate,
  showCost,
  currency,
  findingOf,
  onAdvance,
  onEdit,
  busyIds,
}: PartColumnsOptions) {
  const columns = [
    helper.accessor('componentRef', {
      header: 'Ref',
      cell: (c) => (
        <span className="flex flex-col">
          <span className="font-mono font-semibold">{c.getValue()}</span>
          <OnTheDiagramLink restorationId={c.row.original.restorationId} text={c.getValue()} />
        </span>
      ),
      sortingFn: byComponentRef,
    }),
    helper.accessor('action', { header: 'Action', cell: (c) => partActionLabels[c.getValue()], enableSorting: false }),
    helper.accessor('state', {
      header: 'State',
      cell: (c) => <StateCell part={c.row.original} onAdvance={onAdvance} busy={busyIds.has(c.row.original.id)} />,
      sortingFn: (a, b, id) => partStates.indexOf(a.getValue(id)) - partStates.indexOf(b.getValue(id)),
      filterFn: stateFilter,
    }),
    helper.display({
      id: 'change',
      header: 'Original → replacement',
      cell: ({ row: { original: p } }) => (
        <div className="min-w-48">
          <PartText part={p.originalPart} rating={p.originalRating} />
          {p.action !== 'kept-original' && (
            <>
              <span aria-hidden="true" className="px-1 text-ink-soft">
                →
              </span>
              <span className="sr-only"> replaced by </span>
              {p.action === 'removed' ? (
                <span className="text-ink-soft">nothing</span>
              ) : (
                <PartText part={p.replacementPart} rating={p.replacementRating} />
              )}
            </>
          )}
          <WarningList warnings={p.warnings} className="mt-1" />
        </div>
      ),
    }),
    helper.accessor('mainsPosition', {
      header: 'Mains',
      cell: (c) =>
        c.getValue() === 'none' ? <span className="text-ink-soft">—</span> : mainsPositionLabels[c.getValue()],
      enableSorting: false,
    }),
    helper.accessor('quantity', { header: 'Qty', cell: (c) => <span className="font-mono">{c.getValue()}</span> }),
    ...(showCost
      ? [
          helper.accessor((p) => p.costMinor ?? undefined, {
            id: 'cost',
            header: 'Cost',
            cell: (c) => {
              const v = c.getValue();
              return v === undefined ? (
                <span className="text-ink-soft">—</span>
              ) : (
                <span className="font-mono whitespace-nowrap">{formatMinor(v, currency)}</span>
              );
            },
            sortUndefined: 'last',
          }),
        ]
      : []),
    ...(showPrivate ? [helper.accessor('source', { header: 'Source', enableSorting: false })] : []),
    helper.accessor('testedAfter', { header: 'Tested after', enableSorting: false }),
    helper.accessor('findingId', {
      header: 'Finding',
      cell: (c) => {
        const id = c.getValue();
        if (id === null) return <span className="text-ink-soft">—</span>;
        const f = findingOf(id);
        return f ? (
          <span title={f.title} className="font-mono">
            #{f.number}
            <span className="sr-only"> {f.title}</span>
          </span>
        ) : (
          // Owners see only shared findings: a link to another shows as none rather than hinting at it.
          <span className="text-ink-soft">{showPrivate ? 'linked' : '—'}</span>
        );
      },
      enableSorting: false,
    }),
    ...(onEdit
      ? [
          helper.display({
            id: 'edit',
            header: () => <span className="sr-only">Change</span>,
            cell: ({ row: { original: p } }) => (
              <button
                type="button"
                onClick={() => onEdit(p)}
                className="min-h-11 rounded-md px-2 font-semibold underline-offset-2 hover:underline print:hidden"
              >
                Edit<span className="sr-only"> {p.componentRef}</span>
              </button>
            ),
          }),
        ]
      : []),
  ];
  return columns;
}

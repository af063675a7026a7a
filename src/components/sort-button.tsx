import { flexRender, type Column, type Header } from '@tanstack/react-table';

const arrow = { asc: '▲', desc: '▼' } as const;

/** The header's aria-sort: ascending, descending, or none while the column is not the one sorted by. */
export function ariaSortOf<T>(column: Column<T, unknown>): 'ascending' | 'descending' | 'none' {
  const sorted = column.getIsSorted();
  return sorted === 'asc' ? 'ascending' : sorted === 'desc' ? 'descending' : 'none';
}

/** A column header's sort button, as every sortable table shows it: the header's words and ▲, ▼ or ↕. */
export function SortButton<T>({ header }: { header: Header<T, unknown> }) {
  const sorted = header.column.getIsSorted();
  return (
    <button
      type="button"
      onClick={header.column.getToggleSortingHandler()}
      className="inline-flex min-h-11 items-center gap-1 rounded px-1 hover:bg-panel"
    >
      {flexRender(header.column.columnDef.header, header.getContext())}
      <span aria-hidden="true" className={sorted ? 'text-glow-strong' : 'text-ink-soft/50'}>
        {sorted ? arrow[sorted] : '↕'}
      </span>
    </button>
  );
}

import type { Table } from '@tanstack/react-table';
import { useId } from 'react';
import {
  kindLabels,
  kinds,
  severities,
  severityLabels,
  statuses,
  statusLabels,
  type Finding,
} from '../../../../shared/schemas/findings';
import { inputClass } from '../../../components/field';

const label = 'block text-sm font-semibold';

function SelectFilter({
  table,
  column,
  name,
  options,
  numeric = false,
}: {
  table: Table<Finding>;
  column: string;
  name: string;
  options: { value: string | number; label: string }[];
  numeric?: boolean;
}) {
  const id = useId();
  const col = table.getColumn(column);
  if (!col) return null;
  const value = col.getFilterValue();
  return (
    <div>
      <label htmlFor={id} className={label}>
        {name}
      </label>
      <select
        id={id}
        value={value === undefined ? '' : String(value)}
        onChange={(e) =>
          col.setFilterValue(e.target.value === '' ? undefined : numeric ? Number(e.target.value) : e.target.value)
        }
        className={inputClass}
      >
        <option value="">All</option>
        {options.map((o) => (
          <option key={o.value} value={o.value}>
            {o.label}
          </option>
        ))}
      </select>
    </div>
  );
}

/** Narrowing the findings: status, severity, kind, the photo, and part of a component reference. */
export function FindingsFilters({ table, photos }: { table: Table<Finding>; photos: { id: number; label: string }[] }) {
  const refId = useId();
  const ref = table.getColumn('componentRef');
  return (
    <div className="grid grid-cols-2 gap-3 sm:grid-cols-3 lg:grid-cols-5">
      <SelectFilter
        table={table}
        column="status"
        name="Status"
        options={statuses.map((s) => ({ value: s, label: statusLabels[s] }))}
      />
      <SelectFilter
        table={table}
        column="severity"
        name="Severity"
        options={severities.map((s) => ({ value: s, label: severityLabels[s] }))}
      />
      <SelectFilter
        table={table}
        column="kind"
        name="Kind"
        options={kinds.map((k) => ({ value: k, label: kindLabels[k] }))}
      />
      <div>
        <label htmlFor={refId} className={label}>
          Component
        </label>
        <input
          id={refId}
          type="search"
          placeholder="e.g. C27"
          autoComplete="off"
          value={(ref?.getFilterValue() as string | undefined) ?? ''}
          onChange={(e) => ref?.setFilterValue(e.target.value)}
          className={`${inputClass} font-mono`}
        />
      </div>
      <SelectFilter
        table={table}
        column="photo"
        name="Photo"
        numeric
        options={photos.map((p) => ({ value: p.id, label: p.label }))}
      />
    </div>
  );
}

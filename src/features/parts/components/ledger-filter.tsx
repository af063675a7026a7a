import type { Column } from '@tanstack/react-table';
import { useId } from 'react';
import { partStateLabels, partStates, type Part } from '../../../../shared/schemas/parts';
import { inputClass } from '../../../components/field';
import { LabelledOptions } from '../../../components/labelled-options';

const count = (n: number) => (n === 1 ? '1 part' : `${n} parts`);

/** Narrows the ledger to one state, and says how many lines show. */
export function LedgerFilter({
  column,
  shown,
  total,
}: {
  column: Column<Part> | undefined;
  shown: number;
  total: number;
}) {
  const id = useId();
  const value = column?.getFilterValue();
  return (
    <div className="flex flex-wrap items-end justify-between gap-3">
      <div>
        <label htmlFor={id} className="block text-sm font-semibold">
          State
        </label>
        <select
          id={id}
          value={typeof value === 'string' ? value : ''}
          onChange={(e) => column?.setFilterValue(e.target.value || undefined)}
          className={`${inputClass} w-auto`}
        >
          <option value="">All states</option>
          <LabelledOptions values={partStates} labels={partStateLabels} />
        </select>
      </div>
      <p role="status" className="text-sm text-ink-soft">
        {shown === total ? count(total) : `Showing ${shown} of ${count(total)}`}
      </p>
    </div>
  );
}

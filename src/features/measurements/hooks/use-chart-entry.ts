import { useEffect, useRef, useState } from 'react';
import { useCreateMeasurements } from '../api/create-measurement';
import {
  blankRow,
  blankShared,
  isBlankRow,
  rowInput,
  rowProblem,
  type EntryRow,
  type EntryShared,
} from '../lib/chart-entry';

const START_ROWS = 3;

/**
 * Rows of a voltage chart being typed in. Saving sends one request per filled row; rows the server took leave the
 * list, rows it refused stay with its words, so they can be put right and sent again.
 */
export function useChartEntry(restorationId: number) {
  const nextKey = useRef(START_ROWS);
  const [rows, setRows] = useState<EntryRow[]>(() => Array.from({ length: START_ROWS }, (_, i) => blankRow(i)));
  const [shared, setShared] = useState<EntryShared>(blankShared);
  const [focusKey, setFocusKey] = useState<number | null>(null);
  const [savedCount, setSavedCount] = useState<number | null>(null);
  const save = useCreateMeasurements(restorationId);

  useEffect(() => {
    if (focusKey === null) return;
    document.getElementById(`chart-entry-location-${focusKey}`)?.focus();
    setFocusKey(null);
  }, [focusKey]);

  const change = (key: number, patch: Partial<EntryRow>) =>
    setRows((list) => list.map((r) => (r.key === key ? { ...r, ...patch, error: undefined } : r)));

  const addRow = (focus = true) => {
    const key = nextKey.current++;
    setRows((list) => [...list, blankRow(key)]);
    if (focus) setFocusKey(key);
  };

  const removeRow = (key: number) =>
    setRows((list) => (list.length > 1 ? list.filter((r) => r.key !== key) : [blankRow(nextKey.current++)]));

  async function saveAll() {
    setSavedCount(null);
    const filled = rows.filter((r) => !isBlankRow(r));
    const checked = filled.map((r) => ({ row: r, problem: rowProblem(r) }));
    const ready = checked.filter((c) => c.problem === undefined).map((c) => c.row);
    const results = ready.length ? await save.mutateAsync(ready.map((r) => rowInput(r, shared))) : [];
    const errors = new Map<number, string>(
      checked.flatMap((c) => (c.problem ? [[c.row.key, c.problem] as const] : [])),
    );
    const saved = new Set<number>();
    results.forEach((result, i) => {
      const key = ready[i]!.key;
      if (result.ok) saved.add(key);
      else errors.set(key, result.message);
    });
    setSavedCount(saved.size);
    setRows((list) => {
      const left = list
        .filter((r) => !saved.has(r.key) && !(isBlankRow(r) && saved.size > 0))
        .map((r) => ({ ...r, error: errors.get(r.key) }));
      return left.length ? left : [blankRow(nextKey.current++)];
    });
  }

  const filledCount = rows.filter((r) => !isBlankRow(r)).length;
  return {
    rows,
    shared,
    setShared,
    change,
    addRow,
    removeRow,
    saveAll,
    saving: save.isPending,
    savedCount,
    filledCount,
  };
}

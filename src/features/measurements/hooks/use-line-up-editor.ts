import { useRef, useState } from 'react';
import { liveChassisLikely } from '../../../../shared/bench';
import { lineUpSchema, type Valve } from '../../../../shared/schemas/measurements';
import { useSaveValves } from '../api/save-valves';
import { nextPosition } from '../lib/valve-words';

export interface ValveRow extends Valve {
  key: number;
}

/** The line-up being edited: rows added and removed freely, checked by the shared schema, saved whole. */
export function useLineUpEditor(restorationId: number, initial: Valve[], onSaved: () => void) {
  const nextKey = useRef(initial.length + 1);
  const [rows, setRows] = useState<ValveRow[]>(() =>
    initial.length ? initial.map((v, i) => ({ ...v, key: i })) : [{ key: 0, position: 'V1', type: '', notes: '' }],
  );
  const [errors, setErrors] = useState<Map<number, string>>(new Map());
  const save = useSaveValves(restorationId);

  const change = (key: number, patch: Partial<Valve>) => {
    setRows((list) => list.map((r) => (r.key === key ? { ...r, ...patch } : r)));
    setErrors((e) => (e.has(key) ? new Map([...e].filter(([k]) => k !== key)) : e));
  };
  const add = () =>
    setRows((list) => [...list, { key: nextKey.current++, position: nextPosition(list), type: '', notes: '' }]);
  const remove = (key: number) => setRows((list) => list.filter((r) => r.key !== key));

  function submit() {
    const valves = rows.map(({ position, type, notes }) => ({ position, type, notes }));
    const parsed = lineUpSchema.safeParse({ valves });
    if (!parsed.success) {
      const found = new Map<number, string>();
      for (const issue of parsed.error.issues) {
        const row = rows[Number(issue.path[1])];
        if (row && !found.has(row.key)) found.set(row.key, issue.message);
      }
      setErrors(found);
      return;
    }
    setErrors(new Map());
    save.mutate(parsed.data, { onSuccess: onSaved });
  }

  const live = liveChassisLikely(rows.map((r) => r.type).filter((t) => t.trim() !== ''));
  return {
    rows,
    errors,
    change,
    add,
    remove,
    submit,
    live,
    saving: save.isPending,
    serverMessage: save.error?.message,
  };
}

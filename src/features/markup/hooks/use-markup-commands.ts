import { useEffect, useMemo, useRef, useState } from 'react';
import type { Finding } from '../../../../shared/schemas/findings';
import { useConfirm } from '../../../components/use-confirm';
import { changeOf, effectOf, type Effect } from '../lib/command-effects';
import type { NewMark } from '../../../lib/new-mark';
import { plainPoints, toMark, withPoints } from '../lib/marks';
import type { Command } from '../model/commands';
import type { ImagePoint } from '../model/coordinates';
import { toGeometry } from '../model/geometry';
import { canUndo, emptyHistory, push, remapId, undo, type Change } from '../model/history';

/** The page's side of the canvas: it owns the findings and talks to the server. */
export interface CommandCallbacks {
  /** Resolve with the new finding's id once it exists (so the creation can be undone), or undefined if it was abandoned. */
  onCreate(geometry: NewMark): void | Promise<number | undefined>;
  onMove(id: number, points: { x: number; y: number }[]): void;
  onDelete(id: number): void;
  /**
   * Undo steps the canvas cannot carry out with the callbacks above: bringing back a deleted finding (a `create`
   * with its fields; resolve with the new id) or restoring fields. Without it, deletions are not undoable.
   */
  onUndo?(command: Command): void | Promise<number | undefined>;
}

interface Env extends CommandCallbacks {
  readonly items: readonly Finding[];
}

/**
 * Runs the commands the tools and keys make through the page's callbacks, and keeps the undo history
 * (`model/history.ts`): each change the canvas sends is recorded with its inverse, and Ctrl+Z sends that inverse.
 * Returns the marks to draw: points just sent are shown at once, until the page's list of findings changes (to
 * the optimistic update, or back after a refusal). `onSaved` hears when a mark drawn here has become a finding.
 */
export function useMarkupCommands(env: Env, onSaved?: (id: number) => void) {
  const [pending, setPending] = useState<{
    items: readonly Finding[];
    points: ReadonlyMap<number, readonly ImagePoint[]>;
  }>();
  const shown = pending && pending.items === env.items ? pending.points : undefined;
  const base = useMemo(() => env.items.map(toMark), [env.items]);
  const marks = useMemo(() => {
    if (!shown) return base;
    return base.map((m) => {
      const points = shown.get(m.id);
      return points ? withPoints(m, points) : m;
    });
  }, [base, shown]);
  const latest = useRef({ ...env, marks, onSaved });
  useEffect(() => {
    latest.current = { ...env, marks, onSaved };
  });
  const history = useRef(emptyHistory());
  /** The id a re-created finding had before its delete, keyed by the inverse command that re-creates it. */
  const deletedIds = useRef(new WeakMap<Command, number>());
  const [, setVersion] = useState(0);
  const [message, setMessage] = useState('');
  const { confirm, dialog: confirmDialog } = useConfirm();

  const record = (change: Change) => {
    history.current = push(history.current, change);
    setVersion((v) => v + 1);
  };
  const showPoints = (id: number, points: readonly ImagePoint[]) => {
    const { items } = latest.current;
    setPending((prev) => ({ items, points: new Map(prev?.items === items ? prev.points : []).set(id, points) }));
  };

  /** Carry out an effect; resolves with a created finding's id when there is one. */
  const perform = (effect: Effect): Promise<number | undefined> | undefined => {
    const e = latest.current;
    switch (effect.kind) {
      case 'points':
        showPoints(effect.id, effect.points);
        e.onMove(effect.id, plainPoints(effect.points));
        return undefined;
      case 'delete':
        e.onDelete(effect.id);
        return undefined;
      case 'create':
        if (!effect.command.fields)
          return Promise.resolve(
            e.onCreate({ shape: effect.command.shape, points: plainPoints(effect.command.points) }) ?? undefined,
          );
        return e.onUndo ? Promise.resolve(e.onUndo(effect.command) ?? undefined) : undefined;
      case 'fields':
        void e.onUndo?.(effect.command);
        return undefined;
      case 'none':
        return undefined;
    }
  };

  /** A command from a tool or a key: send it, and remember how to take it back. */
  const run = (command: Command) => {
    const { marks } = latest.current;
    const change = changeOf(command, marks);
    const created = perform(effectOf(command, marks));
    if (change) record(change);
    void created?.then((id) => {
      if (id === undefined) return;
      record({ type: 'created', id });
      latest.current.onSaved?.(id);
    });
  };

  /** Delete a finding after asking; undoable only when the page can bring it back (`onUndo`). */
  const remove = async (id: number): Promise<boolean> => {
    const asked = latest.current.items.find((f) => f.id === id);
    if (!asked) return false;
    const yes = await confirm({
      title: `Delete finding #${asked.number}, “${asked.title}”?`,
      consequence: 'Its thread and history are deleted with it.',
      confirmLabel: 'Delete finding',
      danger: true,
    });
    const e = latest.current;
    const finding = e.items.find((f) => f.id === id);
    if (!yes || !finding) return false;
    e.onDelete(id);
    if (e.onUndo) {
      const { title, componentRef, kind, severity, status, dismissReason, ownerVisible } = finding;
      record({
        type: 'deleted',
        ...toGeometry(finding),
        fields: { title, componentRef, kind, severity, status, dismissReason, ownerVisible },
      });
      const inverse = history.current.inverses.at(-1);
      if (inverse) deletedIds.current.set(inverse, id);
    }
    return true;
  };

  const undoLast = () => {
    const step = undo(history.current);
    if (!step) {
      setMessage('Nothing to undo.');
      return;
    }
    history.current = step.history;
    setVersion((v) => v + 1);
    const effect = effectOf(step.command, latest.current.marks);
    setMessage(effect.kind === 'none' ? 'That finding is no longer here; nothing was changed.' : 'Undone.');
    const oldId = deletedIds.current.get(step.command);
    void perform(effect)?.then((newId) => {
      if (oldId !== undefined && newId !== undefined) history.current = remapId(history.current, oldId, newId);
    });
  };

  return { marks, run, remove, undo: undoLast, canUndo: canUndo(history.current), message, confirmDialog };
}

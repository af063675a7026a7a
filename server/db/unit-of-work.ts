import type { Database, Tx } from './client';

/** Registers work that must wait until the transaction has committed (mail, object deletion, queue kicks). */
export type AfterCommit = (effect: () => unknown) => void;

/**
 * One user action, one transaction: `work` runs every statement on `tx` (rows, events, notifications), and
 * effects outside the database registered with `afterCommit` run only once the commit has succeeded. An
 * effect that fails after the commit is logged by its own code; it cannot undo what was saved.
 */
export async function unitOfWork<T>(db: Database, work: (tx: Tx, afterCommit: AfterCommit) => Promise<T>): Promise<T> {
  const effects: (() => unknown)[] = [];
  const result = await db.transaction((tx) => work(tx, (effect) => void effects.push(effect)));
  for (const effect of effects) await effect();
  return result;
}

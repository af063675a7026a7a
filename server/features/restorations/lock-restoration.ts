import { eq } from 'drizzle-orm';
import type { Executor } from '../../db/client';
import { restorations } from '../../db/schema';
import { NotFoundError } from '../../http/errors';

/**
 * Takes the restoration's row FOR UPDATE until the caller's transaction ends, so writes that check something on
 * the set (a sign-off, the next estimate version, a running timer) are decided one after the other; 404 when it is gone.
 */
export async function lockRestoration(tx: Executor, restorationId: number): Promise<void> {
  const [r] = await tx
    .select({ id: restorations.id })
    .from(restorations)
    .where(eq(restorations.id, restorationId))
    .for('update');
  if (!r) throw new NotFoundError();
}

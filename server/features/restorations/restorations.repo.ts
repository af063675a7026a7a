import { and, eq, ilike, or, type SQL } from 'drizzle-orm';
import type { Role } from '../../../shared/permissions';
import type { Stage } from '../../../shared/schemas/restorations';
import type { Executor } from '../../db/client';
import { keyset, toMs, type PageWindow } from '../../db/keyset';
import { memberships, restorations } from '../../db/schema';

export type RestorationRow = typeof restorations.$inferSelect;
type Values = Omit<typeof restorations.$inferInsert, 'id' | 'createdAt' | 'updatedAt'>;

/** The bench: most recently changed first (then the newest id). */
export const benchOrder = keyset('desc', [
  { by: toMs(restorations.updatedAt), kind: 'instant' },
  { by: restorations.id, kind: 'number' },
]);
export const benchCursor = (row: RestorationRow) => [row.updatedAt.toISOString(), row.id];

export function restorationsRepo(db: Executor) {
  return {
    /** The restorations a person is a member of, with their role, most recently changed first; one page (`window`). */
    async listFor(
      userId: number,
      filter: { q?: string; stage?: Stage },
      window: PageWindow,
    ): Promise<(RestorationRow & { role: Role })[]> {
      const where: (SQL | undefined)[] = [eq(memberships.userId, userId), benchOrder.after(window.cursor)];
      if (filter.stage) where.push(eq(restorations.stage, filter.stage));
      if (filter.q) {
        const like = `%${filter.q.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
        where.push(
          or(ilike(restorations.make, like), ilike(restorations.model, like), ilike(restorations.serial, like))!,
        );
      }
      const rows = await db
        .select({ restoration: restorations, role: memberships.role })
        .from(restorations)
        .innerJoin(memberships, eq(memberships.restorationId, restorations.id))
        .where(and(...where))
        .orderBy(...benchOrder.orderBy)
        .limit(window.limit);
      return rows.map((r) => ({ ...r.restoration, role: r.role }));
    },
    /** `lock` takes the row FOR UPDATE (inside a transaction) until the change commits. */
    async find(id: number, options: { lock?: boolean } = {}): Promise<RestorationRow | undefined> {
      const query = db.select().from(restorations).where(eq(restorations.id, id));
      const [row] = options.lock ? await query.for('update') : await query;
      return row;
    },
    /** Creates the restoration and makes its creator the technician, together or not at all. */
    async insertWithTechnician(values: Values, userId: number): Promise<RestorationRow> {
      return db.transaction(async (tx) => {
        const [row] = await tx.insert(restorations).values(values).returning();
        await tx.insert(memberships).values({ restorationId: row!.id, userId, role: 'technician' });
        return row!;
      });
    },
    async update(id: number, values: Partial<Values>): Promise<RestorationRow | undefined> {
      const [row] = await db.update(restorations).set(values).where(eq(restorations.id, id)).returning();
      return row;
    },
    async remove(id: number): Promise<boolean> {
      const rows = await db.delete(restorations).where(eq(restorations.id, id)).returning({ id: restorations.id });
      return rows.length > 0;
    },
  };
}

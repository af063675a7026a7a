import { and, asc, eq } from 'drizzle-orm';
import type { Role } from '../../../shared/permissions';
import type { Executor } from '../../db/client';
import { mismatchNotes } from '../../db/schema';
import { columnsOf, visibleSql } from '../visibility/visibility-sql';

export type MismatchNoteRow = typeof mismatchNotes.$inferSelect;

/** Mismatch notes are judged by the one visibility rule (`visibility.mismatchNote`). */
export const mismatchVisible = (role: Role) => visibleSql(role, 'mismatchNote', { mismatch: columnsOf(mismatchNotes) });

export function mismatchesRepo(db: Executor) {
  return {
    /** The restoration's mismatch notes this role may see, by reference then age; one reference when asked. */
    list(restorationId: number, role: Role, ref?: string): Promise<MismatchNoteRow[]> {
      return db
        .select()
        .from(mismatchNotes)
        .where(
          and(
            eq(mismatchNotes.restorationId, restorationId),
            mismatchVisible(role),
            ref ? eq(mismatchNotes.ref, ref) : undefined,
          ),
        )
        .orderBy(asc(mismatchNotes.ref), asc(mismatchNotes.id));
    },
    async find(id: number, role: Role): Promise<MismatchNoteRow | undefined> {
      const [row] = await db
        .select()
        .from(mismatchNotes)
        .where(and(eq(mismatchNotes.id, id), mismatchVisible(role)));
      return row;
    },
    async restorationOf(id: number): Promise<number | undefined> {
      const [row] = await db
        .select({ restorationId: mismatchNotes.restorationId })
        .from(mismatchNotes)
        .where(eq(mismatchNotes.id, id));
      return row?.restorationId;
    },
    async insert(values: typeof mismatchNotes.$inferInsert): Promise<MismatchNoteRow> {
      const [row] = await db.insert(mismatchNotes).values(values).returning();
      return row!;
    },
    async update(id: number, values: Partial<typeof mismatchNotes.$inferInsert>): Promise<MismatchNoteRow | undefined> {
      const [row] = await db
        .update(mismatchNotes)
        .set({ ...values, updatedAt: new Date() })
        .where(eq(mismatchNotes.id, id))
        .returning();
      return row;
    },
    async remove(id: number) {
      await db.delete(mismatchNotes).where(eq(mismatchNotes.id, id));
    },
  };
}

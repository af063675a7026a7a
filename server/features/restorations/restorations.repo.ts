import { and, desc, eq, ilike, or, type SQL } from 'drizzle-orm';
import type { RestorationInput, Stage } from '../../../shared/schemas/restorations';
import type { Database } from '../../db/client';
import { restorations } from '../../db/schema';

export type RestorationRow = typeof restorations.$inferSelect;
type Values = Omit<typeof restorations.$inferInsert, 'id' | 'createdAt' | 'updatedAt'>;

export function restorationsRepo(db: Database) {
  return {
    async list(filter: { q?: string; stage?: Stage }): Promise<RestorationRow[]> {
      const where: SQL[] = [];
      if (filter.stage) where.push(eq(restorations.stage, filter.stage));
      if (filter.q) {
        const like = `%${filter.q.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
        where.push(or(ilike(restorations.make, like), ilike(restorations.model, like), ilike(restorations.serial, like))!);
      }
      return db.select().from(restorations).where(and(...where)).orderBy(desc(restorations.updatedAt));
    },
    async find(id: number): Promise<RestorationRow | undefined> {
      const [row] = await db.select().from(restorations).where(eq(restorations.id, id));
      return row;
    },
    async insert(values: Values): Promise<RestorationRow> {
      const [row] = await db.insert(restorations).values(values).returning();
      return row!;
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

export type { RestorationInput };

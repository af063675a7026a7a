import { and, asc, eq, sql } from 'drizzle-orm';
import type { Role } from '../../../shared/permissions';
import type { Executor } from '../../db/client';
import { sheetPages, sheets } from '../../db/schema';
import { columnsOf, visibleSql } from '../visibility/visibility-sql';

export type SheetPageRow = typeof sheetPages.$inferSelect & { storageKey: string; contentType: string };

const columns = { page: sheetPages, storageKey: sheets.storageKey, contentType: sheets.contentType };
const flat = (r: { page: typeof sheetPages.$inferSelect; storageKey: string; contentType: string }): SheetPageRow => ({
  ...r.page,
  storageKey: r.storageKey,
  contentType: r.contentType,
});

export function sheetsRepo(db: Executor) {
  const select = () => db.select(columns).from(sheetPages).innerJoin(sheets, eq(sheets.id, sheetPages.sheetId));
  return {
    async insertSheet(values: typeof sheets.$inferInsert) {
      const [row] = await db.insert(sheets).values(values).returning({ id: sheets.id });
      return row!.id;
    },
    async insertPage(values: typeof sheetPages.$inferInsert) {
      const [row] = await db.insert(sheetPages).values(values).returning({ id: sheetPages.id });
      return row!.id;
    },
    /** The restoration's sheet pages this role may see, in upload order. */
    async listPages(restorationId: number, role: Role): Promise<SheetPageRow[]> {
      const visible = visibleSql(role, 'sheetPage', { sheetPage: columnsOf(sheetPages) });
      const rows = await select()
        .where(and(eq(sheetPages.restorationId, restorationId), visible))
        .orderBy(asc(sheetPages.sheetId), asc(sheetPages.pageNumber));
      return rows.map(flat);
    },
    async pagesOf(sheetId: number): Promise<SheetPageRow[]> {
      return (await select().where(eq(sheetPages.sheetId, sheetId)).orderBy(asc(sheetPages.pageNumber))).map(flat);
    },
    async findPage(id: number): Promise<SheetPageRow | undefined> {
      const [row] = await select().where(eq(sheetPages.id, id));
      return row && flat(row);
    },
    async restorationOfPage(id: number): Promise<number | undefined> {
      const [row] = await db
        .select({ restorationId: sheetPages.restorationId })
        .from(sheetPages)
        .where(eq(sheetPages.id, id));
      return row?.restorationId;
    },
    async updatePage(id: number, values: Partial<typeof sheetPages.$inferInsert>) {
      await db.update(sheetPages).set(values).where(eq(sheetPages.id, id));
    },
    /** Deletes a page (and the sheet when it was its last): which objects to delete once committed. */
    async removePage(id: number): Promise<{ storageKey: string; pageNumber: number; sheetGone: boolean } | undefined> {
      const [page] = await db
        .delete(sheetPages)
        .where(eq(sheetPages.id, id))
        .returning({ sheetId: sheetPages.sheetId, pageNumber: sheetPages.pageNumber });
      if (!page) return undefined;
      const [sheet] = await db
        .select({ storageKey: sheets.storageKey })
        .from(sheets)
        .where(eq(sheets.id, page.sheetId))
        .for('update');
      const [left] = await db
        .select({ n: sql<number>`count(*)::int` })
        .from(sheetPages)
        .where(eq(sheetPages.sheetId, page.sheetId));
      if (left!.n === 0) await db.delete(sheets).where(eq(sheets.id, page.sheetId));
      return { storageKey: sheet!.storageKey, pageNumber: page.pageNumber, sheetGone: left!.n === 0 };
    },
  };
}

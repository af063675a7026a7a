import { and, eq, inArray, sql } from 'drizzle-orm';
import type { Role } from '../../../shared/permissions';
import type { Status } from '../../../shared/schemas/findings';
import type { Executor } from '../../db/client';
import { keyset, toMs, type PageWindow } from '../../db/keyset';
import { findings, memberships, photos, users } from '../../db/schema';
import { columnsOf, findingFields, visibleSql } from '../visibility/visibility-sql';

export type PhotoRow = typeof photos.$inferSelect & {
  uploadedBy: string | null;
  findingCounts?: Partial<Record<Status, number>>;
};
type NewPhoto = typeof photos.$inferInsert;

const columns = { photo: photos, uploadedBy: users.name };
/** Oldest first (the order they were taken in at the bench), then by id. */
export const photoOrder = keyset('asc', [
  { by: toMs(photos.createdAt), kind: 'instant' },
  { by: photos.id, kind: 'number' },
]);
export const photoCursor = (row: PhotoRow) => [row.createdAt.toISOString(), row.id];

export function photosRepo(db: Executor) {
  const select = () => db.select(columns).from(photos).leftJoin(users, eq(users.id, photos.uploadedById));
  const flat = (r: { photo: typeof photos.$inferSelect; uploadedBy: string | null }): PhotoRow => ({
    ...r.photo,
    uploadedBy: r.uploadedBy,
  });
  return {
    /**
     * The restoration's photos this role may see, all of them or one page (`window`), each with its findings counted
     * by status under the same rule (one query: the counts are a correlated aggregate, not a query per photo).
     */
    async list(restorationId: number, role: Role, window?: PageWindow): Promise<PhotoRow[]> {
      const findingCounts = sql<Partial<Record<Status, number>>>`(
        select coalesce(jsonb_object_agg(s.status, s.n), '{}'::jsonb) from (
          select ${findings.status} as status, count(*)::int as n from ${findings}
            where ${findings.photoId} = ${photos.id} and ${visibleSql(role, 'finding', { finding: findingFields(), photo: columnsOf(photos) })}
            group by ${findings.status}) s)`;
      const query = db
        .select({ ...columns, findingCounts })
        .from(photos)
        .leftJoin(users, eq(users.id, photos.uploadedById))
        .where(
          and(
            eq(photos.restorationId, restorationId),
            visibleSql(role, 'photo', { photo: columnsOf(photos) }),
            photoOrder.after(window?.cursor),
          ),
        )
        .orderBy(...photoOrder.orderBy);
      return (window ? await query.limit(window.limit) : await query).map((r) => ({
        ...flat(r),
        findingCounts: r.findingCounts,
      }));
    },
    async find(id: number): Promise<PhotoRow | undefined> {
      const [row] = await select().where(eq(photos.id, id));
      return row && flat(row);
    },
    /** The photo's restoration, the reader's role there (if a member) and its findings version, in one query. */
    async accessOf(id: number, userId: number) {
      const [row] = await db
        .select({
          restorationId: photos.restorationId,
          findingsVersion: photos.findingsVersion,
          role: memberships.role,
        })
        .from(photos)
        .leftJoin(memberships, and(eq(memberships.restorationId, photos.restorationId), eq(memberships.userId, userId)))
        .where(eq(photos.id, id));
      return (
        row && { restorationId: row.restorationId, findingsVersion: row.findingsVersion, role: row.role ?? undefined }
      );
    },
    async restorationOf(id: number): Promise<number | undefined> {
      const [row] = await db.select({ restorationId: photos.restorationId }).from(photos).where(eq(photos.id, id));
      return row?.restorationId;
    },
    async insert(values: NewPhoto) {
      const [row] = await db.insert(photos).values(values).returning({ id: photos.id });
      return row!.id;
    },
    async update(id: number, values: Partial<NewPhoto>) {
      await db.update(photos).set(values).where(eq(photos.id, id));
    },
    async remove(id: number) {
      const [row] = await db.delete(photos).where(eq(photos.id, id)).returning({ storageKey: photos.storageKey });
      return row?.storageKey;
    },
    /** Which of these storage keys still have a row. */
    async existingKeys(keys: string[]): Promise<Set<string>> {
      if (!keys.length) return new Set();
      const rows = await db.select({ key: photos.storageKey }).from(photos).where(inArray(photos.storageKey, keys));
      return new Set(rows.map((r) => r.key));
    },
  };
}

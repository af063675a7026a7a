import { and, desc, eq, max, sql } from 'drizzle-orm';
import type { Role } from '../../../shared/permissions';
import type { Executor } from '../../db/client';
import { keyset, type PageWindow } from '../../db/keyset';
import { comments, findingChanges, findings, memberships, photos, restorations, users } from '../../db/schema';
import { columnsOf, findingFields, visibleSql } from '../visibility/visibility-sql';

export type FindingRow = typeof findings.$inferSelect;
export type FindingWithContext = FindingRow & {
  authorName: string | null;
  photoOwnerVisible: boolean;
  commentCount: number;
};
export type NewFinding = Omit<typeof findings.$inferInsert, 'number' | 'id'>;

const findingSources = { finding: columnsOf(findings), photo: columnsOf(photos) };
/** A restoration's findings by number (then id). */
export const findingOrder = keyset('asc', [
  { by: findings.number, kind: 'number' },
  { by: findings.id, kind: 'number' },
]);
export const findingCursor = (row: FindingRow) => [row.number, row.id];

export function findingsRepo(db: Executor) {
  /** The comments this role may read in each finding's thread (owners count only the shared ones). */
  const commentCount = (role: Role) =>
    sql<number>`(select count(*)::int from ${comments} where ${comments.findingId} = ${findings.id} and ${comments.deletedAt} is null
      and ${visibleSql(role, 'comment', { ...findingSources, comment: columnsOf(comments) })})`;
  const select = (role: Role) =>
    db
      .select({
        finding: findings,
        authorName: users.name,
        photoOwnerVisible: photos.ownerVisible,
        commentCount: commentCount(role),
      })
      .from(findings)
      .innerJoin(photos, eq(photos.id, findings.photoId))
      .leftJoin(users, eq(users.id, findings.authorId));
  type Joined = { finding: FindingRow; authorName: string | null; photoOwnerVisible: boolean; commentCount: number };
  const flat = (r: Joined): FindingWithContext => ({
    ...r.finding,
    authorName: r.authorName,
    photoOwnerVisible: r.photoOwnerVisible,
    commentCount: r.commentCount,
  });

  return {
    /** The restoration's findings this role may see, all of them or one page (`window`). */
    async listByRestoration(restorationId: number, role: Role, window?: PageWindow) {
      const query = select(role)
        .where(
          and(
            eq(findings.restorationId, restorationId),
            visibleSql(role, 'finding', findingSources),
            findingOrder.after(window?.cursor),
          ),
        )
        .orderBy(...findingOrder.orderBy);
      return (window ? await query.limit(window.limit) : await query).map(flat);
    },
    /**
     * One finding, with the comment count as this role reads it; whether they may see it is the caller's check.
     * `lock` takes the finding's row FOR UPDATE (inside a transaction) until the change commits.
     */
    async find(id: number, role: Role, options: { lock?: boolean } = {}) {
      const query = select(role).where(eq(findings.id, id));
      const [row] = options.lock ? await query.for('update', { of: findings }) : await query;
      return row && flat(row);
    },
    async restorationOf(id: number) {
      const [row] = await db.select({ id: findings.restorationId }).from(findings).where(eq(findings.id, id));
      return row?.id;
    },
    /** The finding's restoration and the reader's role there (if a member), in one query, for the route guard. */
    async accessOf(id: number, userId: number) {
      const [row] = await db
        .select({ restorationId: findings.restorationId, role: memberships.role })
        .from(findings)
        .leftJoin(
          memberships,
          and(eq(memberships.restorationId, findings.restorationId), eq(memberships.userId, userId)),
        )
        .where(eq(findings.id, id));
      return row && { restorationId: row.restorationId, role: row.role ?? undefined };
    },
    /** Numbers count up per restoration; the restoration row is locked so two creations never share one. */
    async insert(values: NewFinding): Promise<number> {
      return db.transaction(async (tx) => {
        await tx.execute(
          sql`select 1 from ${restorations} where ${restorations.id} = ${values.restorationId} for update`,
        );
        const [top] = await tx
          .select({ n: max(findings.number) })
          .from(findings)
          .where(eq(findings.restorationId, values.restorationId));
        const [row] = await tx
          .insert(findings)
          .values({ ...values, number: (top?.n ?? 0) + 1 })
          .returning({ id: findings.id });
        return row!.id;
      });
    },
    /** Applies the change and records it with who made it, together. */
    async update(
      id: number,
      values: Partial<FindingRow>,
      actorId: number,
      changes: Record<string, [unknown, unknown]>,
    ) {
      await db.transaction(async (tx) => {
        await tx.update(findings).set(values).where(eq(findings.id, id));
        await tx.insert(findingChanges).values({ findingId: id, actorId, changes });
      });
    },
    async remove(id: number) {
      await db.delete(findings).where(eq(findings.id, id));
    },
    /** The finding's change records this role may read (owners: only those made after it was shared). */
    history(id: number, role: Role) {
      return db
        .select({
          id: findingChanges.id,
          actorName: users.name,
          changes: findingChanges.changes,
          createdAt: findingChanges.createdAt,
        })
        .from(findingChanges)
        .innerJoin(findings, eq(findings.id, findingChanges.findingId))
        .innerJoin(photos, eq(photos.id, findings.photoId))
        .leftJoin(users, eq(users.id, findingChanges.actorId))
        .where(
          and(
            eq(findingChanges.findingId, id),
            visibleSql(role, 'change', {
              change: columnsOf(findingChanges),
              finding: findingFields(),
              photo: columnsOf(photos),
            }),
          ),
        )
        .orderBy(desc(findingChanges.createdAt), desc(findingChanges.id));
    },
  };
}

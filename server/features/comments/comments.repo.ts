import { eq, isNull, and } from 'drizzle-orm';
import type { Role } from '../../../shared/permissions';
import type { Executor } from '../../db/client';
import { keyset, toMs, type PageWindow } from '../../db/keyset';
import { comments, findings, photos, users } from '../../db/schema';
import { columnsOf, visibleSql } from '../visibility/visibility-sql';

export type CommentRow = typeof comments.$inferSelect & { authorName: string | null };

/** A thread oldest first (then by id). */
export const commentOrder = keyset('asc', [
  { by: toMs(comments.createdAt), kind: 'instant' },
  { by: comments.id, kind: 'number' },
]);

export function commentsRepo(db: Executor) {
  const select = () =>
    db.select({ c: comments, authorName: users.name }).from(comments).leftJoin(users, eq(users.id, comments.authorId));
  return {
    /** The thread as this role may read it (owners: the shared comments of a finding they may see). */
    async list(findingId: number, role: Role, window?: PageWindow): Promise<CommentRow[]> {
      const visible = visibleSql(role, 'comment', {
        comment: columnsOf(comments),
        finding: columnsOf(findings),
        photo: columnsOf(photos),
      });
      const query = select()
        .innerJoin(findings, eq(findings.id, comments.findingId))
        .innerJoin(photos, eq(photos.id, findings.photoId))
        .where(and(eq(comments.findingId, findingId), visible, commentOrder.after(window?.cursor)))
        .orderBy(...commentOrder.orderBy);
      const rows = window ? await query.limit(window.limit) : await query;
      return rows.map((r) => ({ ...r.c, authorName: r.authorName }));
    },
    async find(id: number): Promise<CommentRow | undefined> {
      const [r] = await select().where(eq(comments.id, id));
      return r && { ...r.c, authorName: r.authorName };
    },
    /** Stores a comment; undefined when its author already stored one under the same idempotency key. */
    async insert(values: typeof comments.$inferInsert): Promise<number | undefined> {
      const [row] = await db.insert(comments).values(values).onConflictDoNothing().returning({ id: comments.id });
      return row?.id;
    },
    /** The comment an author stored under an idempotency key (a concurrent twin is seen once it commits). */
    async findByKey(authorId: number, key: string): Promise<CommentRow | undefined> {
      const [r] = await select().where(and(eq(comments.authorId, authorId), eq(comments.idempotencyKey, key)));
      return r && { ...r.c, authorName: r.authorName };
    },
    async update(id: number, values: Partial<typeof comments.$inferInsert>) {
      await db
        .update(comments)
        .set(values)
        .where(and(eq(comments.id, id), isNull(comments.deletedAt)));
    },
    async participants(findingId: number): Promise<number[]> {
      const rows = await db
        .selectDistinct({ id: comments.authorId })
        .from(comments)
        .where(and(eq(comments.findingId, findingId), isNull(comments.deletedAt)));
      return rows.map((r) => r.id).filter((id): id is number => id !== null);
    },
  };
}

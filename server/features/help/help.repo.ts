import { and, desc, eq, gt, inArray, isNull, sql } from 'drizzle-orm';
import { rolesAllowed } from '../../../shared/permissions';
import type { Executor } from '../../db/client';
import { helpLinks, helpReplies, helpRequests, memberships, restorations } from '../../db/schema';

/** Help requests, their links and the replies left through them. */
export function helpRepo(db: Executor) {
  return {
    async insert(values: typeof helpRequests.$inferInsert) {
      const [row] = await db.insert(helpRequests).values(values).returning();
      return row!;
    },
    async find(id: number) {
      const [row] = await db.select().from(helpRequests).where(eq(helpRequests.id, id));
      return row;
    },
    /** Read for update, so two edits of the same request are applied one after the other. */
    async lock(id: number) {
      const [row] = await db.select().from(helpRequests).where(eq(helpRequests.id, id)).for('update');
      return row;
    },
    async update(id: number, values: Partial<typeof helpRequests.$inferInsert>) {
      const [row] = await db.update(helpRequests).set(values).where(eq(helpRequests.id, id)).returning();
      return row!;
    },
    async list(restorationId: number) {
      return db
        .select({
          id: helpRequests.id,
          symptom: helpRequests.symptom,
          createdAt: helpRequests.createdAt,
          pendingReplies: sql<number>`(select count(*)::int from ${helpReplies} where ${helpReplies.helpRequestId} = ${helpRequests.id} and ${helpReplies.approvedAt} is null)`,
        })
        .from(helpRequests)
        .where(eq(helpRequests.restorationId, restorationId))
        .orderBy(desc(helpRequests.createdAt), desc(helpRequests.id));
    },
    /** The latest requests on every restoration where the person may read them (technician or mentor), for the bench. */
    async forPerson(userId: number, limit: number) {
      return db
        .select({
          id: helpRequests.id,
          restorationId: helpRequests.restorationId,
          symptom: helpRequests.symptom,
          createdAt: helpRequests.createdAt,
          make: restorations.make,
          model: restorations.model,
        })
        .from(helpRequests)
        .innerJoin(restorations, eq(restorations.id, helpRequests.restorationId))
        .innerJoin(
          memberships,
          and(eq(memberships.restorationId, helpRequests.restorationId), eq(memberships.userId, userId)),
        )
        .where(inArray(memberships.role, rolesAllowed('help.view')))
        .orderBy(desc(helpRequests.createdAt), desc(helpRequests.id))
        .limit(limit);
    },
    async insertLink(values: typeof helpLinks.$inferInsert) {
      const [row] = await db.insert(helpLinks).values(values).returning();
      return row!;
    },
    async links(helpRequestId: number) {
      return db
        .select()
        .from(helpLinks)
        .where(eq(helpLinks.helpRequestId, helpRequestId))
        .orderBy(desc(helpLinks.createdAt), desc(helpLinks.id));
    },
    /** A link by its token's hash with its request's restoration, whatever its state. */
    async linkByHash(tokenHash: string) {
      const [row] = await db
        .select({ link: helpLinks, restorationId: helpRequests.restorationId })
        .from(helpLinks)
        .innerJoin(helpRequests, eq(helpRequests.id, helpLinks.helpRequestId))
        .where(eq(helpLinks.tokenHash, tokenHash));
      return row;
    },
    /** A link that works now: not revoked and not expired, checked by PostgreSQL's clock. */
    async liveLink(tokenHash: string) {
      const [row] = await db
        .select({ link: helpLinks, request: helpRequests })
        .from(helpLinks)
        .innerJoin(helpRequests, eq(helpRequests.id, helpLinks.helpRequestId))
        .where(
          and(eq(helpLinks.tokenHash, tokenHash), isNull(helpLinks.revokedAt), gt(helpLinks.expiresAt, sql`now()`)),
        );
      return row;
    },
    /** Withdraws a live link; false when it was already withdrawn. */
    async revoke(linkId: number) {
      const rows = await db
        .update(helpLinks)
        .set({ revokedAt: sql`now()` })
        .where(and(eq(helpLinks.id, linkId), isNull(helpLinks.revokedAt)))
        .returning({ id: helpLinks.id });
      return rows.length > 0;
    },
    async insertReply(values: typeof helpReplies.$inferInsert) {
      const [row] = await db.insert(helpReplies).values(values).returning();
      return row!;
    },
    async replyWithRestoration(replyId: number) {
      const [row] = await db
        .select({ reply: helpReplies, restorationId: helpRequests.restorationId })
        .from(helpReplies)
        .innerJoin(helpRequests, eq(helpRequests.id, helpReplies.helpRequestId))
        .where(eq(helpReplies.id, replyId));
      return row;
    },
    async approve(replyId: number, userId: number) {
      const [row] = await db
        .update(helpReplies)
        .set({
          approvedAt: sql`coalesce(${helpReplies.approvedAt}, now())`,
          approvedById: sql`coalesce(${helpReplies.approvedById}, ${userId})`,
        })
        .where(eq(helpReplies.id, replyId))
        .returning();
      return row!;
    },
  };
}

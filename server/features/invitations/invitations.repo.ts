import { and, desc, eq, gt, isNull, sql } from 'drizzle-orm';
import type { Role } from '../../../shared/permissions';
import type { Executor } from '../../db/client';
import { invitations, restorations, users } from '../../db/schema';
import { hashToken, newToken } from '../auth/tokens';

export const INVITATION_LIFETIME_MS = 7 * 24 * 60 * 60 * 1000;

const pending = () =>
  and(isNull(invitations.acceptedAt), isNull(invitations.revokedAt), gt(invitations.expiresAt, new Date()));

export function invitationsRepo(db: Executor) {
  return {
    listPending(restorationId: number) {
      return db
        .select({
          id: invitations.id,
          email: invitations.email,
          role: invitations.role,
          invitedBy: users.name,
          expiresAt: invitations.expiresAt,
          createdAt: invitations.createdAt,
        })
        .from(invitations)
        .leftJoin(users, eq(users.id, invitations.invitedById))
        .where(and(eq(invitations.restorationId, restorationId), pending()))
        .orderBy(desc(invitations.createdAt));
    },
    /** Issues a new invitation, revoking any pending one for the same address on this restoration. */
    async issue(restorationId: number, email: string, role: Role, invitedById: number) {
      const { token, hash } = newToken();
      const row = await db.transaction(async (tx) => {
        await tx
          .update(invitations)
          .set({ revokedAt: new Date() })
          .where(
            and(
              eq(invitations.restorationId, restorationId),
              sql`lower(${invitations.email}) = lower(${email})`,
              pending(),
            ),
          );
        const [inserted] = await tx
          .insert(invitations)
          .values({
            restorationId,
            email,
            role,
            invitedById,
            tokenHash: hash,
            expiresAt: new Date(Date.now() + INVITATION_LIFETIME_MS),
          })
          .returning();
        return inserted!;
      });
      return { invitation: row, token };
    },
    /** A fresh token and expiry for a pending invitation (the old link stops working). */
    async renew(restorationId: number, id: number) {
      const { token, hash } = newToken();
      const [row] = await db
        .update(invitations)
        .set({ tokenHash: hash, expiresAt: new Date(Date.now() + INVITATION_LIFETIME_MS) })
        .where(
          and(
            eq(invitations.id, id),
            eq(invitations.restorationId, restorationId),
            isNull(invitations.acceptedAt),
            isNull(invitations.revokedAt),
          ),
        )
        .returning();
      return row ? { invitation: row, token } : undefined;
    },
    async revoke(restorationId: number, id: number) {
      const rows = await db
        .update(invitations)
        .set({ revokedAt: new Date() })
        .where(and(eq(invitations.id, id), eq(invitations.restorationId, restorationId), pending()))
        .returning({ id: invitations.id });
      return rows.length > 0;
    },
    /** A live invitation by its token, with what the link page shows. */
    async findPendingByToken(token: string) {
      const [row] = await db
        .select({ invitation: invitations, make: restorations.make, model: restorations.model, invitedBy: users.name })
        .from(invitations)
        .innerJoin(restorations, eq(restorations.id, invitations.restorationId))
        .leftJoin(users, eq(users.id, invitations.invitedById))
        .where(and(eq(invitations.tokenHash, hashToken(token)), pending()));
      return row;
    },
    /** Marks it accepted in one statement, so a token works once even under concurrent requests. */
    async markAccepted(id: number, userId: number) {
      const rows = await db
        .update(invitations)
        .set({ acceptedAt: new Date(), acceptedById: userId })
        .where(and(eq(invitations.id, id), pending()))
        .returning({ id: invitations.id });
      return rows.length > 0;
    },
  };
}

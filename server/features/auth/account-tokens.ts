import { and, eq, gt, isNull } from 'drizzle-orm';
import type { Executor } from '../../db/client';
import { accountTokens } from '../../db/schema';
import { hashToken, newToken } from './tokens';

type Purpose = (typeof accountTokens.$inferInsert)['purpose'];

const LIFETIME_MS: Record<Purpose, number> = {
  'password-reset': 60 * 60 * 1000,
  'email-confirm': 3 * 24 * 60 * 60 * 1000,
};

export function accountTokensRepo(db: Executor) {
  return {
    async issue(userId: number, purpose: Purpose): Promise<string> {
      const { token, hash } = newToken();
      await db.insert(accountTokens).values({ userId, purpose, tokenHash: hash, expiresAt: new Date(Date.now() + LIFETIME_MS[purpose]) });
      return token;
    },
    /** Marks a live token used, in one statement so two requests cannot both spend it; returns its user. */
    async spend(token: string, purpose: Purpose): Promise<number | undefined> {
      const [row] = await db
        .update(accountTokens)
        .set({ usedAt: new Date() })
        .where(
          and(
            eq(accountTokens.tokenHash, hashToken(token)),
            eq(accountTokens.purpose, purpose),
            isNull(accountTokens.usedAt),
            gt(accountTokens.expiresAt, new Date()),
          ),
        )
        .returning({ userId: accountTokens.userId });
      return row?.userId;
    },
  };
}

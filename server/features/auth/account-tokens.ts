import { and, eq, gt, isNull } from 'drizzle-orm';
import type { Executor } from '../../db/client';
import { accountTokens } from '../../db/schema';
import { hashToken, newToken } from './tokens';

type Purpose = (typeof accountTokens.$inferInsert)['purpose'];

const LIFETIME_MS: Record<Purpose, number> = {
  'password-reset': 60 * 60 * 1000,
  'email-confirm': 3 * 24 * 60 * 60 * 1000,
};

/** What a confirmation link carries from the sign-up that sent it. */
export interface SignUpChoice {
  passwordHash: string;
  name: string;
}

export function accountTokensRepo(db: Executor) {
  return {
    async issue(userId: number, purpose: Purpose, choice?: SignUpChoice): Promise<string> {
      const { token, hash } = newToken();
      await db.insert(accountTokens).values({
        userId,
        purpose,
        tokenHash: hash,
        expiresAt: new Date(Date.now() + LIFETIME_MS[purpose]),
        passwordHash: choice?.passwordHash ?? null,
        name: choice?.name ?? null,
      });
      return token;
    },
    /** Marks a live token used, in one statement so two requests cannot both spend it; returns its user. */
    async spend(token: string, purpose: Purpose): Promise<{ userId: number; choice?: SignUpChoice } | undefined> {
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
        .returning({
          userId: accountTokens.userId,
          passwordHash: accountTokens.passwordHash,
          name: accountTokens.name,
        });
      if (!row) return undefined;
      return {
        userId: row.userId,
        choice: row.passwordHash && row.name ? { passwordHash: row.passwordHash, name: row.name } : undefined,
      };
    },
    /** Spends every outstanding reset and confirmation link of the account (after one of them was used). */
    async spendAll(userId: number): Promise<void> {
      await db
        .update(accountTokens)
        .set({ usedAt: new Date() })
        .where(and(eq(accountTokens.userId, userId), isNull(accountTokens.usedAt)));
    },
  };
}

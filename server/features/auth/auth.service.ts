import { and, eq, isNull, sql } from 'drizzle-orm';
import { PASSWORD_MIN } from '../../../shared/schemas/auth';
import type { AppDeps } from '../../app-deps';
import type { Executor, Tx } from '../../db/client';
import { sendOrRollBack } from '../../mail';
import { sessions, users } from '../../db/schema';
import { BadRequestError, HttpError } from '../../http/errors';
import { accountTokensRepo } from './account-tokens';
import { alreadyRegisteredMail, confirmEmailMail, passwordResetMail } from './auth.mail';
import { hashPassword, isCommonPassword } from './password';
import { publicUser, usersRepo } from './users.repo';

export function assertStrongPassword(password: string) {
  if (isCommonPassword(password))
    throw new BadRequestError('That password is among the most common ones; choose another.', [
      { location: 'body', path: 'password', message: `That password is among the most common ones; use ${PASSWORD_MIN}+ characters of your own.` },
    ]);
}

export function authService({ db, mailer, config }: AppDeps) {
  const repo = usersRepo(db);
  const tokens = accountTokensRepo(db);
  const link = (path: string) => `${config.publicOrigin}${path}`;
  const sendConfirmation = async (tx: Executor, user: { id: number; email: string; name: string }) => {
    const token = await accountTokensRepo(tx).issue(user.id, 'email-confirm');
    await sendOrRollBack(mailer, confirmEmailMail(user.email, user.name, link(`/confirm-email/${token}`)));
  };

  return {
    /**
     * Creates an account. The answer does not say whether the address was taken: a new account gets a
     * confirmation link, an existing one a reminder. An invitation sign-up (`join`) skips the link and joins
     * the restoration in the same transaction: if joining fails, no account stays and the link still works.
     * All in one transaction with the e-mail as its last step: when the mail server is down, nothing is
     * created and the answer is 503.
     */
    async signUp<J>(input: { name: string; email: string; password: string }, join?: (tx: Tx, user: ReturnType<typeof publicUser>) => Promise<J>) {
      assertStrongPassword(input.password);
      const passwordHash = await hashPassword(input.password);
      return db.transaction(async (tx) => {
        const inTx = usersRepo(tx);
        const existing = await inTx.byEmail(input.email);
        if (existing) {
          if (join) throw new HttpError(409, 'conflict', 'This address already has an account: sign in to accept the invitation.');
          if (existing.emailConfirmedAt) await sendOrRollBack(mailer, alreadyRegisteredMail(existing.email, link('/sign-in'), link('/reset-password')));
          else await sendConfirmation(tx, existing);
          return undefined;
        }
        const user = await inTx.insert({ ...input, passwordHash });
        if (join) {
          await tx.update(users).set({ emailConfirmedAt: new Date() }).where(eq(users.id, user.id));
          const joined = await join(tx, publicUser(user));
          return { user: publicUser(user), joined };
        }
        await sendConfirmation(tx, user);
        return undefined;
      });
    },

    async confirmEmail(token: string) {
      return db.transaction(async (tx) => {
        const userId = await accountTokensRepo(tx).spend(token, 'email-confirm');
        if (!userId) throw new HttpError(410, 'gone', 'This confirmation link has expired or was already used.');
        await tx.update(users).set({ emailConfirmedAt: new Date() }).where(and(eq(users.id, userId), isNull(users.emailConfirmedAt)));
        return publicUser((await usersRepo(tx).byId(userId))!);
      });
    },

    async isConfirmed(userId: number) {
      return Boolean((await repo.byId(userId))?.emailConfirmedAt);
    },

    /** Sends a reset link when the account exists; the caller answers the same either way. */
    async requestReset(email: string) {
      const user = await repo.byEmail(email);
      if (!user) return;
      const token = await tokens.issue(user.id, 'password-reset');
      await mailer.send(passwordResetMail(user.email, link(`/reset-password/${token}`)));
    },

    /** Sets the new password and ends every other session of the account, together or not at all. */
    async confirmReset(token: string, password: string) {
      assertStrongPassword(password);
      const passwordHash = await hashPassword(password);
      return db.transaction(async (tx) => {
        const userId = await accountTokensRepo(tx).spend(token, 'password-reset');
        if (!userId) throw new HttpError(410, 'gone', 'This reset link has expired or was already used; ask for a new one.');
        await usersRepo(tx).setPassword(userId, passwordHash);
        // A reset link proves the address too.
        await tx.update(users).set({ emailConfirmedAt: new Date() }).where(and(eq(users.id, userId), isNull(users.emailConfirmedAt)));
        await tx.delete(sessions).where(sql`(${sessions.sess}->'passport'->>'user')::int = ${userId}`);
        return publicUser((await usersRepo(tx).byId(userId))!);
      });
    },
  };
}

import { and, eq, isNull, sql } from 'drizzle-orm';
import { PASSWORD_MIN } from '../../../shared/schemas/auth';
import type { AppDeps } from '../../app-deps';
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
  const sendConfirmation = async (user: { id: number; email: string; name: string }) => {
    const token = await tokens.issue(user.id, 'email-confirm');
    await mailer.send(confirmEmailMail(user.email, user.name, link(`/confirm-email/${token}`)));
  };

  return {
    /**
     * Creates an account. The answer does not say whether the address was taken: a new account gets a
     * confirmation link, an existing one a reminder. `confirmed` accounts (invitations) skip the link.
     */
    async signUp(input: { name: string; email: string; password: string }, confirmed: boolean) {
      assertStrongPassword(input.password);
      const existing = await repo.byEmail(input.email);
      if (existing) {
        if (confirmed) throw new HttpError(409, 'conflict', 'This address already has an account: sign in to accept the invitation.');
        if (existing.emailConfirmedAt) await mailer.send(alreadyRegisteredMail(existing.email, link('/sign-in'), link('/reset-password')));
        else await sendConfirmation(existing);
        return undefined;
      }
      const user = await repo.insert({ ...input, passwordHash: await hashPassword(input.password) });
      if (confirmed) {
        await db.update(users).set({ emailConfirmedAt: new Date() }).where(eq(users.id, user.id));
        return publicUser(user);
      }
      await sendConfirmation(user);
      return undefined;
    },

    async confirmEmail(token: string) {
      const userId = await tokens.spend(token, 'email-confirm');
      if (!userId) throw new HttpError(410, 'gone', 'This confirmation link has expired or was already used.');
      await db.update(users).set({ emailConfirmedAt: new Date() }).where(and(eq(users.id, userId), isNull(users.emailConfirmedAt)));
      return publicUser((await repo.byId(userId))!);
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

    /** Sets the new password and ends every other session of the account. */
    async confirmReset(token: string, password: string) {
      assertStrongPassword(password);
      const userId = await tokens.spend(token, 'password-reset');
      if (!userId) throw new HttpError(410, 'gone', 'This reset link has expired or was already used; ask for a new one.');
      await repo.setPassword(userId, await hashPassword(password));
      // A reset link proves the address too.
      await db.update(users).set({ emailConfirmedAt: new Date() }).where(and(eq(users.id, userId), isNull(users.emailConfirmedAt)));
      await db.delete(sessions).where(sql`(${sessions.sess}->'passport'->>'user')::int = ${userId}`);
      return publicUser((await repo.byId(userId))!);
    },
  };
}

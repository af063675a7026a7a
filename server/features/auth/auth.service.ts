import { and, eq, isNull, sql } from 'drizzle-orm';
import type { AppDeps } from '../../app-deps';
import type { Tx } from '../../db/client';
import { sendOrRollBack } from '../../mail';
import { sessions, users } from '../../db/schema';
import { HttpError } from '../../http/errors';
import { accountTokensRepo } from './account-tokens';
import { alreadyRegisteredMail, confirmEmailMail, passwordResetMail } from './auth.mail';
import { assertStrongPassword } from './password-strength';
import { hashPassword } from './password';
import { publicUser, usersRepo } from './users.repo';
import { workshopAdminsRepo } from '../workshop/workshop.repo';

export { assertStrongPassword };

export function authService({ db, mailer, config }: AppDeps) {
  const repo = usersRepo(db);
  const link = (path: string) => `${config.publicOrigin}${path}`;

  return {
    /**
     * Creates an account. The answer does not say whether the address was taken: a new account gets a
     * confirmation link, an existing one a reminder. Every branch hashes the password and sends one message,
     * so the time taken does not tell either. An unconfirmed account takes the latest sign-up's name and
     * password (anyone may have started it), and its link is bound to them: confirming signs in only the person
     * who chose that password. An invitation sign-up (`join`) proves the address, skips the link and joins the
     * restoration in the same transaction: if joining fails, no account stays and the link still works.
     * The e-mail is the transaction's last step: when the mail server is down, nothing is created (503).
     */
    async signUp<J>(
      input: { name: string; email: string; password: string },
      join?: (tx: Tx, user: ReturnType<typeof publicUser>) => Promise<J>,
    ) {
      assertStrongPassword(input.password, [input.email, input.name]);
      const passwordHash = await hashPassword(input.password);
      return db.transaction(async (tx) => {
        const tokens = accountTokensRepo(tx);
        const existing = await usersRepo(tx).byEmail(input.email);
        if (existing?.emailConfirmedAt) {
          if (join)
            throw new HttpError(
              409,
              'conflict',
              'This address already has an account: sign in to accept the invitation.',
            );
          await sendOrRollBack(
            mailer,
            alreadyRegisteredMail(existing.email, link('/sign-in'), link('/reset-password')),
          );
          return undefined;
        }
        const choice = { passwordHash, name: input.name };
        const emailConfirmedAt = join ? new Date() : null;
        const row = existing
          ? (
              await tx
                .update(users)
                .set({ ...choice, emailConfirmedAt })
                .where(eq(users.id, existing.id))
                .returning()
            )[0]!
          : await usersRepo(tx).insert({ ...input, passwordHash, emailConfirmedAt });
        if (join) {
          // Links sent to earlier, unconfirmed sign-ups with this address die with the invitation's proof.
          await tokens.spendAll(row.id);
          await workshopAdminsRepo(tx).claimIfNone(row.id);
          const joined = await join(tx, publicUser(row));
          return { user: publicUser(row), joined };
        }
        const token = await tokens.issue(row.id, 'email-confirm', choice);
        await sendOrRollBack(mailer, confirmEmailMail(row.email, input.name, link(`/confirm-email/${token}`)));
        return undefined;
      });
    },

    /** Confirms the address with the password and name of the sign-up that sent the link; every other link goes. */
    async confirmEmail(token: string) {
      const userId = await db.transaction(async (tx) => {
        const tokens = accountTokensRepo(tx);
        const spent = await tokens.spend(token, 'email-confirm');
        if (!spent) return undefined;
        const [row] = await tx
          .update(users)
          .set({ emailConfirmedAt: new Date(), ...(spent.choice ?? {}) })
          .where(and(eq(users.id, spent.userId), isNull(users.emailConfirmedAt)))
          .returning({ id: users.id });
        if (!row) return undefined; // already confirmed another way: this link no longer speaks for the account
        await tokens.spendAll(spent.userId);
        // A new workshop's first confirmed account runs it (decision 46).
        await workshopAdminsRepo(tx).claimIfNone(spent.userId);
        return spent.userId;
      });
      if (!userId) throw new HttpError(410, 'gone', 'This confirmation link has expired or was already used.');
      return publicUser((await repo.byId(userId))!);
    },

    async isConfirmed(userId: number) {
      return Boolean((await repo.byId(userId))?.emailConfirmedAt);
    },

    /** Sends a reset link when the account exists; the caller answers the same either way. */
    async requestReset(email: string) {
      const user = await repo.byEmail(email);
      if (!user) return;
      const token = await accountTokensRepo(db).issue(user.id, 'password-reset');
      await mailer.send(passwordResetMail(user.email, link(`/reset-password/${token}`)));
    },

    /** Sets the new password, spends every other link and ends every session of the account, together. */
    async confirmReset(token: string, password: string) {
      assertStrongPassword(password);
      const passwordHash = await hashPassword(password);
      const userId = await db.transaction(async (tx) => {
        const tokens = accountTokensRepo(tx);
        const spent = await tokens.spend(token, 'password-reset');
        if (!spent) return undefined;
        // A reset link proves the address too.
        await tx
          .update(users)
          .set({ passwordHash, emailConfirmedAt: sql`coalesce(${users.emailConfirmedAt}, now())` })
          .where(eq(users.id, spent.userId));
        await tokens.spendAll(spent.userId);
        await tx.delete(sessions).where(sql`(${sessions.sess}->'passport'->>'user')::int = ${spent.userId}`);
        return spent.userId;
      });
      if (!userId)
        throw new HttpError(410, 'gone', 'This reset link has expired or was already used; ask for a new one.');
      return publicUser((await repo.byId(userId))!);
    },
  };
}

import type { IncomingMessage } from 'node:http';
import passport from 'passport';
import { Strategy as LocalStrategy } from 'passport-local';
import type { Database } from '../../db/client';
import { verifyPassword } from './password';
import { ACCOUNT_KEY, type SessionAccount } from './session-store';
import { publicUser, usersRepo } from './users.repo';

declare global {
  // eslint-disable-next-line @typescript-eslint/no-namespace
  namespace Express {
    interface User {
      id: number;
      name: string;
      email: string;
    }
  }
}

/** A passport instance of the app's own (not the global one), so several apps can live in one process. */
export function createPassport(db: Database) {
  const repo = usersRepo(db);
  const instance = new passport.Passport();
  instance.use(
    new LocalStrategy({ usernameField: 'email', passwordField: 'password' }, async (email, password, done) => {
      try {
        const user = await repo.byEmail(email);
        const ok = await verifyPassword(user?.passwordHash ?? null, password);
        done(null, ok && user ? publicUser(user) : false);
      } catch (err) {
        done(err);
      }
    }),
  );
  instance.serializeUser((user, done) => done(null, user.id));
  instance.deserializeUser(
    async (req: IncomingMessage, id: number, done: (err: unknown, user?: Express.User | false) => void) => {
      // The session store read the account with the session (one query); fall back to a lookup otherwise.
      const account = (
        (req as IncomingMessage & { session?: unknown }).session as unknown as
          Record<string, SessionAccount | undefined> | undefined
      )?.[ACCOUNT_KEY];
      if (account !== undefined && (account === null || account.id === id)) return done(null, account ?? false);
      try {
        const user = await repo.byId(id);
        // A deleted account simply ends the session.
        done(null, user ? publicUser(user) : false);
      } catch (err) {
        done(err);
      }
    },
  );
  return instance;
}

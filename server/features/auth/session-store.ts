import connectPgSimple from 'connect-pg-simple';
import session from 'express-session';

/** The signed-in account as read with the session (or null when the account is gone). */
export type SessionAccount = { id: number; name: string; email: string } | null;
/** Where the store leaves the account it read with the session; never written back to the table. */
export const ACCOUNT_KEY = '_account';
/** Where the store leaves the row's stored expiry (ms) it read with the session; never written back. */
const STORED_EXPIRY_KEY = '_storedExpiry';
/** A session's expiry is moved forward only when that gains at least this much (one write an hour, not one per request). */
const TOUCH_STEP_MS = 60 * 60 * 1000;
/** connect-pg-simple's lifetime of a session whose cookie has no expiry (its default `ttl`, one day). */
const TTL_MS = 24 * 60 * 60 * 1000;

type Callback = (err: unknown, sess?: session.SessionData | null) => void;
type Row = { sess: session.SessionData & Record<string, unknown>; account: SessionAccount; expire: Date | string };
/** Parts of connect-pg-simple's store that its type declarations leave out. */
type StoreInternals = { query(sql: string, params: unknown[], fn: (err: unknown, row?: Row) => void): void };

/**
 * connect-pg-simple's store, but reading the session and its account in one query: a signed-in request
 * costs one round trip to PostgreSQL before its route runs, instead of one for the session and one for
 * the account. Passport's deserializer picks the account up from the session (see passport.ts).
 * A read-only request does not write the session back either: express-session "touches" every session
 * it read (an UPDATE of its expiry), and this store does that only when the expiry moves by an hour or
 * more, so a session used all day still never lapses while in use.
 */
export function accountSessionStore(
  options: ConstructorParameters<ReturnType<typeof connectPgSimple>>[0] & { tableName: string },
) {
  const PgStore = connectPgSimple(session);
  class AccountSessionStore extends PgStore {
    override get(sid: string, fn: Callback) {
      const table = `"${options.tableName}"`;
      (this as unknown as StoreInternals).query(
        `select s.sess, s.expire, case when u.id is null then null else json_build_object('id', u.id, 'name', u.name, 'email', u.email) end as account
         from ${table} s left join users u on u.id = (s.sess #>> '{passport,user}')::int
         where s.sid = $1 and s.expire >= now()`,
        [sid],
        (err: unknown, row?: Row) => {
          if (err) return fn(err);
          if (!row) return fn(null, null);
          const sess = typeof row.sess === 'string' ? JSON.parse(row.sess) : row.sess;
          if (sess.passport?.user !== undefined) sess[ACCOUNT_KEY] = row.account;
          sess[STORED_EXPIRY_KEY] = new Date(row.expire).getTime();
          return fn(null, sess);
        },
      );
    }
    override set(sid: string, sess: session.SessionData, fn?: (err?: unknown) => void) {
      const {
        [ACCOUNT_KEY]: _dropped,
        [STORED_EXPIRY_KEY]: _expiry,
        ...rest
      } = sess as session.SessionData & Record<string, unknown>;
      void _dropped;
      void _expiry;
      super.set(sid, rest as session.SessionData, fn);
    }
    override touch(sid: string, sess: session.SessionData, fn?: (err?: unknown) => void) {
      const stored = (sess as session.SessionData & Record<string, unknown>)[STORED_EXPIRY_KEY];
      const next = sess.cookie?.expires ? new Date(sess.cookie.expires).getTime() : Date.now() + TTL_MS;
      if (typeof stored === 'number' && next - stored < TOUCH_STEP_MS) return fn?.();
      super.touch(sid, sess, fn);
    }
  }
  return new AccountSessionStore(options);
}

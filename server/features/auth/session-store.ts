import connectPgSimple from 'connect-pg-simple';
import session from 'express-session';

/** The signed-in account as read with the session (or null when the account is gone). */
export type SessionAccount = { id: number; name: string; email: string } | null;
/** Where the store leaves the account it read with the session; never written back to the table. */
export const ACCOUNT_KEY = '_account';

type Callback = (err: unknown, sess?: session.SessionData | null) => void;
type Row = { sess: session.SessionData & Record<string, unknown>; account: SessionAccount };
/** Parts of connect-pg-simple's store that its type declarations leave out. */
type StoreInternals = { query(sql: string, params: unknown[], fn: (err: unknown, row?: Row) => void): void };

/**
 * connect-pg-simple's store, but reading the session and its account in one query: a signed-in request
 * costs one round trip to PostgreSQL before its route runs, instead of one for the session and one for
 * the account. Passport's deserializer picks the account up from the session (see passport.ts).
 */
export function accountSessionStore(options: ConstructorParameters<ReturnType<typeof connectPgSimple>>[0] & { tableName: string }) {
  const PgStore = connectPgSimple(session);
  class AccountSessionStore extends PgStore {
    override get(sid: string, fn: Callback) {
      const table = `"${options.tableName}"`;
      (this as unknown as StoreInternals).query(
        `select s.sess, case when u.id is null then null else json_build_object('id', u.id, 'name', u.name, 'email', u.email) end as account
         from ${table} s left join users u on u.id = (s.sess #>> '{passport,user}')::int
         where s.sid = $1 and s.expire >= now()`,
        [sid],
        (err: unknown, row?: Row) => {
          if (err) return fn(err);
          if (!row) return fn(null, null);
          const sess = typeof row.sess === 'string' ? JSON.parse(row.sess) : row.sess;
          if (sess.passport?.user !== undefined) sess[ACCOUNT_KEY] = row.account;
          return fn(null, sess);
        },
      );
    }
    override set(sid: string, sess: session.SessionData, fn?: (err?: unknown) => void) {
      const { [ACCOUNT_KEY]: _dropped, ...rest } = sess as session.SessionData & Record<string, unknown>;
      void _dropped;
      super.set(sid, rest as session.SessionData, fn);
    }
  }
  return new AccountSessionStore(options);
}

import connectPgSimple from 'connect-pg-simple';
import session from 'express-session';
import type pg from 'pg';

export const SESSION_COOKIE = 'gridleak.sid';
export const REMEMBER_MS = 30 * 24 * 60 * 60 * 1000;

/** Sessions live in PostgreSQL (table `sessions`), so any instance can serve any request. */
export function sessionMiddleware(pool: pg.Pool, secret: string) {
  const Store = connectPgSimple(session);
  return session({
    name: SESSION_COOKIE,
    secret,
    store: new Store({ pool, tableName: 'sessions', createTableIfMissing: false, pruneSessionInterval: 15 * 60 }),
    resave: false,
    saveUninitialized: false,
    rolling: false,
    // Secure follows the request: on for HTTPS (with trust proxy behind a load balancer), off on plain local HTTP.
    cookie: { httpOnly: true, sameSite: 'lax', secure: 'auto', maxAge: undefined },
  });
}

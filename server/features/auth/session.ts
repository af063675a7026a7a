import session from 'express-session';
import type pg from 'pg';
import { accountSessionStore } from './session-store';

export const SESSION_COOKIE = 'gridleak.sid';
export const REMEMBER_MS = 30 * 24 * 60 * 60 * 1000;

/** Sessions live in PostgreSQL (table `sessions`), so any instance can serve any request; read with their account in one query. */
export function sessionMiddleware(pool: pg.Pool, secret: string) {
  return session({
    name: SESSION_COOKIE,
    secret,
    store: accountSessionStore({
      pool,
      tableName: 'sessions',
      createTableIfMissing: false,
      pruneSessionInterval: 15 * 60,
    }),
    resave: false,
    saveUninitialized: false,
    rolling: false,
    // Secure follows the request: on for HTTPS (with trust proxy behind a load balancer), off on plain local HTTP.
    cookie: { httpOnly: true, sameSite: 'lax', secure: 'auto', maxAge: undefined },
  });
}

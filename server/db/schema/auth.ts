import { bigint, index, integer, json, pgEnum, pgTable, serial, text, timestamp, varchar } from 'drizzle-orm/pg-core';
import { users } from './users';

/** Sessions, written by connect-pg-simple (its column names), so every instance sees every session. */
export const sessions = pgTable(
  'sessions',
  {
    sid: varchar().primaryKey(),
    sess: json().notNull(),
    expire: timestamp({ precision: 6, mode: 'date' }).notNull(),
  },
  (t) => [index('sessions_expire_idx').on(t.expire)],
);

/** Throttle counters, written by rate-limiter-flexible (its column names); shared by all instances. */
export const throttles = pgTable('throttles', {
  key: varchar({ length: 255 }).primaryKey(),
  points: integer().notNull().default(0),
  /** Expiry as epoch milliseconds. */
  expire: bigint({ mode: 'number' }),
});

export const tokenPurposeEnum = pgEnum('token_purpose', ['password-reset', 'email-confirm']);

/** Single-use account tokens (password reset, e-mail confirmation); only the SHA-256 of a token is kept. */
export const accountTokens = pgTable(
  'account_tokens',
  {
    id: serial().primaryKey(),
    userId: integer()
      .notNull()
      .references(() => users.id, { onDelete: 'cascade' }),
    purpose: tokenPurposeEnum().notNull(),
    tokenHash: text().notNull().unique(),
    expiresAt: timestamp({ withTimezone: true, mode: 'date' }).notNull(),
    usedAt: timestamp({ withTimezone: true, mode: 'date' }),
    /**
     * For e-mail confirmation: the password hash and name chosen in the sign-up that sent this link.
     * Confirming sets them, so a link signs in only the person who chose that password.
     */
    passwordHash: text(),
    name: text(),
    createdAt: timestamp({ withTimezone: true, mode: 'date' }).notNull().defaultNow(),
  },
  (t) => [index('account_tokens_user_id_idx').on(t.userId)],
);

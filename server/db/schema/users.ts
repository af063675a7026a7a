import { sql } from 'drizzle-orm';
import { pgTable, serial, text, timestamp, uniqueIndex } from 'drizzle-orm/pg-core';
import { timestamps } from './columns';

export const users = pgTable(
  'users',
  {
    id: serial().primaryKey(),
    name: text().notNull(),
    /** Stored as typed; compared case-insensitively through the lower() index. */
    email: text().notNull(),
    /** argon2id encoded hash; never leaves the server. Null until the account sets a password. */
    passwordHash: text(),
    /** Set when the person proved they read this address (a confirmation link or an invitation). */
    emailConfirmedAt: timestamp({ withTimezone: true, mode: 'date' }),
    ...timestamps,
  },
  (t) => [uniqueIndex('users_email_lower_idx').on(sql`lower(${t.email})`)],
);

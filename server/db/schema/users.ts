import { sql } from 'drizzle-orm';
import { boolean, pgTable, serial, text, timestamp, uniqueIndex } from 'drizzle-orm/pg-core';
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
    /**
     * One of the people who change the workshop's own settings (prices, tax, invoice prefix). Holding a role on a
     * restoration does not make one: anyone may sign up and take in a set (DEVELOPERS.md, decision 46).
     */
    workshopAdmin: boolean().notNull().default(false),
    ...timestamps,
  },
  (t) => [uniqueIndex('users_email_lower_idx').on(sql`lower(${t.email})`)],
);

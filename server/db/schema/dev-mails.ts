import { index, pgTable, serial, text, timestamp } from 'drizzle-orm/pg-core';

/** Messages caught by the local SMTP capture; kept in PostgreSQL so every instance lists the same. */
export const devMails = pgTable(
  'dev_mails',
  {
    id: serial().primaryKey(),
    to: text().notNull(),
    from: text().notNull(),
    subject: text().notNull(),
    text: text().notNull(),
    html: text(),
    receivedAt: timestamp({ withTimezone: true, mode: 'date' }).notNull().defaultNow(),
  },
  (t) => [index('dev_mails_received_at_idx').on(t.receivedAt)],
);

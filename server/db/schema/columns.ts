import { timestamp } from 'drizzle-orm/pg-core';

/** created_at / updated_at on every table that people edit. */
export const timestamps = {
  createdAt: timestamp({ withTimezone: true, mode: 'date' }).notNull().defaultNow(),
  updatedAt: timestamp({ withTimezone: true, mode: 'date' })
    .notNull()
    .defaultNow()
    .$onUpdate(() => new Date()),
};

import { index, integer, pgTable, serial, text, timestamp } from 'drizzle-orm/pg-core';
import { timestamps } from './columns';
import { roleEnum } from './memberships';
import { restorations } from './restorations';
import { users } from './users';

/** An invitation to join a restoration with a role; only the SHA-256 of its token is kept. */
export const invitations = pgTable(
  'invitations',
  {
    id: serial().primaryKey(),
    restorationId: integer()
      .notNull()
      .references(() => restorations.id, { onDelete: 'cascade' }),
    email: text().notNull(),
    role: roleEnum().notNull(),
    tokenHash: text().notNull().unique(),
    invitedById: integer().references(() => users.id, { onDelete: 'set null' }),
    expiresAt: timestamp({ withTimezone: true, mode: 'date' }).notNull(),
    acceptedAt: timestamp({ withTimezone: true, mode: 'date' }),
    acceptedById: integer().references(() => users.id, { onDelete: 'set null' }),
    revokedAt: timestamp({ withTimezone: true, mode: 'date' }),
    ...timestamps,
  },
  (t) => [
    index('invitations_restoration_id_idx').on(t.restorationId),
    index('invitations_invited_by_id_idx').on(t.invitedById),
    index('invitations_accepted_by_id_idx').on(t.acceptedById),
  ],
);

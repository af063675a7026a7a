import { index, integer, pgEnum, pgTable, primaryKey } from 'drizzle-orm/pg-core';
import { roles } from '../../../shared/permissions';
import { timestamps } from './columns';
import { restorations } from './restorations';
import { users } from './users';

export const roleEnum = pgEnum('role', roles);

/** A person's role on one restoration; the same account can hold different roles elsewhere. */
export const memberships = pgTable(
  'memberships',
  {
    restorationId: integer()
      .notNull()
      .references(() => restorations.id, { onDelete: 'cascade' }),
    userId: integer()
      .notNull()
      .references(() => users.id, { onDelete: 'cascade' }),
    role: roleEnum().notNull(),
    ...timestamps,
  },
  (t) => [primaryKey({ columns: [t.restorationId, t.userId] }), index('memberships_user_id_idx').on(t.userId)],
);

import { sql } from 'drizzle-orm';
import { boolean, index, integer, pgTable, serial, text, timestamp } from 'drizzle-orm/pg-core';
import { timestamps } from './columns';
import { restorations } from './restorations';
import { users } from './users';

/**
 * A technician's request for help: the symptom in their words and what of the restoration goes with it.
 * The chosen items are ids; what each reader sees of them is decided at read time by the visibility rule.
 */
export const helpRequests = pgTable(
  'help_requests',
  {
    id: serial().primaryKey(),
    restorationId: integer()
      .notNull()
      .references(() => restorations.id, { onDelete: 'cascade' }),
    authorId: integer().references(() => users.id, { onDelete: 'set null' }),
    symptom: text().notNull(),
    includeSet: boolean().notNull().default(true),
    includeValves: boolean().notNull().default(true),
    partIds: integer().array().notNull().default(sql`'{}'::integer[]`),
    measurementIds: integer().array().notNull().default(sql`'{}'::integer[]`),
    photoIds: integer().array().notNull().default(sql`'{}'::integer[]`),
    ...timestamps,
  },
  (t) => [index('help_requests_restoration_id_idx').on(t.restorationId), index('help_requests_author_id_idx').on(t.authorId)],
);

/** A read-only link to a help request for someone without an account; only the SHA-256 of its token is kept. */
export const helpLinks = pgTable(
  'help_links',
  {
    id: serial().primaryKey(),
    helpRequestId: integer()
      .notNull()
      .references(() => helpRequests.id, { onDelete: 'cascade' }),
    tokenHash: text().notNull().unique(),
    expiresAt: timestamp({ withTimezone: true, mode: 'date' }).notNull(),
    revokedAt: timestamp({ withTimezone: true, mode: 'date' }),
    createdById: integer().references(() => users.id, { onDelete: 'set null' }),
    ...timestamps,
  },
  (t) => [index('help_links_help_request_id_idx').on(t.helpRequestId), index('help_links_created_by_id_idx').on(t.createdById)],
);

/** A reply left through a link: held until a technician approves it, then shown in the request's thread. */
export const helpReplies = pgTable(
  'help_replies',
  {
    id: serial().primaryKey(),
    helpRequestId: integer()
      .notNull()
      .references(() => helpRequests.id, { onDelete: 'cascade' }),
    linkId: integer().references(() => helpLinks.id, { onDelete: 'set null' }),
    name: text().notNull(),
    body: text().notNull(),
    approvedAt: timestamp({ withTimezone: true, mode: 'date' }),
    approvedById: integer().references(() => users.id, { onDelete: 'set null' }),
    ...timestamps,
  },
  (t) => [
    index('help_replies_help_request_id_idx').on(t.helpRequestId),
    index('help_replies_link_id_idx').on(t.linkId),
    index('help_replies_approved_by_id_idx').on(t.approvedById),
  ],
);

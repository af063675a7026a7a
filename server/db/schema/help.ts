import { sql } from 'drizzle-orm';
import { boolean, index, integer, pgEnum, pgTable, serial, text, timestamp, uniqueIndex } from 'drizzle-orm/pg-core';
import { timestamps } from './columns';
import { findings } from './findings';
import { measurements } from './measurements';
import { photos } from './photos';
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
    partIds: integer()
      .array()
      .notNull()
      .default(sql`'{}'::integer[]`),
    measurementIds: integer()
      .array()
      .notNull()
      .default(sql`'{}'::integer[]`),
    photoIds: integer()
      .array()
      .notNull()
      .default(sql`'{}'::integer[]`),
    /** Symptoms of the checklist whose causes and results go with the request (ids from shared/bench/symptoms). */
    symptomIds: text()
      .array()
      .notNull()
      .default(sql`'{}'::text[]`),
    ...timestamps,
  },
  (t) => [
    index('help_requests_restoration_id_idx').on(t.restorationId),
    index('help_requests_author_id_idx').on(t.authorId),
  ],
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
  (t) => [
    index('help_links_help_request_id_idx').on(t.helpRequestId),
    index('help_links_created_by_id_idx').on(t.createdById),
  ],
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

/** How a cause on the symptom checklist came out when its test was made. */
export const causeResultEnum = pgEnum('cause_result', ['ruled-out', 'confirmed', 'inconclusive']);

/**
 * One cause of the symptom checklist ticked off on one restoration: the symptom and cause are ids from
 * `shared/bench/symptoms`; the reading that settled it and the finding a confirmed cause opened are linked.
 */
export const symptomChecks = pgTable(
  'symptom_checks',
  {
    id: serial().primaryKey(),
    restorationId: integer()
      .notNull()
      .references(() => restorations.id, { onDelete: 'cascade' }),
    symptomId: text().notNull(),
    causeId: text().notNull(),
    result: causeResultEnum().notNull(),
    note: text().notNull().default(''),
    measurementId: integer().references(() => measurements.id, { onDelete: 'set null' }),
    findingId: integer().references(() => findings.id, { onDelete: 'set null' }),
    checkedById: integer().references(() => users.id, { onDelete: 'set null' }),
    ...timestamps,
  },
  (t) => [
    uniqueIndex('symptom_checks_restoration_id_symptom_id_cause_id_idx').on(t.restorationId, t.symptomId, t.causeId),
    index('symptom_checks_measurement_id_idx').on(t.measurementId),
    index('symptom_checks_finding_id_idx').on(t.findingId),
    index('symptom_checks_checked_by_id_idx').on(t.checkedById),
  ],
);

/** What a mentor asks for: a reading, a photo or a note. */
export const readingRequestKindEnum = pgEnum('reading_request_kind', ['reading', 'photo', 'note']);

/**
 * A mentor's request for something specific ("measure V3 pin 6 with no signal"): a task on the technician's
 * bench until it is answered with a reading, a photo or a note filed on the restoration and linked here.
 */
export const readingRequests = pgTable(
  'reading_requests',
  {
    id: serial().primaryKey(),
    restorationId: integer()
      .notNull()
      .references(() => restorations.id, { onDelete: 'cascade' }),
    helpRequestId: integer().references(() => helpRequests.id, { onDelete: 'set null' }),
    kind: readingRequestKindEnum().notNull(),
    body: text().notNull(),
    askedById: integer().references(() => users.id, { onDelete: 'set null' }),
    answeredAt: timestamp({ withTimezone: true, mode: 'date' }),
    answeredById: integer().references(() => users.id, { onDelete: 'set null' }),
    answerNote: text().notNull().default(''),
    measurementId: integer().references(() => measurements.id, { onDelete: 'set null' }),
    photoId: integer().references(() => photos.id, { onDelete: 'set null' }),
    ...timestamps,
  },
  (t) => [
    index('reading_requests_restoration_id_idx').on(t.restorationId),
    index('reading_requests_help_request_id_idx').on(t.helpRequestId),
    index('reading_requests_asked_by_id_idx').on(t.askedById),
    index('reading_requests_answered_by_id_idx').on(t.answeredById),
    index('reading_requests_measurement_id_idx').on(t.measurementId),
    index('reading_requests_photo_id_idx').on(t.photoId),
  ],
);

import {
  boolean,
  index,
  integer,
  jsonb,
  pgEnum,
  pgTable,
  serial,
  text,
  timestamp,
  uniqueIndex,
  type AnyPgColumn,
} from 'drizzle-orm/pg-core';
import { kinds, severities, shapes, statuses, type NormalisedPoint } from '../../../shared/schemas/findings';
import { timestamps } from './columns';
import { helpRequests, readingRequests } from './help';
import { photos } from './photos';
import { restorations } from './restorations';
import { users } from './users';
import { notificationKinds } from '../../../shared/schemas/notifications';

export const shapeEnum = pgEnum('finding_shape', shapes);
export const kindEnum = pgEnum('finding_kind', kinds);
export const severityEnum = pgEnum('finding_severity', severities);
export const statusEnum = pgEnum('finding_status', statuses);

/** A mark on one photo; points are normalised to the upright image (0..1). */
export const findings = pgTable(
  'findings',
  {
    id: serial().primaryKey(),
    restorationId: integer()
      .notNull()
      .references(() => restorations.id, { onDelete: 'cascade' }),
    photoId: integer()
      .notNull()
      .references(() => photos.id, { onDelete: 'cascade' }),
    /** Shown on the pin; counts up per restoration. */
    number: integer().notNull(),
    shape: shapeEnum().notNull(),
    points: jsonb().$type<NormalisedPoint[]>().notNull(),
    title: text().notNull(),
    componentRef: text().notNull().default(''),
    kind: kindEnum().notNull(),
    severity: severityEnum().notNull(),
    status: statusEnum().notNull().default('observed'),
    dismissReason: text(),
    ownerVisible: boolean().notNull().default(false),
    authorId: integer().references(() => users.id, { onDelete: 'set null' }),
    /** A technician asked the mentors about this finding; open until resolved. */
    questionOpen: boolean().notNull().default(false),
    questionAskedAt: timestamp({ withTimezone: true, mode: 'date' }),
    /** Who asked the open question: it waits for the others, not for them. */
    questionAskedById: integer().references(() => users.id, { onDelete: 'set null' }),
    ...timestamps,
  },
  (t) => [
    index('findings_photo_id_idx').on(t.photoId),
    index('findings_author_id_idx').on(t.authorId),
    index('findings_question_asked_by_id_idx').on(t.questionAskedById),
    uniqueIndex('findings_restoration_id_number_idx').on(t.restorationId, t.number),
  ],
);

/** Every change to a finding, with who and when: `changes` maps a field to [before, after]. */
export const findingChanges = pgTable(
  'finding_changes',
  {
    id: serial().primaryKey(),
    findingId: integer()
      .notNull()
      .references(() => findings.id, { onDelete: 'cascade' }),
    actorId: integer().references(() => users.id, { onDelete: 'set null' }),
    changes: jsonb().$type<Record<string, [unknown, unknown]>>().notNull(),
    createdAt: timestamp({ withTimezone: true, mode: 'date' }).notNull().defaultNow(),
  },
  (t) => [index('finding_changes_finding_id_idx').on(t.findingId), index('finding_changes_actor_id_idx').on(t.actorId)],
);

/** A comment in a finding's thread; internal ones never reach owners. */
export const comments = pgTable(
  'comments',
  {
    id: serial().primaryKey(),
    findingId: integer()
      .notNull()
      .references(() => findings.id, { onDelete: 'cascade' }),
    authorId: integer().references(() => users.id, { onDelete: 'set null' }),
    body: text().notNull(),
    internal: boolean().notNull().default(true),
    /** Members @mentioned in the body (user ids), resolved when written. */
    mentions: integer().array().notNull().default([]),
    editedAt: timestamp({ withTimezone: true, mode: 'date' }),
    deletedAt: timestamp({ withTimezone: true, mode: 'date' }),
    /** The client's Idempotency-Key: a retried post from the same author is stored once. */
    idempotencyKey: text(),
    createdAt: timestamp({ withTimezone: true, mode: 'date' }).notNull().defaultNow(),
  },
  (t) => [
    index('comments_finding_id_idx').on(t.findingId),
    index('comments_author_id_idx').on(t.authorId),
    uniqueIndex('comments_author_id_idempotency_key_idx').on(t.authorId, t.idempotencyKey),
  ],
);

export const notificationKindEnum = pgEnum('notification_kind', notificationKinds);

/** An unread item for one person; e-mails are batched from these rows (several instances share them). */
export const notifications = pgTable(
  'notifications',
  {
    id: serial().primaryKey(),
    userId: integer()
      .notNull()
      .references(() => users.id, { onDelete: 'cascade' }),
    restorationId: integer()
      .notNull()
      .references(() => restorations.id, { onDelete: 'cascade' }),
    /** What the item is about: a finding (and maybe its comment), a help request, or a request for a reading. */
    findingId: integer().references(() => findings.id, { onDelete: 'cascade' }),
    helpRequestId: integer().references((): AnyPgColumn => helpRequests.id, { onDelete: 'cascade' }),
    readingRequestId: integer().references((): AnyPgColumn => readingRequests.id, { onDelete: 'cascade' }),
    commentId: integer().references(() => comments.id, { onDelete: 'cascade' }),
    kind: notificationKindEnum().notNull(),
    /** One line for the list and the e-mail, written for this recipient (no internal text for owners). */
    summary: text().notNull(),
    readAt: timestamp({ withTimezone: true, mode: 'date' }),
    /** Taken for an e-mail by a flush (committed before sending); never taken twice, so never mailed twice. */
    mailClaimedAt: timestamp({ withTimezone: true, mode: 'date' }),
    emailedAt: timestamp({ withTimezone: true, mode: 'date' }),
    createdAt: timestamp({ withTimezone: true, mode: 'date' }).notNull().defaultNow(),
  },
  (t) => [
    index('notifications_user_id_idx').on(t.userId),
    index('notifications_emailed_at_idx').on(t.emailedAt),
    index('notifications_restoration_id_idx').on(t.restorationId),
    index('notifications_finding_id_idx').on(t.findingId),
    index('notifications_comment_id_idx').on(t.commentId),
    index('notifications_help_request_id_idx').on(t.helpRequestId),
    index('notifications_reading_request_id_idx').on(t.readingRequestId),
  ],
);

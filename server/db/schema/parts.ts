import { index, integer, jsonb, pgEnum, pgTable, serial, text, timestamp } from 'drizzle-orm/pg-core';
import { timestamps } from './columns';
import { findings } from './findings';
import { measurements } from './measurements';
import { photos } from './photos';
import { restorations } from './restorations';
import { users } from './users';
import { mismatchNotes, sheetPages } from './sheets';
import { mainsPositions, partActions, partStates } from '../../../shared/schemas/parts';
import { timelineKinds } from '../../../shared/schemas/events';

export const partActionEnum = pgEnum('part_action', partActions);
export const partStateEnum = pgEnum('part_state', partStates);
export const mainsPositionEnum = pgEnum('mains_position', mainsPositions);

/** One line of the parts ledger, keyed by component reference, so each change can be traced later. */
export const parts = pgTable(
  'parts',
  {
    id: serial().primaryKey(),
    restorationId: integer()
      .notNull()
      .references(() => restorations.id, { onDelete: 'cascade' }),
    findingId: integer().references(() => findings.id, { onDelete: 'set null' }),
    componentRef: text().notNull(),
    originalPart: text().notNull().default(''),
    originalRating: text().notNull().default(''),
    replacementPart: text().notNull().default(''),
    replacementRating: text().notNull().default(''),
    action: partActionEnum().notNull(),
    state: partStateEnum().notNull().default('planned'),
    mainsPosition: mainsPositionEnum().notNull().default('none'),
    quantity: integer().notNull().default(1),
    /** Price of the whole line in minor units (pence, cents), to avoid floating-point money. */
    costMinor: integer(),
    source: text().notNull().default(''),
    /** What was measured or heard after fitting: "HT 252 V, hum gone". */
    testedAfter: text().notNull().default(''),
    notes: text().notNull().default(''),
    fittedAt: timestamp({ withTimezone: true, mode: 'date' }),
    ...timestamps,
  },
  (t) => [index('parts_restoration_id_idx').on(t.restorationId), index('parts_finding_id_idx').on(t.findingId)],
);

export const eventKindEnum = pgEnum('event_kind', timelineKinds);

/**
 * The history a restoration's timeline is drawn from. Events point at their subject; whether an owner
 * may see one is decided when it is read, from the subject's current sharing.
 */
export const events = pgTable(
  'events',
  {
    id: serial().primaryKey(),
    restorationId: integer()
      .notNull()
      .references(() => restorations.id, { onDelete: 'cascade' }),
    kind: eventKindEnum().notNull(),
    actorId: integer().references(() => users.id, { onDelete: 'set null' }),
    photoId: integer().references(() => photos.id, { onDelete: 'cascade' }),
    findingId: integer().references(() => findings.id, { onDelete: 'cascade' }),
    partId: integer().references(() => parts.id, { onDelete: 'cascade' }),
    measurementId: integer().references(() => measurements.id, { onDelete: 'cascade' }),
    sheetPageId: integer().references(() => sheetPages.id, { onDelete: 'cascade' }),
    mismatchNoteId: integer().references(() => mismatchNotes.id, { onDelete: 'cascade' }),
    /** Kind-specific facts, e.g. { from, to } for a status or stage change. */
    data: jsonb().$type<Record<string, unknown>>().notNull().default({}),
    createdAt: timestamp({ withTimezone: true, mode: 'date' }).notNull().defaultNow(),
  },
  (t) => [
    index('events_restoration_id_created_at_idx').on(t.restorationId, t.createdAt),
    index('events_actor_id_idx').on(t.actorId),
    index('events_photo_id_idx').on(t.photoId),
    index('events_finding_id_idx').on(t.findingId),
    index('events_part_id_idx').on(t.partId),
    index('events_measurement_id_idx').on(t.measurementId),
    index('events_sheet_page_id_idx').on(t.sheetPageId),
    index('events_mismatch_note_id_idx').on(t.mismatchNoteId),
  ],
);

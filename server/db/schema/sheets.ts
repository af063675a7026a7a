import { sql } from 'drizzle-orm';
import { boolean, check, index, integer, jsonb, pgEnum, pgTable, serial, text, timestamp } from 'drizzle-orm/pg-core';
import type { NormalisedPoint } from '../../../shared/schemas/findings';
import { mismatchKinds, referenceShapes, sheetKinds } from '../../../shared/schemas/sheets';
import { timestamps } from './columns';
import { photos } from './photos';
import { restorations } from './restorations';
import { users } from './users';

export const sheetKindEnum = pgEnum('sheet_kind', sheetKinds);
export const referenceShapeEnum = pgEnum('reference_shape', referenceShapes);
export const mismatchKindEnum = pgEnum('mismatch_kind', mismatchKinds);

/** One uploaded service sheet file; its original lives under `sheets/<storageKey>/original`. */
export const sheets = pgTable(
  'sheets',
  {
    id: serial().primaryKey(),
    restorationId: integer()
      .notNull()
      .references(() => restorations.id, { onDelete: 'cascade' }),
    /** `<restorationId>/<uuid>`: object keys are built from ids, never from the uploaded file name. */
    storageKey: text().notNull().unique(),
    contentType: text().notNull(),
    sizeBytes: integer().notNull(),
    uploadedById: integer().references(() => users.id, { onDelete: 'set null' }),
    createdAt: timestamp({ withTimezone: true, mode: 'date' }).notNull().defaultNow(),
  },
  (t) => [
    index('sheets_restoration_id_idx').on(t.restorationId),
    index('sheets_uploaded_by_id_idx').on(t.uploadedById),
  ],
);

/** One page of a service sheet, stored as images under `sheets/<storageKey>/p<pageNumber>/…`. */
export const sheetPages = pgTable(
  'sheet_pages',
  {
    id: serial().primaryKey(),
    sheetId: integer()
      .notNull()
      .references(() => sheets.id, { onDelete: 'cascade' }),
    restorationId: integer()
      .notNull()
      .references(() => restorations.id, { onDelete: 'cascade' }),
    pageNumber: integer().notNull(),
    kind: sheetKindEnum().notNull(),
    title: text().notNull().default(''),
    /** Service sheets are workshop material: shared with the owner only when chosen. */
    ownerVisible: boolean().notNull().default(false),
    width: integer().notNull(),
    height: integer().notNull(),
    ...timestamps,
  },
  (t) => [index('sheet_pages_sheet_id_idx').on(t.sheetId), index('sheet_pages_restoration_id_idx').on(t.restorationId)],
);

/** A component reference placed on a diagram page or on a chassis photo, in normalised image coordinates. */
export const referenceMarks = pgTable(
  'reference_marks',
  {
    id: serial().primaryKey(),
    restorationId: integer()
      .notNull()
      .references(() => restorations.id, { onDelete: 'cascade' }),
    sheetPageId: integer().references(() => sheetPages.id, { onDelete: 'cascade' }),
    photoId: integer().references(() => photos.id, { onDelete: 'cascade' }),
    ref: text().notNull(),
    shape: referenceShapeEnum().notNull(),
    points: jsonb().$type<NormalisedPoint[]>().notNull(),
    createdById: integer().references(() => users.id, { onDelete: 'set null' }),
    ...timestamps,
  },
  (t) => [
    index('reference_marks_restoration_id_ref_idx').on(t.restorationId, t.ref),
    index('reference_marks_sheet_page_id_idx').on(t.sheetPageId),
    index('reference_marks_photo_id_idx').on(t.photoId),
    index('reference_marks_created_by_id_idx').on(t.createdById),
    check('reference_marks_one_target', sql`(${t.sheetPageId} is null) <> (${t.photoId} is null)`),
  ],
);

/**
 * A part on the chassis that differs from the diagram (another value fitted at the factory, a part the diagram
 * does not list, a misprint), recorded against the reference in one restoration.
 */
export const mismatchNotes = pgTable(
  'mismatch_notes',
  {
    id: serial().primaryKey(),
    restorationId: integer()
      .notNull()
      .references(() => restorations.id, { onDelete: 'cascade' }),
    ref: text().notNull(),
    kind: mismatchKindEnum().notNull(),
    /** What the diagram or parts list prints, e.g. "47k". */
    diagramSays: text().notNull().default(''),
    /** What is fitted on the chassis, e.g. "39k, original solder joints". */
    chassisHas: text().notNull().default(''),
    note: text().notNull().default(''),
    /** Workshop material unless shared with the owner. */
    ownerVisible: boolean().notNull().default(false),
    createdById: integer().references(() => users.id, { onDelete: 'set null' }),
    ...timestamps,
  },
  (t) => [
    index('mismatch_notes_restoration_id_ref_idx').on(t.restorationId, t.ref),
    index('mismatch_notes_created_by_id_idx').on(t.createdById),
  ],
);

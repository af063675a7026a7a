import { boolean, index, integer, pgEnum, pgTable, serial, text, timestamp } from 'drizzle-orm/pg-core';
import { phases, views } from '../../../shared/schemas/photos';
import { timestamps } from './columns';
import { restorations } from './restorations';
import { users } from './users';

export const viewEnum = pgEnum('photo_view', views);
export const phaseEnum = pgEnum('photo_phase', phases);

/** A chassis photo; its bytes live in object storage under `photos/<storageKey>/…`. */
export const photos = pgTable(
  'photos',
  {
    id: serial().primaryKey(),
    restorationId: integer()
      .notNull()
      .references(() => restorations.id, { onDelete: 'cascade' }),
    /** `<restorationId>/<uuid>`: object keys are built from ids, never from the uploaded file name. */
    storageKey: text().notNull().unique(),
    view: viewEnum().notNull(),
    phase: phaseEnum().notNull(),
    caption: text().notNull().default(''),
    ownerVisible: boolean().notNull().default(false),
    /** Pixel size of the upright image. */
    width: integer().notNull(),
    height: integer().notNull(),
    /** Capture time from the camera's EXIF, kept here because the served variants carry no metadata. */
    takenAt: timestamp({ withTimezone: true, mode: 'date' }),
    /** Of the untouched original, decided from its content. */
    contentType: text().notNull(),
    sizeBytes: integer().notNull(),
    /**
     * Bumped by database triggers on every write that changes the photo's findings list (its findings,
     * their comments, its sharing, an author's name): the list's cache key and ETag.
     */
    findingsVersion: integer().notNull().default(0),
    uploadedById: integer().references(() => users.id, { onDelete: 'set null' }),
    ...timestamps,
  },
  (t) => [
    index('photos_restoration_id_idx').on(t.restorationId),
    index('photos_uploaded_by_id_idx').on(t.uploadedById),
  ],
);

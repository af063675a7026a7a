import {
  boolean,
  doublePrecision,
  index,
  integer,
  pgEnum,
  pgTable,
  primaryKey,
  serial,
  text,
  timestamp,
  uniqueIndex,
} from 'drizzle-orm/pg-core';
import {
  decisions,
  intakeItems,
  lampBehaviours,
  prePowerItems,
  prePowerStatuses,
  supplies,
} from '../../../shared/schemas/bringup';
import { timestamps } from './columns';
import { findings } from './findings';
import { measurements } from './measurements';
import { photos } from './photos';
import { restorations } from './restorations';
import { users } from './users';

export const intakeItemEnum = pgEnum('intake_item', intakeItems);
export const prePowerItemEnum = pgEnum('pre_power_item', prePowerItems);
export const prePowerStatusEnum = pgEnum('pre_power_status', prePowerStatuses);
export const supplyEnum = pgEnum('bringup_supply', supplies);
export const lampBehaviourEnum = pgEnum('lamp_behaviour', lampBehaviours);
export const decisionEnum = pgEnum('bringup_decision', decisions);

/** One line of the intake checklist; a row exists once someone has touched the item. */
export const intakeChecks = pgTable(
  'intake_checks',
  {
    id: serial().primaryKey(),
    restorationId: integer()
      .notNull()
      .references(() => restorations.id, { onDelete: 'cascade' }),
    item: intakeItemEnum().notNull(),
    done: boolean().notNull().default(false),
    note: text().notNull().default(''),
    findingId: integer().references(() => findings.id, { onDelete: 'set null' }),
    /** The photo that shows this item (one of the restoration's own). */
    photoId: integer().references(() => photos.id, { onDelete: 'set null' }),
    checkedById: integer().references(() => users.id, { onDelete: 'set null' }),
    ...timestamps,
  },
  (t) => [
    uniqueIndex('intake_checks_restoration_id_item_idx').on(t.restorationId, t.item),
    index('intake_checks_finding_id_idx').on(t.findingId),
    index('intake_checks_photo_id_idx').on(t.photoId),
    index('intake_checks_checked_by_id_idx').on(t.checkedById),
  ],
);

/** One line of the pre-power checklist: done, not applicable (why) or waived (why). */
export const prePowerChecks = pgTable(
  'pre_power_checks',
  {
    id: serial().primaryKey(),
    restorationId: integer()
      .notNull()
      .references(() => restorations.id, { onDelete: 'cascade' }),
    item: prePowerItemEnum().notNull(),
    status: prePowerStatusEnum(),
    reason: text().notNull().default(''),
    checkedById: integer().references(() => users.id, { onDelete: 'set null' }),
    ...timestamps,
  },
  (t) => [
    uniqueIndex('pre_power_checks_restoration_id_item_idx').on(t.restorationId, t.item),
    index('pre_power_checks_checked_by_id_idx').on(t.checkedById),
  ],
);

/** A technician's sign-off of the whole pre-power checklist; changing any item afterwards removes it. */
export const prePowerSignoffs = pgTable(
  'pre_power_signoffs',
  {
    id: serial().primaryKey(),
    restorationId: integer()
      .notNull()
      .references(() => restorations.id, { onDelete: 'cascade' }),
    signedById: integer().references(() => users.id, { onDelete: 'set null' }),
    signedAt: timestamp({ withTimezone: true, mode: 'date' }).notNull().defaultNow(),
    ...timestamps,
  },
  (t) => [
    uniqueIndex('pre_power_signoffs_restoration_id_idx').on(t.restorationId),
    index('pre_power_signoffs_signed_by_id_idx').on(t.signedById),
  ],
);

/** One step of the staged first power-up, numbered in the order taken. */
export const bringupSteps = pgTable(
  'bringup_steps',
  {
    id: serial().primaryKey(),
    restorationId: integer()
      .notNull()
      .references(() => restorations.id, { onDelete: 'cascade' }),
    number: integer().notNull(),
    supply: supplyEnum().notNull(),
    /** Series lamp rating, W and V. */
    lampWatts: doublePrecision(),
    lampVolts: doublePrecision(),
    /** Volts applied to the set: the mains, or the variable transformer's output. */
    appliedVolts: doublePrecision(),
    lampBehaviour: lampBehaviourEnum().notNull(),
    notes: text().notNull().default(''),
    decision: decisionEnum().notNull(),
    findingId: integer().references(() => findings.id, { onDelete: 'set null' }),
    takenById: integer().references(() => users.id, { onDelete: 'set null' }),
    takenAt: timestamp({ withTimezone: true, mode: 'date' }).notNull().defaultNow(),
    ...timestamps,
  },
  (t) => [
    uniqueIndex('bringup_steps_restoration_id_number_idx').on(t.restorationId, t.number),
    index('bringup_steps_finding_id_idx').on(t.findingId),
    index('bringup_steps_taken_by_id_idx').on(t.takenById),
  ],
);

/** The ordinary readings (measurements) taken at a step. */
export const bringupStepReadings = pgTable(
  'bringup_step_readings',
  {
    stepId: integer()
      .notNull()
      .references(() => bringupSteps.id, { onDelete: 'cascade' }),
    measurementId: integer()
      .notNull()
      .references(() => measurements.id, { onDelete: 'cascade' }),
  },
  (t) => [
    primaryKey({ columns: [t.stepId, t.measurementId] }),
    index('bringup_step_readings_measurement_id_idx').on(t.measurementId),
  ],
);

import {
  boolean,
  doublePrecision,
  index,
  integer,
  pgEnum,
  pgTable,
  serial,
  text,
  timestamp,
  uniqueIndex,
} from 'drizzle-orm/pg-core';
import { measuredQuantities } from '../../../shared/bench/reading-kinds';
import { timestamps } from './columns';
import { findings } from './findings';
import { restorations } from './restorations';
import { users } from './users';
import { verdicts } from '../../../shared/schemas/measurements';

export const quantityEnum = pgEnum('measured_quantity', measuredQuantities);
export const verdictEnum = pgEnum('verdict', verdicts);

/**
 * One bench reading. The typed texts are kept as written ("4k7", "250 V"); the SI values, the verdict
 * and its reason are computed by the bench library from them, and recomputed when they change.
 */
export const measurements = pgTable(
  'measurements',
  {
    id: serial().primaryKey(),
    restorationId: integer()
      .notNull()
      .references(() => restorations.id, { onDelete: 'cascade' }),
    findingId: integer().references(() => findings.id, { onDelete: 'set null' }),
    /** Component reference or test point as the manual names it: "C27", "V5 pin 3", "TP3". */
    location: text().notNull(),
    quantity: quantityEnum().notNull(),
    expectedText: text().notNull().default(''),
    toleranceText: text().notNull().default(''),
    ratingText: text().notNull().default(''),
    readingText: text().notNull(),
    /** Mains voltage, signal, control settings. */
    conditions: text().notNull().default(''),
    /** Meter and its ohms-per-volt, ESR test frequency, time at voltage for leakage. */
    method: text().notNull().default(''),
    /** Voltages only, as typed: the meter the service chart was taken with, the meter used, and the point's source resistance. */
    chartMeterText: text().notNull().default(''),
    meterText: text().notNull().default(''),
    sourceText: text().notNull().default(''),
    /** SI values parsed from the texts (ohms, farads, volts, amperes, hertz). */
    expected: doublePrecision(),
    reading: doublePrecision().notNull(),
    rating: doublePrecision(),
    reference: doublePrecision(),
    deviation: doublePrecision(),
    verdict: verdictEnum().notNull(),
    verdictReason: text().notNull(),
    ownerVisible: boolean().notNull().default(false),
    /** Taken with the set powered from the mains: allowed only after the pre-power checklist is signed off. */
    powerOn: boolean().notNull().default(false),
    measuredById: integer().references(() => users.id, { onDelete: 'set null' }),
    measuredAt: timestamp({ withTimezone: true, mode: 'date' }).notNull().defaultNow(),
    ...timestamps,
  },
  (t) => [
    index('measurements_restoration_id_idx').on(t.restorationId),
    index('measurements_finding_id_idx').on(t.findingId),
    index('measurements_measured_by_id_idx').on(t.measuredById),
  ],
);

/** The valve line-up by position (V1…Vn), as fitted. */
export const valves = pgTable(
  'valves',
  {
    id: serial().primaryKey(),
    restorationId: integer()
      .notNull()
      .references(() => restorations.id, { onDelete: 'cascade' }),
    position: text().notNull(),
    type: text().notNull(),
    notes: text().notNull().default(''),
    ...timestamps,
  },
  (t) => [uniqueIndex('valves_restoration_id_position_idx').on(t.restorationId, t.position)],
);

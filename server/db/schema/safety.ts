import { sql } from 'drizzle-orm';
import {
  doublePrecision,
  index,
  integer,
  jsonb,
  pgEnum,
  pgTable,
  serial,
  text,
  timestamp,
  uniqueIndex,
} from 'drizzle-orm/pg-core';
import { equipmentClasses, type SafetyLine } from '../../../shared/bench/safety-test';
import { safetyVerdicts, specifications } from '../../../shared/schemas/safety';
import { findings } from './findings';
import { restorations } from './restorations';
import { users } from './users';

export const equipmentClassEnum = pgEnum('equipment_class', equipmentClasses);
export const specificationEnum = pgEnum('specification', specifications);
export const safetyVerdictEnum = pgEnum('safety_verdict', safetyVerdicts);

/**
 * One final safety test as recorded. The typed readings are kept as written; the lines (value, limit, source,
 * verdict) are judged by the bench library when recorded and kept as judged then, so a later change of rule
 * never turns an old fail into a pass.
 */
export const safetyTests = pgTable(
  'safety_tests',
  {
    id: serial().primaryKey(),
    restorationId: integer()
      .notNull()
      .references(() => restorations.id, { onDelete: 'cascade' }),
    equipmentClass: equipmentClassEnum().notNull(),
    /** The request's reading texts as typed ("0.08", "50M"). */
    readings: jsonb().$type<Record<string, string | boolean>>().notNull(),
    lines: jsonb().$type<SafetyLine[]>().notNull(),
    verdict: safetyVerdictEnum().notNull(),
    specification: specificationEnum().notNull(),
    modifications: text().notNull().default(''),
    notes: text().notNull().default(''),
    testedById: integer().references(() => users.id, { onDelete: 'set null' }),
    testedAt: timestamp({ withTimezone: true, mode: 'date' }).notNull().defaultNow(),
  },
  (t) => [
    index('safety_tests_restoration_id_tested_at_idx').on(t.restorationId, t.testedAt),
    index('safety_tests_tested_by_id_idx').on(t.testedById),
  ],
);

/** A technician returning a set without a passing safety test, and why; shown in red in the history and report. */
export const safetyOverrides = pgTable(
  'safety_overrides',
  {
    id: serial().primaryKey(),
    restorationId: integer()
      .notNull()
      .references(() => restorations.id, { onDelete: 'cascade' }),
    reason: text().notNull(),
    actorId: integer().references(() => users.id, { onDelete: 'set null' }),
    createdAt: timestamp({ withTimezone: true, mode: 'date' }).notNull().defaultNow(),
  },
  (t) => [
    index('safety_overrides_restoration_id_idx').on(t.restorationId),
    index('safety_overrides_actor_id_idx').on(t.actorId),
  ],
);

/** One soak run: open while `endedAt` is null (at most one per restoration). */
export const soakSessions = pgTable(
  'soak_sessions',
  {
    id: serial().primaryKey(),
    restorationId: integer()
      .notNull()
      .references(() => restorations.id, { onDelete: 'cascade' }),
    startedAt: timestamp({ withTimezone: true, mode: 'date' }).notNull().defaultNow(),
    endedAt: timestamp({ withTimezone: true, mode: 'date' }),
    ambientC: doublePrecision(),
    chassisC: doublePrecision(),
    mainsCurrentText: text().notNull().default(''),
    /** Amperes. */
    mainsCurrentAmps: doublePrecision(),
    faults: text().notNull().default(''),
    actionTaken: text().notNull().default(''),
    findingId: integer().references(() => findings.id, { onDelete: 'set null' }),
    startedById: integer().references(() => users.id, { onDelete: 'set null' }),
  },
  (t) => [
    index('soak_sessions_restoration_id_idx').on(t.restorationId),
    index('soak_sessions_finding_id_idx').on(t.findingId),
    index('soak_sessions_started_by_id_idx').on(t.startedById),
    uniqueIndex('soak_sessions_restoration_id_running_idx')
      .on(t.restorationId)
      .where(sql`${t.endedAt} is null`),
  ],
);

/** Each hand-back report e-mailed: who sent which PDF to whom, and the warnings shown when they did. */
export const reportSends = pgTable(
  'report_sends',
  {
    id: serial().primaryKey(),
    restorationId: integer()
      .notNull()
      .references(() => restorations.id, { onDelete: 'cascade' }),
    sentById: integer().references(() => users.id, { onDelete: 'set null' }),
    recipients: text().array().notNull(),
    attachmentName: text().notNull(),
    pageCount: integer().notNull(),
    sha256: text().notNull(),
    warnings: jsonb().$type<string[]>().notNull().default([]),
    /** The restoration's stage when it was sent. */
    stage: text().notNull(),
    sentAt: timestamp({ withTimezone: true, mode: 'date' }).notNull().defaultNow(),
  },
  (t) => [
    index('report_sends_restoration_id_idx').on(t.restorationId),
    index('report_sends_sent_by_id_idx').on(t.sentById),
  ],
);

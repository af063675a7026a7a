import { sql } from 'drizzle-orm';
import {
  boolean,
  check,
  index,
  integer,
  pgEnum,
  pgTable,
  serial,
  text,
  timestamp,
  uniqueIndex,
} from 'drizzle-orm/pg-core';
import { estimateDecisions, estimateExtras, estimateLineKinds } from '../../../shared/schemas/estimates';
import { taxRoundings } from '../../../shared/money/tax';
import { invoiceKinds } from '../../../shared/schemas/invoices';
import { timestamps } from './columns';
import { findings } from './findings';
import { restorations, stageEnum } from './restorations';
import { users } from './users';

export const taxRoundingEnum = pgEnum('tax_rounding', taxRoundings);
export const estimateLineKindEnum = pgEnum('estimate_line_kind', estimateLineKinds);
export const estimateExtraEnum = pgEnum('estimate_extra', estimateExtras);
export const estimateDecisionEnum = pgEnum('estimate_decision', estimateDecisions);
export const invoiceKindEnum = pgEnum('invoice_kind', invoiceKinds);

/**
 * The workshop's money settings: one row (id 1). Every amount is in minor units of `currency` (ISO 4217);
 * no tax when `taxRateBasisPoints` is null.
 */
export const workshopSettings = pgTable(
  'workshop_settings',
  {
    id: integer().primaryKey().default(1),
    currency: text().notNull().default('GBP'),
    /** Labour per hour, minor units. */
    labourRate: integer().notNull().default(4500),
    /** Added to a part's cost on an invoice, basis points (25% = 2500). */
    partsMarkupBasisPoints: integer().notNull().default(2000),
    taxName: text().notNull().default('VAT'),
    taxRateBasisPoints: integer(),
    taxRounding: taxRoundingEnum().notNull().default('invoice-down'),
    /** A set moves past Assessment only once its owner has approved the latest estimate. */
    estimateApprovalRequired: boolean().notNull().default(false),
    /** Printed before the invoice number ("CL-" gives CL-42); copied onto each invoice when issued. */
    invoicePrefix: text().notNull().default(''),
    /** IANA zone for dates on documents e-mailed from the workshop (a download uses the reader's zone). */
    timeZone: text().notNull().default('Europe/London'),
    ...timestamps,
  },
  (t) => [check('workshop_settings_single_row', sql`${t.id} = 1`)],
);

/**
 * One version of a restoration's estimate. The prices in force when it was written are copied onto it, so a
 * later change of rate or tax never rewrites what the owner was quoted. Versions are never edited once sent.
 */
export const estimates = pgTable(
  'estimates',
  {
    id: serial().primaryKey(),
    restorationId: integer()
      .notNull()
      .references(() => restorations.id, { onDelete: 'cascade' }),
    version: integer().notNull(),
    note: text().notNull().default(''),
    currency: text().notNull(),
    labourRate: integer().notNull(),
    partsMarkupBasisPoints: integer().notNull(),
    taxName: text().notNull(),
    taxRateBasisPoints: integer(),
    taxRounding: taxRoundingEnum().notNull(),
    /** The range quoted, tax included, minor units. */
    lowAmount: integer().notNull(),
    highAmount: integer().notNull(),
    /** Shown to the owner (and e-mailed) once sent. */
    sent: boolean().notNull().default(false),
    sentAt: timestamp({ withTimezone: true, mode: 'date' }),
    createdById: integer().references(() => users.id, { onDelete: 'set null' }),
    decision: estimateDecisionEnum(),
    /** The name the owner gave when deciding, as they typed it, and who was signed in. */
    decidedByName: text(),
    decidedById: integer().references(() => users.id, { onDelete: 'set null' }),
    decidedAt: timestamp({ withTimezone: true, mode: 'date' }),
    ...timestamps,
  },
  (t) => [
    uniqueIndex('estimates_restoration_id_version_idx').on(t.restorationId, t.version),
    index('estimates_created_by_id_idx').on(t.createdById),
    index('estimates_decided_by_id_idx').on(t.decidedById),
  ],
);

/** A line of an estimate: labour hours as a range, a part expected, or a flagged extra; each low and high. */
export const estimateLines = pgTable(
  'estimate_lines',
  {
    id: serial().primaryKey(),
    estimateId: integer()
      .notNull()
      .references(() => estimates.id, { onDelete: 'cascade' }),
    position: integer().notNull(),
    kind: estimateLineKindEnum().notNull(),
    description: text().notNull(),
    extra: estimateExtraEnum(),
    /** Labour lines: minutes, low and high. */
    minutesLow: integer(),
    minutesHigh: integer(),
    /** Part lines: expected cost before markup; extra lines: the amount; minor units. */
    amountLow: integer(),
    amountHigh: integer(),
  },
  (t) => [index('estimate_lines_estimate_id_idx').on(t.estimateId)],
);

/**
 * A technician's time on a set: typed hours (`minutes` set, no timer) or a timer whose start is stored on the
 * server, so it survives a reload and shows the same on every device; stopping it writes the minutes.
 * Tied to a finding or a stage.
 */
export const labourEntries = pgTable(
  'labour_entries',
  {
    id: serial().primaryKey(),
    restorationId: integer()
      .notNull()
      .references(() => restorations.id, { onDelete: 'cascade' }),
    technicianId: integer().references(() => users.id, { onDelete: 'set null' }),
    findingId: integer().references(() => findings.id, { onDelete: 'set null' }),
    stage: stageEnum(),
    note: text().notNull().default(''),
    billable: boolean().notNull().default(true),
    /** When the work was done (a typed entry) or the timer started. */
    startedAt: timestamp({ withTimezone: true, mode: 'date' }).notNull().defaultNow(),
    /** Null while the timer runs. */
    stoppedAt: timestamp({ withTimezone: true, mode: 'date' }),
    minutes: integer(),
    ...timestamps,
  },
  (t) => [
    index('labour_entries_restoration_id_idx').on(t.restorationId),
    index('labour_entries_technician_id_started_at_idx').on(t.technicianId, t.startedAt),
    index('labour_entries_finding_id_idx').on(t.findingId),
    // One running timer per technician.
    uniqueIndex('labour_entries_running_idx')
      .on(t.technicianId)
      .where(sql`${t.stoppedAt} is null`),
  ],
);

/** The last invoice number issued; taken with UPDATE … RETURNING inside the issuing transaction, so numbers have no gaps. */
export const invoiceCounters = pgTable(
  'invoice_counters',
  { id: integer().primaryKey().default(1), last: integer().notNull().default(0) },
  (t) => [check('invoice_counters_single_row', sql`${t.id} = 1`)],
);

/**
 * A deposit request, a final invoice or a credit note, issued with the next number and never edited after;
 * a void is a credit note for the same lines, negated. Amounts in minor units of `currency`, tax included.
 */
export const invoices = pgTable(
  'invoices',
  {
    id: serial().primaryKey(),
    // Issued documents are kept: a restoration with invoices cannot be deleted (the service says why first).
    restorationId: integer()
      .notNull()
      .references(() => restorations.id, { onDelete: 'restrict' }),
    number: integer().notNull(),
    /** The workshop's prefix in force when it was issued. */
    numberPrefix: text().notNull().default(''),
    kind: invoiceKindEnum().notNull(),
    currency: text().notNull(),
    taxName: text().notNull(),
    taxRateBasisPoints: integer(),
    taxRounding: taxRoundingEnum().notNull(),
    net: integer().notNull(),
    tax: integer().notNull(),
    gross: integer().notNull(),
    /** Deposits paid, deducted on a final invoice. */
    deducted: integer().notNull().default(0),
    due: integer().notNull(),
    /** Received less refunded; `refunded` is what went back (both from succeeded payment lines, kept by settling). */
    paid: integer().notNull().default(0),
    refunded: integer().notNull().default(0),
    /** The invoice a credit note corrects. */
    creditsInvoiceId: integer(),
    voidedAt: timestamp({ withTimezone: true, mode: 'date' }),
    voidReason: text(),
    issuedById: integer().references(() => users.id, { onDelete: 'set null' }),
    issuedAt: timestamp({ withTimezone: true, mode: 'date' }).notNull().defaultNow(),
    ...timestamps,
  },
  (t) => [
    uniqueIndex('invoices_number_idx').on(t.number),
    index('invoices_restoration_id_idx').on(t.restorationId),
    index('invoices_issued_by_id_idx').on(t.issuedById),
  ],
);

export const invoiceLines = pgTable(
  'invoice_lines',
  {
    id: serial().primaryKey(),
    invoiceId: integer()
      .notNull()
      .references(() => invoices.id, { onDelete: 'cascade' }),
    position: integer().notNull(),
    description: text().notNull(),
    net: integer().notNull(),
    tax: integer().notNull(),
  },
  (t) => [index('invoice_lines_invoice_id_idx').on(t.invoiceId)],
);

import {
  check,
  date,
  index,
  integer,
  pgEnum,
  pgTable,
  serial,
  text,
  timestamp,
  uniqueIndex,
  type AnyPgColumn,
} from 'drizzle-orm/pg-core';
import { sql } from 'drizzle-orm';
import { paymentKinds, paymentMethods, paymentStatuses } from '../../../shared/schemas/payments';
import { timestamps } from './columns';
import { invoices } from './money';
import { restorations } from './restorations';
import { users } from './users';

export const paymentKindEnum = pgEnum('payment_kind', paymentKinds);
export const paymentMethodEnum = pgEnum('payment_method', paymentMethods);
export const paymentStatusEnum = pgEnum('payment_status', paymentStatuses);

/**
 * Money received against a deposit request or invoice, and refunds of it (`kind` refund, `refundOfId` set).
 * Card payments and their refunds are written only from the payment service's verified events and carry its ids;
 * transfers and cash are recorded by a technician. `amount` is positive, in minor units of `currency` (ISO 4217).
 */
export const payments = pgTable(
  'payments',
  {
    id: serial().primaryKey(),
    invoiceId: integer()
      .notNull()
      .references(() => invoices.id, { onDelete: 'cascade' }),
    restorationId: integer()
      .notNull()
      .references(() => restorations.id, { onDelete: 'cascade' }),
    kind: paymentKindEnum().notNull(),
    method: paymentMethodEnum().notNull(),
    status: paymentStatusEnum().notNull(),
    amount: integer().notNull(),
    currency: text().notNull(),
    /** The payment service's ids: the checkout session and payment intent of a card payment, or a refund's id. */
    checkoutSessionId: text(),
    paymentIntentId: text(),
    refundId: text(),
    refundOfId: integer().references((): AnyPgColumn => payments.id, { onDelete: 'cascade' }),
    /** Transfers and cash: the day the money arrived, as the technician typed it. */
    receivedOn: date({ mode: 'string' }),
    recordedById: integer().references(() => users.id, { onDelete: 'set null' }),
    /** A card payment that arrived when nothing (or less) was due, e.g. on an invoice voided meanwhile: what to give back. */
    refundDue: integer().notNull().default(0),
    /** When it succeeded (or failed): the service's event time for card payments. */
    settledAt: timestamp({ withTimezone: true, mode: 'date' }),
    ...timestamps,
  },
  (t) => [
    uniqueIndex('payments_checkout_session_id_idx').on(t.checkoutSessionId),
    uniqueIndex('payments_refund_id_idx').on(t.refundId),
    index('payments_payment_intent_id_idx').on(t.paymentIntentId),
    index('payments_invoice_id_idx').on(t.invoiceId),
    index('payments_restoration_id_idx').on(t.restorationId),
    index('payments_refund_of_id_idx').on(t.refundOfId),
    index('payments_recorded_by_id_idx').on(t.recordedById),
    check('payments_amount_positive', sql`${t.amount} > 0`),
  ],
);

/**
 * Every verified event from the payment service, by its id: an event already here is answered and changes nothing,
 * so a replay or a redelivery is harmless. Written in the same transaction as the change it caused.
 */
export const paymentEvents = pgTable(
  'payment_events',
  {
    id: text().primaryKey(),
    type: text().notNull(),
    paymentId: integer().references(() => payments.id, { onDelete: 'set null' }),
    receivedAt: timestamp({ withTimezone: true, mode: 'date' }).notNull().defaultNow(),
  },
  (t) => [index('payment_events_payment_id_idx').on(t.paymentId)],
);

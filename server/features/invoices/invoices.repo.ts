import { and, asc, desc, eq, inArray, isNotNull, isNull, ne, sql } from 'drizzle-orm';
import type { Executor } from '../../db/client';
import {
  estimates,
  invoiceCounters,
  invoiceLines,
  invoices,
  labourEntries,
  memberships,
  parts,
  restorations,
  users,
} from '../../db/schema';

export type InvoiceRow = typeof invoices.$inferSelect;
export type InvoiceLineRow = typeof invoiceLines.$inferSelect;

/** Invoices, their lines and the gap-free counter, and what an invoice is drawn from; on the pool or the action's transaction. */
export function invoicesRepo(db: Executor) {
  return {
    /** The set's invoices, highest number first. */
    async list(restorationId: number) {
      return db.select().from(invoices).where(eq(invoices.restorationId, restorationId)).orderBy(desc(invoices.number));
    },
    /** The lines of these invoices, in their order. */
    async linesOf(invoiceIds: number[]) {
      return db
        .select()
        .from(invoiceLines)
        .where(inArray(invoiceLines.invoiceId, invoiceIds))
        .orderBy(asc(invoiceLines.position));
    },
    async restorationOf(invoiceId: number) {
      const [row] = await db
        .select({ restorationId: invoices.restorationId })
        .from(invoices)
        .where(eq(invoices.id, invoiceId));
      return row?.restorationId;
    },
    async latestApprovedEstimate(restorationId: number) {
      const [row] = await db
        .select()
        .from(estimates)
        .where(and(eq(estimates.restorationId, restorationId), eq(estimates.decision, 'approved')))
        .orderBy(desc(estimates.version))
        .limit(1);
      return row;
    },
    /** The set's final invoice that is not void, if one is issued. */
    async liveFinal(restorationId: number) {
      const [row] = await db
        .select({ number: invoices.number, numberPrefix: invoices.numberPrefix })
        .from(invoices)
        .where(and(eq(invoices.restorationId, restorationId), eq(invoices.kind, 'final'), isNull(invoices.voidedAt)));
      return row;
    },
    /** An invoice or deposit request (not a credit note), read for update. */
    async lockVoidable(invoiceId: number) {
      const [row] = await db
        .select()
        .from(invoices)
        .where(and(eq(invoices.id, invoiceId), ne(invoices.kind, 'credit-note')))
        .for('update');
      return row;
    },
    async markVoid(invoiceId: number, reason: string) {
      await db.update(invoices).set({ voidedAt: new Date(), voidReason: reason }).where(eq(invoices.id, invoiceId));
    },
    /**
     * The next invoice number, gap-free: the counter row is updated inside the issuing transaction, so it stays
     * locked until the invoice commits, and a rollback gives the number back. A second issue at the same moment
     * waits on the row lock and, under READ COMMITTED, increments the value the first one committed.
     */
    async nextNumber(): Promise<number> {
      await db.insert(invoiceCounters).values({ id: 1, last: 0 }).onConflictDoNothing();
      const [row] = await db
        .update(invoiceCounters)
        .set({ last: sql`${invoiceCounters.last} + 1` })
        .where(eq(invoiceCounters.id, 1))
        .returning();
      return row!.last;
    },
    async insert(values: typeof invoices.$inferInsert): Promise<InvoiceRow> {
      const [row] = await db.insert(invoices).values(values).returning();
      return row!;
    },
    async insertLines(values: (typeof invoiceLines.$inferInsert)[]) {
      await db.insert(invoiceLines).values(values);
    },

    /** Minutes of every billable, finished labour entry on the set. */
    async billableMinutes(restorationId: number) {
      return db
        .select({ minutes: labourEntries.minutes })
        .from(labourEntries)
        .where(
          and(
            eq(labourEntries.restorationId, restorationId),
            eq(labourEntries.billable, true),
            isNotNull(labourEntries.minutes),
          ),
        );
    },
    /** Parts fitted to the set with their cost, in the order they were entered. */
    async fittedParts(restorationId: number) {
      return db
        .select()
        .from(parts)
        .where(and(eq(parts.restorationId, restorationId), eq(parts.state, 'fitted'), isNotNull(parts.costMinor)))
        .orderBy(parts.id);
    },
    /** What was paid on each deposit request of the set that is not void. */
    async depositsPaid(restorationId: number) {
      return db
        .select({ paid: invoices.paid })
        .from(invoices)
        .where(and(eq(invoices.restorationId, restorationId), eq(invoices.kind, 'deposit'), isNull(invoices.voidedAt)));
    },

    /** An invoice with the name of who issued it. */
    async withIssuer(invoiceId: number) {
      const [row] = await db
        .select({ i: invoices, by: users.name })
        .from(invoices)
        .leftJoin(users, eq(users.id, invoices.issuedById))
        .where(eq(invoices.id, invoiceId));
      return row;
    },
    /** An invoice's printed lines, in their order. */
    async printedLines(invoiceId: number) {
      return db
        .select({ description: invoiceLines.description, net: invoiceLines.net, tax: invoiceLines.tax })
        .from(invoiceLines)
        .where(eq(invoiceLines.invoiceId, invoiceId))
        .orderBy(asc(invoiceLines.position));
    },
    async set(restorationId: number) {
      const [row] = await db
        .select({ make: restorations.make, model: restorations.model, serial: restorations.serial })
        .from(restorations)
        .where(eq(restorations.id, restorationId));
      return row;
    },
    /** The set's owners by name, who receive its invoices. */
    async owners(restorationId: number) {
      return db
        .select({ name: users.name, email: users.email })
        .from(memberships)
        .innerJoin(users, eq(users.id, memberships.userId))
        .where(and(eq(memberships.restorationId, restorationId), eq(memberships.role, 'owner')))
        .orderBy(users.name);
    },
    /** The number parts of an invoice, to print its reference. */
    async numberOf(invoiceId: number) {
      const [row] = await db
        .select({ numberPrefix: invoices.numberPrefix, number: invoices.number })
        .from(invoices)
        .where(eq(invoices.id, invoiceId));
      return row;
    },
  };
}

import { and, asc, eq } from 'drizzle-orm';
import type { Executor } from '../../db/client';
import { invoiceLines, invoices, memberships, restorations, users } from '../../db/schema';

export type InvoiceRow = typeof invoices.$inferSelect;

/** Everything an invoice or receipt PDF prints, read in one place for the download and the e-mail. */
export interface InvoiceDocument {
  invoice: InvoiceRow;
  reference: string;
  lines: { description: string; net: number; tax: number }[];
  set: { make: string; model: string; serial: string | null };
  owners: { name: string; email: string }[];
  issuedBy: string | null;
  /** The reference of the invoice a credit note corrects. */
  credits: string | null;
}

export const referenceOf = (i: Pick<InvoiceRow, 'numberPrefix' | 'number'>) => `${i.numberPrefix}${i.number}`;

export async function invoiceDocument(db: Executor, invoiceId: number): Promise<InvoiceDocument | null> {
  const [row] = await db
    .select({ i: invoices, by: users.name })
    .from(invoices)
    .leftJoin(users, eq(users.id, invoices.issuedById))
    .where(eq(invoices.id, invoiceId));
  if (!row) return null;
  const { i, by } = row;
  const lines = await db
    .select({ description: invoiceLines.description, net: invoiceLines.net, tax: invoiceLines.tax })
    .from(invoiceLines)
    .where(eq(invoiceLines.invoiceId, i.id))
    .orderBy(asc(invoiceLines.position));
  const [set] = await db
    .select({ make: restorations.make, model: restorations.model, serial: restorations.serial })
    .from(restorations)
    .where(eq(restorations.id, i.restorationId));
  const owners = await db
    .select({ name: users.name, email: users.email })
    .from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .where(and(eq(memberships.restorationId, i.restorationId), eq(memberships.role, 'owner')))
    .orderBy(users.name);
  const [credited] = i.creditsInvoiceId
    ? await db
        .select({ numberPrefix: invoices.numberPrefix, number: invoices.number })
        .from(invoices)
        .where(eq(invoices.id, i.creditsInvoiceId))
    : [];
  return {
    invoice: i,
    reference: referenceOf(i),
    lines,
    set: set!,
    owners,
    issuedBy: by,
    credits: credited ? referenceOf(credited) : null,
  };
}

import type { Executor } from '../../db/client';
import { invoicesRepo, type InvoiceRow } from './invoices.repo';

export type { InvoiceRow };

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
  const repo = invoicesRepo(db);
  const row = await repo.withIssuer(invoiceId);
  if (!row) return null;
  const { i, by } = row;
  const lines = await repo.printedLines(i.id);
  const set = await repo.set(i.restorationId);
  const owners = await repo.owners(i.restorationId);
  const credited = i.creditsInvoiceId ? await repo.numberOf(i.creditsInvoiceId) : undefined;
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

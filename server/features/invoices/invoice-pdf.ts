import { amountLeft } from '../../../shared/money/invoice-status';
import { taxRoundingLabels } from '../../../shared/money/tax';
import { invoiceKindLabels } from '../../../shared/schemas/invoices';
import { createWriter } from '../report/pdf-writer';
import { documentDate, documentMoney } from '../workshop/document-format';
import type { InvoiceDocument } from './invoice-document';

const SOFT = '#5d5247';
const DANGER = '#a4161a';

export type DocumentKind = 'invoice' | 'receipt';

export function documentTitle(d: InvoiceDocument, kind: DocumentKind): string {
  return kind === 'receipt' ? `Receipt for ${d.reference}` : `${invoiceKindLabels[d.invoice.kind]} ${d.reference}`;
}

/**
 * An invoice, deposit request or credit note as issued (its stored lines and totals, never recomputed), or a
 * receipt for what has been paid against it. Amounts in the document's own currency; dates in `timeZone`.
 */
export async function renderInvoice(d: InvoiceDocument, kind: DocumentKind, timeZone: string): Promise<Buffer> {
  const i = d.invoice;
  const m = (amount: number) => documentMoney(amount, i.currency);
  const w = createWriter(documentTitle(d, kind));
  const { doc } = w;
  w.text(documentTitle(d, kind), { bold: true, size: 22, gap: 0.2 });
  w.text(
    `Issued ${documentDate(i.issuedAt, timeZone)}${d.issuedBy ? ` by ${d.issuedBy}` : ''} · dates in ${timeZone}`,
    { colour: SOFT },
  );
  if (d.credits) w.text(`Corrects invoice ${d.credits}: it reverses that invoice's lines exactly.`);
  if (i.voidedAt)
    w.text(`VOID since ${documentDate(i.voidedAt, timeZone)}: ${i.voidReason ?? ''}`, { bold: true, colour: DANGER });
  w.label('For');
  w.text(
    `${d.owners.map((o) => o.name).join(', ') || 'The owner'} · ${d.set.make} ${d.set.model}${d.set.serial ? `, serial ${d.set.serial}` : ''}`,
  );

  if (kind === 'invoice') {
    w.heading('Lines');
    const amountX = doc.page.margins.left + w.width - 120;
    const row = (left: string, right: string, bold = false) => {
      w.ensureSpace(30);
      const y = doc.y;
      doc
        .font(bold ? 'bold' : 'body')
        .fontSize(11)
        .fillColor('#221c15');
      doc.text(left, doc.page.margins.left, y, { width: w.width - 130 });
      const after = doc.y;
      doc.text(right, amountX, y, { width: 120, align: 'right' });
      doc.x = doc.page.margins.left;
      doc.y = Math.max(after, doc.y) + 4;
    };
    for (const l of d.lines) row(l.tax ? `${l.description} (${i.taxName} ${m(l.tax)})` : l.description, m(l.net));
    doc.moveDown(0.4);
    row('Net', m(i.net));
    if (i.taxRateBasisPoints !== null) row(`${i.taxName} at ${i.taxRateBasisPoints / 100}%`, m(i.tax));
    row('Total', m(i.gross), true);
    if (i.deducted)
      row(i.kind === 'credit-note' ? 'Deposits deducted, reversed' : 'Less deposits paid', m(-i.deducted));
    row(i.kind === 'credit-note' ? 'Credited' : 'Amount due', m(i.due), true);
    doc.moveDown(0.4);
    w.text(
      i.taxRateBasisPoints === null
        ? 'No tax is charged.'
        : `${i.taxName}: ${taxRoundingLabels[i.taxRounding].toLowerCase()}.`,
      {
        colour: SOFT,
        size: 9,
      },
    );
  } else {
    w.heading('Received');
    w.text(`${m(i.paid)} received against ${d.reference} (total ${m(i.due)}).`, { size: 13 });
    if (i.refunded) w.text(`${m(i.refunded)} refunded.`, { size: 13 });
    const left = amountLeft({
      kind: i.kind,
      voided: i.voidedAt !== null,
      due: i.due,
      paid: i.paid,
      refunded: i.refunded,
    });
    w.text(
      left > 0 ? `Still to pay: ${m(left)}.` : i.paid > 0 ? 'Paid in full. Thank you.' : 'Nothing is left to pay.',
      { bold: true },
    );
    w.text(`Receipt printed ${documentDate(new Date(), timeZone)}.`, { colour: SOFT, size: 9 });
  }
  w.text(`Amounts in ${i.currency}.`, { colour: SOFT, size: 9 });
  w.footer(`${documentTitle(d, kind)} · ${d.set.make} ${d.set.model}`);
  return w.finish();
}

import { useId, useState } from 'react';
import { invoiceKindLabels, type Invoice } from '../../../../shared/schemas/invoices';
import { Button, buttonClass } from '../../../components/button';
import { inputClass } from '../../../components/field';
import { documentUrl, useVoidInvoice } from '../api/invoices';
import { InvoiceTotals } from './invoice-totals';
import { moneyText } from './money-text';
import { formatLongDate } from '../../../lib/format';

const statusText: Record<Invoice['status'], string> = {
  open: 'Open',
  paid: 'Paid',
  refunded: 'Refunded',
  void: 'Void',
  credit: 'Credit note',
};
const day = (iso: string) => formatLongDate(iso);

/** One issued document as it was issued: never edited; a technician may void it, which issues a credit note. */
export function InvoiceCard({
  restorationId,
  invoice: i,
  all,
  canEdit,
}: {
  restorationId: number;
  invoice: Invoice;
  all: Invoice[];
  canEdit: boolean;
}) {
  const [voiding, setVoiding] = useState(false);
  const [reason, setReason] = useState('');
  const voidIt = useVoidInvoice(restorationId);
  const headingId = useId();
  const reasonId = useId();
  const title = `${invoiceKindLabels[i.kind]} ${i.reference}`;
  const credited = i.creditsInvoiceId ? all.find((x) => x.id === i.creditsInvoiceId) : undefined;
  return (
    <section
      aria-labelledby={headingId}
      className={`space-y-3 rounded-xl border p-4 ${i.status === 'void' ? 'border-rule bg-sunken' : 'border-rule bg-panel'}`}
    >
      <header className="flex flex-wrap items-baseline gap-3">
        <h3 id={headingId} className="text-lg font-bold">
          {title}
        </h3>
        <p className="text-sm text-ink-soft">Issued {day(i.issuedAt)}</p>
        <p
          className={`rounded px-2 text-sm font-semibold ${i.status === 'void' ? 'bg-danger text-white' : 'bg-sunken'}`}
        >
          {statusText[i.status]}
        </p>
      </header>
      {credited && (
        <p>
          Corrects {invoiceKindLabels[credited.kind].toLowerCase()} {credited.reference}.
        </p>
      )}
      {i.status === 'void' && <p className="font-semibold text-danger">Void: {i.voidReason}</p>}
      <InvoiceTotals
        priced={i}
        caption={`Lines of ${title}`}
        dueLabel={i.kind === 'credit-note' ? 'Credited' : 'Amount due'}
      />
      {i.paid.amount > 0 && (
        <p>
          Paid so far: <span className="font-mono">{moneyText(i.paid)}</span>
        </p>
      )}
      {i.refunded.amount > 0 && (
        <p>
          Refunded: <span className="font-mono">{moneyText(i.refunded)}</span>
          {i.status === 'refunded' && ' — everything received went back; nothing is left to pay.'}
        </p>
      )}
      <div className="flex flex-wrap gap-2">
        <a className={buttonClass('quiet')} href={documentUrl(i.id, 'invoice')} download>
          PDF of {i.reference}
        </a>
        {(i.paid.amount > 0 || i.refunded.amount > 0) && (
          <a className={buttonClass('quiet')} href={documentUrl(i.id, 'receipt')} download>
            Receipt for {i.reference}
          </a>
        )}
        {canEdit && i.kind !== 'credit-note' && i.status !== 'void' && i.paid.amount === 0 && !voiding && (
          <Button variant="quiet" onClick={() => setVoiding(true)}>
            Void {i.reference}…
          </Button>
        )}
      </div>
      {voiding && (
        <form
          className="space-y-2 rounded-lg bg-sunken p-3"
          aria-label={`Void ${i.reference}`}
          onSubmit={(e) => {
            e.preventDefault();
            if (reason.trim())
              voidIt.mutate({ invoiceId: i.id, reason: reason.trim() }, { onSuccess: () => setVoiding(false) });
          }}
        >
          <p>
            Voiding keeps {i.reference} as issued, marks it void and issues a credit note that reverses it exactly; the
            owner is e-mailed the credit note.
          </p>
          <label htmlFor={reasonId} className="block font-semibold">
            Why is it void?
          </label>
          <input
            id={reasonId}
            className={inputClass}
            value={reason}
            maxLength={500}
            required
            onChange={(e) => setReason(e.target.value)}
          />
          <div className="flex flex-wrap gap-2">
            <Button type="submit" variant="danger" disabled={voidIt.isPending || !reason.trim()}>
              {voidIt.isPending ? 'Voiding…' : `Void and issue a credit note`}
            </Button>
            <Button variant="quiet" onClick={() => setVoiding(false)}>
              Keep it
            </Button>
          </div>
          {voidIt.isError && (
            <p role="alert" className="font-semibold text-danger">
              {voidIt.error.message}
            </p>
          )}
        </form>
      )}
    </section>
  );
}

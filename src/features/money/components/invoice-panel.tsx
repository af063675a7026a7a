import { useState } from 'react';
import { Button } from '../../../components/button';
import { EmptyState, ErrorState, Loading } from '../../../components/states';
import { useInvoices } from '../api/invoices';
import { DepositForm } from './deposit-form';
import { FinalInvoiceBuilder } from './final-invoice-builder';
import { InvoiceCard } from './invoice-card';

/** Deposits, invoices and credit notes: technicians request, build, issue and void; the owner reads and downloads them. */
export function InvoicePanel({
  restorationId,
  canEdit,
  currency,
}: {
  restorationId: number;
  canEdit: boolean;
  currency: string | undefined;
}) {
  const query = useInvoices(restorationId);
  const [open, setOpen] = useState<'deposit' | 'final' | null>(null);
  return (
    <section aria-labelledby="invoices-heading" className="space-y-3">
      <div className="flex flex-wrap items-center justify-between gap-3">
        <h2 id="invoices-heading" className="text-xl font-bold">
          Deposits and invoices
        </h2>
        {canEdit && !open && (
          <div className="flex flex-wrap gap-2">
            <Button variant="quiet" onClick={() => setOpen('deposit')} disabled={!currency}>
              Request a deposit
            </Button>
            <Button onClick={() => setOpen('final')}>Build the final invoice</Button>
          </div>
        )}
      </div>
      {open === 'deposit' && currency && (
        <DepositForm restorationId={restorationId} currency={currency} onDone={() => setOpen(null)} />
      )}
      {open === 'final' && <FinalInvoiceBuilder restorationId={restorationId} onDone={() => setOpen(null)} />}
      {query.isPending ? (
        <Loading label="Fetching the invoices…" />
      ) : query.isError ? (
        <ErrorState error={query.error} onRetry={() => query.refetch()} />
      ) : query.data.length === 0 ? (
        <EmptyState title="No invoices yet">
          {canEdit
            ? 'Request a deposit once the estimate is approved; build the final invoice at hand-back.'
            : 'The workshop has not issued a deposit request or an invoice yet.'}
        </EmptyState>
      ) : (
        query.data.map((i) => (
          <InvoiceCard key={i.id} restorationId={restorationId} invoice={i} all={query.data} canEdit={canEdit} />
        ))
      )}
    </section>
  );
}

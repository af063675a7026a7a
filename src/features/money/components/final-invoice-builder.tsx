import { Button } from '../../../components/button';
import { useConfirm } from '../../../components/use-confirm';
import { ErrorState, Loading } from '../../../components/states';
import { useInvoicePreview, useIssueInvoice } from '../api/invoices';
import { InvoiceTotals } from './invoice-totals';
import { moneyText } from './money-text';

/**
 * The final invoice before it is issued: billable labour and fitted parts at the workshop's prices, less deposits
 * paid. Issuing numbers it, e-mails it to the owner and freezes it.
 */
export function FinalInvoiceBuilder({ restorationId, onDone }: { restorationId: number; onDone: () => void }) {
  const preview = useInvoicePreview(restorationId, true);
  const issue = useIssueInvoice(restorationId);
  const { confirm, dialog } = useConfirm();
  if (preview.isPending) return <Loading label="Pricing the labour log and the parts…" />;
  if (preview.isError) return <ErrorState error={preview.error} onRetry={() => preview.refetch()} />;
  const p = preview.data;
  const issueIt = async () => {
    if (
      await confirm({
        title: 'Issue the final invoice?',
        confirmLabel: 'Issue and e-mail it',
        consequence: `It takes the next invoice number, is e-mailed to the owner for ${moneyText(p.due)}, and cannot be edited afterwards: a mistake is corrected by voiding it with a credit note.`,
      })
    )
      issue.mutate(undefined, { onSuccess: onDone });
  };
  return (
    <section aria-labelledby="final-preview-heading" className="space-y-3 rounded-xl border border-glow bg-panel p-4">
      <h3 id="final-preview-heading" className="text-lg font-bold">
        Final invoice, not yet issued
      </h3>
      {p.lines.length === 0 ? (
        <p>Nothing to invoice yet: log billable time, or mark parts fitted with their cost on the Parts tab.</p>
      ) : (
        <InvoiceTotals priced={p} caption="Lines of the final invoice before it is issued" />
      )}
      {issue.isError && (
        <p role="alert" className="font-semibold text-danger">
          {issue.error.message}
        </p>
      )}
      <div className="flex flex-wrap gap-2">
        <Button onClick={issueIt} disabled={issue.isPending || p.lines.length === 0}>
          {issue.isPending ? 'Issuing…' : 'Issue the final invoice'}
        </Button>
        <Button variant="quiet" onClick={onDone}>
          Close
        </Button>
      </div>
      {dialog}
    </section>
  );
}

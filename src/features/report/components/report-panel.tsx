import { can, type Role } from '../../../../shared/permissions';
import { Button, buttonClass } from '../../../components/button';
import { reportPdfHref } from '../api/get-report-pdf';
import { useSendReport } from '../api/send-report';

export interface ReportPanelProps {
  restorationId: number;
  role: Role;
}

/**
 * The hand-back report: a download for every member and, for technicians, sending it to the owner. The report is
 * the owner's document, so it holds only what is shared with them, whoever downloads it.
 */
export function ReportPanel({ restorationId, role }: ReportPanelProps) {
  const send = useSendReport(restorationId);
  return (
    <section aria-labelledby="report-heading" className="space-y-3 rounded-xl border border-rule bg-panel p-4">
      <h2 id="report-heading" className="text-lg font-bold">Hand-back report</h2>
      <p className="text-sm text-ink-soft">
        Written for the owner, it holds only what is shared with them: the set and its story, shared before-and-after photos,
        shared findings and close-ups of what was repaired, the parts fitted and the originals kept, shared readings and final
        safety checks, then care and safety notes. Internal comments, costs, sources, notes and unshared photos stay out. It
        records the work; it is not a certificate of electrical safety.
      </p>
      <div className="flex flex-wrap items-center gap-2">
        {can(role, 'report.download') && (
          <a href={reportPdfHref(restorationId)} download className={buttonClass('quiet')}>
            Download the hand-back report (PDF)
          </a>
        )}
        {can(role, 'report.send') && (
          <Button onClick={() => send.mutate()} disabled={send.isPending}>
            {send.isPending ? 'Sending…' : 'E-mail it to the owner'}
          </Button>
        )}
      </div>
      {send.isSuccess && (
        <p role="status" className="text-sm">
          <span aria-hidden="true" className="text-ok">✓ </span>
          Sent to {send.data.sentTo.join(', ')}.
        </p>
      )}
      {send.isError && (
        <p role="alert" className="rounded-lg bg-danger-soft px-3 py-2 text-sm font-semibold text-danger">
          Not sent: {send.error.message}
        </p>
      )}
    </section>
  );
}

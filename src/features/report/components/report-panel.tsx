import { useState } from 'react';
import { can, type Role } from '../../../../shared/permissions';
import { Button, buttonClass } from '../../../components/button';
import { ErrorState, Loading } from '../../../components/states';
import { reportPdfHref } from '../api/get-report-pdf';
import { useReportPreview } from '../api/get-report-preview';
import { useSendReport } from '../api/send-report';
import { ReportPreview } from './report-preview';
import { FormAlert } from '../../../components/form-alert';

export interface ReportPanelProps {
  restorationId: number;
  role: Role;
}

/**
 * The hand-back report: a download for every member and, for technicians, a preview of the e-mail the owner will
 * receive (with warnings when it is premature) before sending. The report is the owner's document, so it holds only
 * what is shared with them, whoever downloads it.
 */
export function ReportPanel({ restorationId, role }: ReportPanelProps) {
  const [previewing, setPreviewing] = useState(false);
  const preview = useReportPreview(restorationId, previewing);
  const send = useSendReport(restorationId);
  const warned = (preview.data?.warnings.length ?? 0) > 0;
  return (
    <section aria-labelledby="report-heading" className="space-y-3 rounded-xl border border-rule bg-panel p-4">
      <h2 id="report-heading" className="text-lg font-bold">
        Hand-back report
      </h2>
      <p className="text-sm text-ink-soft">
        Written for the owner, it holds only what is shared with them: the set and its story, shared before-and-after
        photos, shared findings and close-ups of what was repaired, the parts fitted and the originals kept, shared
        readings, the final safety test with its limits, the soak hours, then care and safety notes. Internal comments,
        costs, sources, notes and unshared photos stay out. It records the work; it is not a certificate of electrical
        safety.
      </p>
      <div className="flex flex-wrap items-center gap-2">
        {can(role, 'report.download') && (
          <a href={reportPdfHref(restorationId)} download className={buttonClass('quiet')}>
            Download the hand-back report (PDF)
          </a>
        )}
        {can(role, 'report.send') && !previewing && (
          <Button
            onClick={() => {
              send.reset();
              setPreviewing(true);
            }}
          >
            E-mail it to the owner
          </Button>
        )}
      </div>
      {previewing && (
        <div className="space-y-3 rounded-xl border border-rule p-3">
          <h3 className="font-bold">What the owner will receive</h3>
          {preview.isPending && <Loading label="Preparing the preview…" />}
          {preview.isError && <ErrorState error={preview.error} onRetry={() => preview.refetch()} />}
          {preview.data && <ReportPreview preview={preview.data} />}
          {!send.isSuccess && (
            <div className="flex flex-wrap gap-2">
              <Button
                variant={warned ? 'danger' : 'primary'}
                onClick={() => send.mutate()}
                disabled={send.isPending || !preview.data}
              >
                {send.isPending ? 'Sending…' : warned ? 'Send anyway' : 'Send to the owner'}
              </Button>
              <Button variant="quiet" onClick={() => setPreviewing(false)} disabled={send.isPending}>
                Cancel
              </Button>
            </div>
          )}
        </div>
      )}
      {send.isSuccess && (
        <p role="status" className="text-sm">
          <span aria-hidden="true" className="text-ok">
            ✓{' '}
          </span>
          Sent to {send.data.sentTo.join(', ')}.
        </p>
      )}
      {send.isError && <FormAlert small message={`Not sent: ${send.error.message}`} />}
    </section>
  );
}

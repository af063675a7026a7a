import type { ReportPreview as Preview } from '../../../../shared/schemas/safety';
import { formatDateTime as when } from '../../../lib/format';
import { Caution, CautionLead } from '../../../components/caution';

/** The e-mail as the owner will receive it, with the warnings first when sending now would be premature. */
export function ReportPreview({ preview }: { preview: Preview }) {
  return (
    <div className="space-y-3" data-testid="report-preview">
      {preview.warnings.length > 0 && (
        <Caution className="text-sm">
          <p>
            <CautionLead>Sending now may be premature:</CautionLead>
          </p>
          <ul className="list-disc pl-5">
            {preview.warnings.map((w) => (
              <li key={w.code}>{w.message}</li>
            ))}
          </ul>
        </Caution>
      )}
      <dl className="grid grid-cols-[auto_1fr] gap-x-3 gap-y-1 text-sm">
        <dt className="font-semibold">To</dt>
        <dd>
          {preview.recipients.length
            ? preview.recipients.map((r) => `${r.name} <${r.email}>`).join(', ')
            : 'Nobody yet'}
        </dd>
        <dt className="font-semibold">Subject</dt>
        <dd>{preview.subject}</dd>
        <dt className="font-semibold">Attached</dt>
        <dd>
          {preview.attachmentName} ({preview.pageCount} page{preview.pageCount === 1 ? '' : 's'})
        </dd>
      </dl>
      <pre className="rounded-lg border border-rule bg-sunken p-3 font-sans text-sm whitespace-pre-wrap">
        {preview.body}
      </pre>
      {preview.sends.length > 0 && (
        <div className="text-sm">
          <p className="font-semibold">Sent before</p>
          <ul className="list-disc pl-5">
            {preview.sends.map((s) => (
              <li key={s.id}>
                <time dateTime={s.sentAt}>{when(s.sentAt)}</time> by {s.sentBy ?? 'a former member'} to{' '}
                {s.recipients.join(', ')} ({s.pageCount} pages
                {s.warnings.length ? `, ${s.warnings.length} warning${s.warnings.length === 1 ? '' : 's'} shown` : ''})
              </li>
            ))}
          </ul>
        </div>
      )}
    </div>
  );
}

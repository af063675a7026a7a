import type { ReadingRequest } from '../../../../shared/schemas/reading-requests';
import { readingRequestKindLabels } from '../../../../shared/schemas/reading-requests';
import { VerdictBadge } from '../../../components/verdict-badge';
import { formatDateTime } from '../../../lib/format';

const when = (iso: string) => formatDateTime(iso);

/** One request for a reading and, once given, its answer. */
export function ReadingRequestItem({ request: r }: { request: ReadingRequest }) {
  return (
    <div className="space-y-1">
      <p>
        <span className="text-sm text-ink-soft">
          {readingRequestKindLabels[r.kind]} asked by {r.askedBy ?? 'a former member'}, {when(r.createdAt)}
        </span>
        <span className="block font-semibold">{r.body}</span>
      </p>
      {r.answeredAt ? (
        <div
          className="rounded-lg border border-ok px-3 py-2 text-sm"
          role="status"
          aria-label={`Answer to: ${r.body}`}
        >
          <p className="font-semibold">
            Answered by {r.answeredBy ?? 'a former member'}, {when(r.answeredAt)}
          </p>
          {r.reading && (
            <p>
              {r.reading.location}: <span className="font-mono">{r.reading.reading}</span>
              {r.reading.expected && ` (expected ${r.reading.expected})`}{' '}
              <VerdictBadge verdict={r.reading.verdict} reason={r.reading.verdictReason} />
            </p>
          )}
          {r.photo && (
            <img
              src={r.photo.thumbUrl}
              alt={r.photo.caption || 'The photo sent as the answer'}
              className="mt-1 max-h-40 rounded border border-rule"
            />
          )}
          {r.answerNote && <p className="whitespace-pre-wrap">{r.answerNote}</p>}
        </div>
      ) : (
        <p className="text-sm font-semibold text-glow-strong">Waiting for the technician</p>
      )}
    </div>
  );
}

import { useState } from 'react';
import { ErrorState, Loading } from '../../../components/states';
import { useHistory } from '../api/get-history';
import { describeChange, fullTime, relativeTime } from './finding-format';

function HistoryList({ findingId }: { findingId: number }) {
  const history = useHistory(findingId);
  if (history.isPending) return <Loading label="Fetching the history…" />;
  if (history.isError) return <ErrorState error={history.error} onRetry={() => history.refetch()} />;
  if (!history.data.length) return <p className="py-2 text-sm text-ink-soft">No changes since it was placed.</p>;
  return (
    <ol className="divide-y divide-rule text-sm">
      {history.data.map((h) => (
        <li key={h.id} className="py-2">
          <p className="text-ink-soft">
            {h.actorName ?? 'A former member'} ·{' '}
            <time dateTime={h.createdAt} title={fullTime(h.createdAt)}>
              {relativeTime(h.createdAt)}
            </time>
          </p>
          <ul>
            {Object.entries(h.changes).map(([field, change]) => (
              <li key={field}>{describeChange(field, change)}</li>
            ))}
          </ul>
        </li>
      ))}
    </ol>
  );
}

/** Every change to the finding, newest first; fetched only once the disclosure is opened. */
export function FindingHistory({ findingId }: { findingId: number }) {
  const [open, setOpen] = useState(false);
  return (
    <details onToggle={(e) => setOpen(e.currentTarget.open)} className="rounded-lg border border-rule bg-panel px-3">
      <summary className="flex min-h-11 cursor-pointer items-center font-semibold">History</summary>
      {open && <HistoryList findingId={findingId} />}
    </details>
  );
}

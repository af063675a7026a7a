import { Link } from 'react-router';
import { findingPath } from '../../../../shared/schemas/findings';
import { useActivity } from '../api/get-activity';
import { EventGlyph } from './event-glyph';
import { formatDayAndTime } from '../../../lib/format';

/** The bench's "what happened lately" across every set the person works on. Quiet when there is nothing. */
export function RecentActivity() {
  const activity = useActivity();
  if (!activity.data?.length) return null;
  return (
    <section aria-labelledby="recent-activity" className="space-y-2">
      <h2 id="recent-activity" className="text-lg font-bold">
        Recent activity
      </h2>
      <ul className="divide-y divide-rule rounded-xl border border-rule bg-panel">
        {activity.data.slice(0, 8).map((e) => (
          <li key={`${e.restorationId}-${e.id}`}>
            <Link
              to={
                e.findingId && e.photoId
                  ? findingPath({ restorationId: e.restorationId, photoId: e.photoId, id: e.findingId })
                  : `/restorations/${e.restorationId}/history`
              }
              className="flex min-h-11 items-center gap-3 px-4 py-2 hover:bg-sunken"
            >
              <EventGlyph kind={e.kind} className="h-5 w-5 shrink-0 text-ink-soft" />
              <span className="min-w-0 flex-1">
                <span className="block truncate">{e.summary}</span>
                <span className="block text-sm text-ink-soft">
                  {e.set} · {formatDayAndTime(e.at)}
                  {e.actorName ? ` · ${e.actorName}` : ''}
                </span>
              </span>
            </Link>
          </li>
        ))}
      </ul>
    </section>
  );
}

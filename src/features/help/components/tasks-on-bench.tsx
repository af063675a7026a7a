import { useId } from 'react';
import { Link } from 'react-router';
import { useBenchReadingRequests } from '../api/reading-requests';

/** For the bench: readings asked for on sets you work on (a task until answered), and recent answers. Nothing when none. */
export function TasksOnBench() {
  const headingId = useId();
  const list = useBenchReadingRequests();
  if (!list.data?.length) return null;
  return (
    <section aria-labelledby={headingId} className="space-y-2">
      <h2 id={headingId} className="text-lg font-bold">
        Readings asked for
      </h2>
      <ul className="divide-y divide-rule rounded-xl border border-rule bg-panel">
        {list.data.map((r) => (
          <li key={r.id}>
            <Link
              to={`/restorations/${r.restorationId}/help`}
              className="flex flex-wrap items-baseline gap-x-3 gap-y-1 px-4 py-3 hover:bg-sunken"
            >
              <span className="text-sm text-ink-soft">{r.set}</span>
              <span className="min-w-0 flex-1 font-semibold">{r.body}</span>
              <span className={`text-sm ${r.answeredAt ? 'text-ink-soft' : 'font-semibold text-glow-strong'}`}>
                {r.answeredAt ? 'Answered' : r.mine ? 'Waiting' : 'To do'}
              </span>
            </Link>
          </li>
        ))}
      </ul>
    </section>
  );
}

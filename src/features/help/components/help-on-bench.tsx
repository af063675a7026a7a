import { useId } from 'react';
import { Link } from 'react-router';
import { useBenchHelpRequests } from '../api/get-bench-help-requests';
import { formatMediumDate } from '../../../lib/format';

/** For the bench: restorers asking for help on sets you work on. Nothing at all when there are none. */
export function HelpOnBench() {
  const headingId = useId();
  const list = useBenchHelpRequests();
  if (!list.data?.length) return null;
  return (
    <section aria-labelledby={headingId} className="space-y-2">
      <h2 id={headingId} className="text-lg font-bold">
        Asking for help
      </h2>
      <ul className="divide-y divide-rule rounded-xl border border-rule bg-panel">
        {list.data.map((h) => (
          <li key={h.id}>
            <Link
              to={`/restorations/${h.restorationId}/help`}
              className="flex flex-wrap items-baseline gap-x-3 gap-y-1 px-4 py-3 hover:bg-sunken"
            >
              <span className="text-sm text-ink-soft">{h.set}</span>
              <span className="min-w-0 flex-1 font-semibold">
                {h.symptom.length > 90 ? `${h.symptom.slice(0, 90)}…` : h.symptom}
              </span>
              <time className="text-sm text-ink-soft" dateTime={h.createdAt}>
                {formatMediumDate(h.createdAt)}
              </time>
            </Link>
          </li>
        ))}
      </ul>
    </section>
  );
}

import { useId } from 'react';
import { Link } from 'react-router';
import { findingPath } from '../../../../shared/schemas/findings';
import { useQuestions } from '../api/get-questions';
import { fullTime, relativeTime } from './finding-format';

/** For the bench: the questions technicians have asked that are still open. Nothing at all when there are none. */
export function OpenQuestions() {
  const headingId = useId();
  const questions = useQuestions();
  if (!questions.data?.length) return null;
  return (
    <section aria-labelledby={headingId} className="space-y-2">
      <h2 id={headingId} className="text-lg font-bold">
        Questions waiting for you
      </h2>
      <ul className="divide-y divide-rule rounded-xl border border-rule bg-panel">
        {questions.data.map((q) => (
          <li key={q.findingId}>
            <Link
              to={findingPath({ restorationId: q.restorationId, photoId: q.photoId, id: q.findingId })}
              className="flex flex-wrap items-baseline gap-x-3 gap-y-1 px-4 py-3 hover:bg-sunken"
            >
              <span className="text-sm text-ink-soft">{q.set}</span>
              <span className="font-mono font-bold">#{q.number}</span>
              {q.componentRef && <span className="font-mono font-semibold">{q.componentRef}</span>}
              <span className="min-w-0 flex-1 font-semibold">{q.title}</span>
              <span className="text-sm text-ink-soft">
                asked{' '}
                <time dateTime={q.askedAt} title={fullTime(q.askedAt)}>
                  {relativeTime(q.askedAt)}
                </time>
              </span>
            </Link>
          </li>
        ))}
      </ul>
    </section>
  );
}

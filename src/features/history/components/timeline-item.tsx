import { useState } from 'react';
import { Link } from 'react-router';
import { findingPath } from '../../../../shared/schemas/findings';
import type { TimelineEvent } from '../../../../shared/schemas/events';
import { findingKinds } from '../lib/event-kinds';
import { timeOfDay } from '../lib/group-by-day';
import { EventGlyph } from './event-glyph';

const pictureClass = 'block h-24 w-32 rounded-lg border border-rule bg-sunken object-cover sm:h-28 sm:w-40';

/** An image that steps aside when it cannot load (an expired link, or a finding no longer shared). */
function QuietImage({ src, alt }: { src: string; alt: string }) {
  const [failed, setFailed] = useState(false);
  if (failed) return null;
  return (
    <img src={src} alt={alt} loading="lazy" decoding="async" onError={() => setFailed(true)} className={pictureClass} />
  );
}

export function TimelineItem({ event, restorationId }: { event: TimelineEvent; restorationId: number }) {
  const { kind, photoId, findingId, thumbUrl } = event;
  const aboutFinding = findingKinds.has(kind) && findingId !== null;
  return (
    <li className="flex gap-3 py-3" data-event-id={event.id}>
      <EventGlyph kind={kind} caution={event.caution} />
      <div className="min-w-0 flex-1 space-y-2">
        <div>
          {event.caution ? (
            <p className="font-semibold break-words text-danger">
              <span className="sr-only">Safety departure: </span>
              {event.summary}
            </p>
          ) : (
            <p className="break-words">{event.summary}</p>
          )}
          <p className="text-sm text-ink-soft">
            <time dateTime={event.at}>{timeOfDay(event.at)}</time>
            {event.actorName && <> · {event.actorName}</>}
          </p>
        </div>
        {kind === 'photo-added' && thumbUrl && photoId !== null && (
          <Link
            to={`/restorations/${restorationId}/photos/${photoId}`}
            className="inline-block rounded-lg hover:opacity-90"
            aria-label="Open the photo"
          >
            <QuietImage src={thumbUrl} alt="" />
          </Link>
        )}
        {aboutFinding &&
          (photoId !== null ? (
            <Link
              to={findingPath({ restorationId, photoId, id: findingId })}
              className="group inline-flex flex-col gap-1 rounded-lg text-sm font-semibold text-glow-strong"
            >
              <QuietImage src={`/api/findings/${findingId}/closeup`} alt="Close-up of the marked spot" />
              <span className="underline-offset-2 group-hover:underline">Open the finding</span>
            </Link>
          ) : (
            <QuietImage src={`/api/findings/${findingId}/closeup`} alt="Close-up of the marked spot" />
          ))}
      </div>
    </li>
  );
}

import { useMemo, useState } from 'react';
import type { TimelineEvent } from '../../../../shared/schemas/events';
import { EmptyState, ErrorState, Loading } from '../../../components/states';
import { useEvents } from '../api/get-events';
import { countByKind } from '../lib/event-kinds';
import { groupByDay } from '../lib/group-by-day';
import { KindFilter } from './kind-filter';
import { TimelineItem } from './timeline-item';

type Kind = TimelineEvent['kind'];

/**
 * The restoration's history, newest first, day by day. The whole list is fetched once and filtered here, so the
 * chips can show counts and combine kinds; owners receive only what is shared with them (the server decides).
 */
export function Timeline({ restorationId }: { restorationId: number }) {
  const events = useEvents(restorationId);
  const [shown, setShown] = useState<ReadonlySet<Kind>>(() => new Set());
  const all = events.data;
  const counts = useMemo(() => countByKind(all ?? []), [all]);
  const groups = useMemo(() => {
    const visible = shown.size === 0 ? (all ?? []) : (all ?? []).filter((e) => shown.has(e.kind));
    return groupByDay(visible);
  }, [all, shown]);

  if (events.isPending) return <Loading label="Fetching the history…" />;
  if (events.isError) return <ErrorState error={events.error} onRetry={() => events.refetch()} />;
  if (events.data.length === 0)
    return (
      <EmptyState title="Nothing has happened yet">
        Photos, findings, parts and stages appear here as the work goes on.
      </EmptyState>
    );

  const toggle = (kind: Kind) =>
    setShown((current) => {
      const next = new Set(current);
      if (next.has(kind)) next.delete(kind);
      else next.add(kind);
      return next;
    });
  const showing = groups.reduce((n, g) => n + g.events.length, 0);

  return (
    <div className="space-y-4">
      <KindFilter
        counts={counts}
        shown={shown}
        total={events.data.length}
        onToggle={toggle}
        onClear={() => setShown(new Set())}
      />
      <p aria-live="polite" className="text-sm text-ink-soft">
        {shown.size === 0
          ? `${showing} ${showing === 1 ? 'event' : 'events'}`
          : `Showing ${showing} of ${events.data.length} events`}
      </p>
      <ol className="space-y-2">
        {groups.map((group) => (
          <li key={group.day} aria-labelledby={`day-${restorationId}-${group.day}`}>
            <h3
              id={`day-${restorationId}-${group.day}`}
              className="sticky top-0 z-10 border-b border-rule bg-paper/95 py-2 font-bold backdrop-blur supports-[backdrop-filter]:bg-paper/80"
            >
              {group.label}
            </h3>
            <ol className="divide-y divide-rule">
              {group.events.map((event) => (
                <TimelineItem key={event.id} event={event} restorationId={restorationId} />
              ))}
            </ol>
          </li>
        ))}
      </ol>
    </div>
  );
}

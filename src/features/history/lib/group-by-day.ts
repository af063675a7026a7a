import { calendarDay, dayLabel, formatTimeOfDay } from '../../../lib/format';

/** One day of the timeline: its heading ("Tuesday 24 November") and its events, in the order given. */
export interface DayGroup<T> {
  /** The calendar day in the reader's time zone, YYYY-MM-DD. */
  day: string;
  label: string;
  events: T[];
}

export { dayLabel, formatTimeOfDay as timeOfDay };

/**
 * Groups events (already newest first) by the calendar day they happened on, in the reader's time zone unless one
 * is given. Events whose time cannot be read are left out rather than filed under a wrong day.
 */
export function groupByDay<T extends { at: string }>(
  events: T[],
  options: { timeZone?: string; now?: Date } = {},
): DayGroup<T>[] {
  const groups: DayGroup<T>[] = [];
  const byDay = new Map<string, DayGroup<T>>();
  for (const event of events) {
    const date = new Date(event.at);
    if (Number.isNaN(date.getTime())) continue;
    const day = calendarDay(date, options.timeZone);
    let group = byDay.get(day);
    if (!group) {
      group = { day, label: dayLabel(date, options), events: [] };
      byDay.set(day, group);
      groups.push(group);
    }
    group.events.push(event);
  }
  return groups;
}

/** One day of the timeline: its heading ("Tuesday 24 November") and its events, in the order given. */
export interface DayGroup<T> {
  /** The calendar day in the reader's time zone, YYYY-MM-DD. */
  day: string;
  label: string;
  events: T[];
}

function dayKey(date: Date, timeZone?: string): string {
  // en-CA writes dates as YYYY-MM-DD.
  return new Intl.DateTimeFormat('en-CA', { year: 'numeric', month: '2-digit', day: '2-digit', timeZone }).format(date);
}

/** "Tuesday 24 November", with the year added when it is not the current one ("Tuesday 4 March 2025"). */
export function dayLabel(date: Date, { timeZone, now = new Date() }: { timeZone?: string; now?: Date } = {}): string {
  // Built from parts: ICU versions differ on the comma they put after the weekday once a year is present.
  const parts = (d: Date) =>
    Object.fromEntries(
      new Intl.DateTimeFormat('en-GB', { weekday: 'long', day: 'numeric', month: 'long', year: 'numeric', timeZone })
        .formatToParts(d)
        .map((p) => [p.type, p.value]),
    );
  const p = parts(date);
  const label = `${p.weekday} ${p.day} ${p.month}`;
  return p.year === parts(now).year ? label : `${label} ${p.year}`;
}

/** The clock time of an event, 24-hour: "14:05". */
export function timeOfDay(iso: string, timeZone?: string): string {
  const date = new Date(iso);
  return Number.isNaN(date.getTime()) ? '' : new Intl.DateTimeFormat('en-GB', { hour: '2-digit', minute: '2-digit', timeZone }).format(date);
}

/**
 * Groups events (already newest first) by the calendar day they happened on, in the reader's time zone unless one
 * is given. Events whose time cannot be read are left out rather than filed under a wrong day.
 */
export function groupByDay<T extends { at: string }>(events: T[], options: { timeZone?: string; now?: Date } = {}): DayGroup<T>[] {
  const groups: DayGroup<T>[] = [];
  const byDay = new Map<string, DayGroup<T>>();
  for (const event of events) {
    const date = new Date(event.at);
    if (Number.isNaN(date.getTime())) continue;
    const day = dayKey(date, options.timeZone);
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

/**
 * Dates and times for people. Instants are stored in UTC (ISO 8601); they are shown on the reader's calendar:
 * `place.locale` (undefined: the runtime's) and `place.timeZone` (undefined: the runtime's). The client passes the
 * person's (src/lib/format.ts), the server the document's (server/format.ts). An unreadable instant gives ''.
 */
export interface FormatPlace {
  locale?: string;
  timeZone?: string;
}

type Instant = string | number | Date;

const toDate = (instant: Instant): Date | null => {
  const date = instant instanceof Date ? instant : new Date(instant);
  return Number.isNaN(date.getTime()) ? null : date;
};

const styles = {
  /** "2 Dec 2026, 14:05" (en-GB): a moment something was done. */
  dateTime: { dateStyle: 'medium', timeStyle: 'short' },
  /** "2 Dec, 14:05" (en-GB), "Dec 2, 2:05 PM" (en-US): a recent moment in a list; see `formatInstant`. */
  dayAndTime: { day: 'numeric', month: 'short' },
  /** "2 December 2026": a document's date. */
  longDate: { day: 'numeric', month: 'long', year: 'numeric' },
  /** "2 Dec 2026": a date in a table or picker. */
  mediumDate: { day: 'numeric', month: 'short', year: 'numeric' },
  /** "14:05": a time of day, 24-hour. */
  time: { hour: '2-digit', minute: '2-digit', hourCycle: 'h23' },
} satisfies Record<string, Intl.DateTimeFormatOptions>;
export type DateStyle = keyof typeof styles;

/** An instant in one of the product's styles, on the reader's calendar. */
export function formatInstant(instant: Instant, style: DateStyle, place: FormatPlace = {}): string {
  const date = toDate(instant);
  if (!date) return '';
  const format = (options: Intl.DateTimeFormatOptions) =>
    new Intl.DateTimeFormat(place.locale, { ...options, timeZone: place.timeZone }).format(date);
  // The day without the year, then the locale's own short time: fixed two-digit hours read "02:05 PM" in en-US.
  if (style === 'dayAndTime') return `${format(styles.dayAndTime)}, ${format({ timeStyle: 'short' })}`;
  return format(styles[style]);
}

/** An instant as an ISO 8601 calendar date (2026-03-09) on the wall calendar of `timeZone` (UTC unless given). */
export function isoDate(instant: Instant, timeZone = 'UTC'): string {
  const date = toDate(instant);
  if (!date) return '';
  const parts = new Intl.DateTimeFormat('en', {
    timeZone,
    year: 'numeric',
    month: '2-digit',
    day: '2-digit',
  }).formatToParts(date);
  const get = (type: string) => parts.find((p) => p.type === type)?.value ?? '';
  return `${get('year')}-${get('month')}-${get('day')}`;
}

/** The hour (0–23) on the clock of `timeZone`; the runtime's own zone when none is given. */
export function hourIn(now: Date, timeZone?: string): number {
  const hour = new Intl.DateTimeFormat('en', { hour: 'numeric', hourCycle: 'h23', timeZone })
    .formatToParts(now)
    .find((p) => p.type === 'hour')?.value;
  return hour === undefined ? now.getHours() : Number(hour) % 24;
}

/** Whether the runtime knows `zone` as an IANA time zone. */
export function isKnownTimeZone(zone: string): boolean {
  try {
    new Intl.DateTimeFormat('en', { timeZone: zone });
    return true;
  } catch {
    return false;
  }
}

/** "Tuesday 24 November", with the year added when it is not the current one ("Tuesday 4 March 2025"). */
export function dayLabel(
  date: Date,
  { timeZone, now = new Date(), locale = 'en-GB' }: FormatPlace & { now?: Date } = {},
): string {
  // Built from parts: ICU versions differ on the comma they put after the weekday once a year is present.
  const parts = (d: Date) =>
    Object.fromEntries(
      new Intl.DateTimeFormat(locale, { weekday: 'long', day: 'numeric', month: 'long', year: 'numeric', timeZone })
        .formatToParts(d)
        .map((p) => [p.type, p.value]),
    );
  const p = parts(date);
  const label = `${p.weekday} ${p.day} ${p.month}`;
  return p.year === parts(now).year ? label : `${label} ${p.year}`;
}

const relative = new Intl.RelativeTimeFormat('en', { numeric: 'auto' });
/** Each unit and how many of it make the next one up. */
const steps: [Intl.RelativeTimeFormatUnit, number][] = [
  ['second', 60],
  ['minute', 60],
  ['hour', 24],
  ['day', 7],
  ['week', 4.345],
  ['month', 12],
  ['year', Number.POSITIVE_INFINITY],
];

/** "just now", "5 minutes ago", "yesterday", "3 weeks ago": when something happened, read at a glance. */
export function relativeTime(iso: string, now: number = Date.now()): string {
  const then = Date.parse(iso);
  if (Number.isNaN(then)) return '';
  let value = (then - now) / 1000;
  if (Math.abs(value) < 45) return 'just now';
  for (const [unit, size] of steps) {
    if (Math.abs(value) < size) return relative.format(Math.round(value), unit);
    value /= size;
  }
  return '';
}

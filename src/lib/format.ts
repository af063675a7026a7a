/**
 * The client's formatting: shared/format in the person's locale and time zone. Features import from here, never
 * from Intl or toLocale* directly (see "Where does X live" in DEVELOPERS.md).
 */
import { formatInstant, isoDate, type DateStyle, type FormatPlace } from '../../shared/format';

export {
  MINUS,
  signOf,
  withSign,
  trueMinus,
  percentFigure,
  formatPercent,
  signedPercent,
  formatDeviation,
  formatTolerance,
  formatQuantity,
  formatNumber,
  formatSignedQuantity,
  formatDifference,
  formatSignedFixed,
  dayLabel,
  hourIn,
  relativeTime,
} from '../../shared/format';

/** The person's locale and time zone: the browser's own until the account carries its own. */
const place: FormatPlace = {};

/** The person's time zone by name, as the server needs it for CSV dates ("Europe/London"). */
export const personTimeZone = (): string => place.timeZone ?? Intl.DateTimeFormat().resolvedOptions().timeZone;

const at = (instant: string | number | Date, style: DateStyle, locale = place.locale) =>
  formatInstant(instant, style, { ...place, locale });

/** "2 Dec 2026, 14:05" in the person's locale: when something was done. '' when unreadable. */
export const formatDateTime = (instant: string | number | Date) => at(instant, 'dateTime');
/** "2 Dec, 14:05": a recent moment in a list. */
export const formatDayAndTime = (instant: string | number | Date) => at(instant, 'dayAndTime');
/** "2 December 2026". */
export const formatLongDate = (instant: string | number | Date) => at(instant, 'longDate');
/** "2 Dec 2026". */
export const formatMediumDate = (instant: string | number | Date, locale?: string) =>
  at(instant, 'mediumDate', locale ?? place.locale);
/** "14:05" (24-hour) on the person's clock, or in `timeZone` when given. */
export const formatTimeOfDay = (instant: string | number | Date, timeZone = place.timeZone) =>
  formatInstant(instant, 'time', { ...place, timeZone });
/** The calendar day (YYYY-MM-DD) in the person's zone, or in `timeZone` when given. */
export const calendarDay = (instant: string | number | Date, timeZone = personTimeZone()) => isoDate(instant, timeZone);

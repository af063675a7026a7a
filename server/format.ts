/**
 * The server's formatting for e-mail, PDF and CSV: shared/format with the document's place. A hand-back report and
 * its e-mail are dated on the UTC calendar in British English (the workshop's language) unless a reader's zone is given.
 */
import { formatInstant, type FormatPlace } from '../shared/format';

export {
  MINUS,
  formatDeviation,
  formatPercent,
  formatQuantity,
  formatTolerance,
  isoDate,
  signedPercent,
} from '../shared/format';

export const documentPlace: FormatPlace = { locale: 'en-GB', timeZone: 'UTC' };

/** "2 December 2026" on the document's calendar. */
export const documentDate = (instant: string | number | Date, place: FormatPlace = documentPlace) =>
  formatInstant(instant, 'longDate', place);

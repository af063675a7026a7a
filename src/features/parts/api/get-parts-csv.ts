import { personTimeZone } from '../../../lib/format';
/**
 * The ledger as a spreadsheet file. A plain link with `download` fetches it: same origin, so the session cookie goes
 * with it, and the server names the file. Owners get it without costs, sources and notes, as in the ledger. Costs
 * come in the workshop's currency and dates on the reader's calendar (their time zone).
 */
export const partsCsvHref = (restorationId: number, currency?: string) => {
  const query = new URLSearchParams();
  if (currency) query.set('currency', currency);
  const zone = personTimeZone();
  if (zone) query.set('timeZone', zone);
  const search = query.toString();
  return `/api/restorations/${restorationId}/parts.csv${search ? `?${search}` : ''}`;
};

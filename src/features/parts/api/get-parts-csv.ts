/**
 * The ledger as a spreadsheet file. A plain link with `download` fetches it: same origin, so the session cookie goes
 * with it, and the server names the file. Owners get it without costs, sources and notes, as in the ledger.
 */
export const partsCsvHref = (restorationId: number) => `/api/restorations/${restorationId}/parts.csv`;

/**
 * The hand-back report as a PDF, for any member to download. A plain link with `download` fetches it: same origin,
 * so the session cookie goes with it, and the server names the file after the set.
 */
export const reportPdfHref = (restorationId: number) => `/api/restorations/${restorationId}/report.pdf`;

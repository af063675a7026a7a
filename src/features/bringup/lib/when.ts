/** An instant (UTC, ISO) in the reader's own zone, as a bench note would put it. */
export const when = (iso: string) => new Date(iso).toLocaleString(undefined, { dateStyle: 'medium', timeStyle: 'short' });

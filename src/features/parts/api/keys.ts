/** Query keys follow the resource paths, so a change refreshes exactly what it touched. */
export const partKeys = {
  restoration: (restorationId: number) => ['restorations', restorationId, 'parts'] as const,
  /** Every change to a part runs under this key, so the ledger can tell which rows are waiting for the server. */
  update: ['parts', 'update'] as const,
};

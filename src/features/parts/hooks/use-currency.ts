import { useMeta } from '../../../lib/queries/get-meta';
import type { Currency } from '../lib/money';

const FALLBACK: Currency = 'GBP';

/**
 * The currency costs are shown and typed in: the workshop's, from its settings (no per-browser choice). GBP while
 * it loads or when it cannot be read.
 */
export function useCurrency(): [Currency] {
  const meta = useMeta();
  return [meta.data?.currency ?? FALLBACK];
}

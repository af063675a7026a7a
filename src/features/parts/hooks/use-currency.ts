import { useCallback, useSyncExternalStore } from 'react';
import { isCurrency, type Currency } from '../lib/money';

const KEY = 'gridleak.parts.currency';
const FALLBACK: Currency = 'GBP';
const listeners = new Set<() => void>();
/** The last choice made on this page, for when storage refuses to keep it. */
let chosen: Currency | undefined;

function read(): Currency {
  try {
    const stored = localStorage.getItem(KEY);
    return isCurrency(stored) ? stored : (chosen ?? FALLBACK);
  } catch {
    // Storage can be refused (private windows, strict settings): the choice then lasts as long as the page.
    return chosen ?? FALLBACK;
  }
}

function subscribe(listener: () => void) {
  listeners.add(listener);
  const onStorage = (e: StorageEvent) => e.key === KEY && listener();
  window.addEventListener('storage', onStorage);
  return () => {
    listeners.delete(listener);
    window.removeEventListener('storage', onStorage);
  };
}

/**
 * The currency costs are shown in: a per-browser setting kept in localStorage, GBP until chosen. Every user of the
 * hook follows a change at once, other tabs too.
 */
export function useCurrency(): [Currency, (next: Currency) => void] {
  const currency = useSyncExternalStore(subscribe, read, () => FALLBACK);
  const setCurrency = useCallback((next: Currency) => {
    chosen = next;
    try {
      localStorage.setItem(KEY, next);
    } catch {
      // Not kept across visits; `chosen` carries it for now.
    }
    for (const listener of listeners) listener();
  }, []);
  return [currency, setCurrency];
}

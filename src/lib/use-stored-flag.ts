import { useCallback, useState } from 'react';

function read(key: string, fallback: boolean): boolean {
  try {
    const value = window.localStorage.getItem(key);
    return value === null ? fallback : value === 'true';
  } catch {
    return fallback; // storage refused (private mode, a locked-down browser): keep the default for this visit
  }
}

/** A yes/no preference remembered in this browser's localStorage under `key`. */
export function useStoredFlag(key: string, fallback = false): [boolean, (value: boolean) => void] {
  const [value, setValue] = useState(() => read(key, fallback));
  const set = useCallback(
    (next: boolean) => {
      setValue(next);
      try {
        window.localStorage.setItem(key, String(next));
      } catch {
        // Not remembered; it still holds until the page is left.
      }
    },
    [key],
  );
  return [value, set];
}

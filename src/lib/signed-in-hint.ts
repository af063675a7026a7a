import type { QueryClient } from '@tanstack/react-query';
import { ME_KEY } from './session-key';

/** Where this tab notes that the session was last seen signed in (ms since the epoch). */
const HINT_KEY = 'gridleak.signed-in-at';
/**
 * How long the note is trusted. The server keeps an idle session for a day from its last use and moves its expiry
 * forward at most an hour behind, so a session seen alive within the last 12 hours has not run out since.
 */
const TRUSTED_MS = 12 * 60 * 60 * 1000;

function storage(): Storage | undefined {
  try {
    return typeof window === 'undefined' ? undefined : window.sessionStorage;
  } catch {
    return undefined;
  }
}

/**
 * Whether this tab saw the session signed in recently: a route's loader then starts its data together with the
 * sign-in check instead of after it. A signed-out tab has no note, so it asks for nothing it would be refused and
 * its console stays quiet; a session ended elsewhere is found by the first 401, which signs the tab out.
 */
export function probablySignedIn(now = Date.now()): boolean {
  const at = Number(storage()?.getItem(HINT_KEY));
  return Number.isFinite(at) && at > 0 && now - at < TRUSTED_MS;
}

/** Keeps the note in step with the signed-in person in the query cache (sign-in, sign-out, a 401, each check). */
export function followSignedIn(client: QueryClient): () => void {
  return client.getQueryCache().subscribe((event) => {
    if (event.type !== 'updated' || event.query.queryHash !== JSON.stringify(ME_KEY)) return;
    const state = event.query.state;
    if (state.status !== 'success') return;
    const s = storage();
    if (!s) return;
    try {
      if (state.data) s.setItem(HINT_KEY, String(state.dataUpdatedAt || Date.now()));
      else s.removeItem(HINT_KEY);
    } catch {
      // Storage full or refused: the loaders simply wait for the sign-in check.
    }
  });
}

import { QueryClient } from '@tanstack/react-query';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { ME_KEY } from './session-key';
import { followSignedIn, probablySignedIn } from './signed-in-hint';

beforeEach(() => {
  const items = new Map<string, string>();
  vi.stubGlobal('window', {
    sessionStorage: {
      getItem: (k: string) => items.get(k) ?? null,
      setItem: (k: string, v: string) => items.set(k, v),
      removeItem: (k: string) => items.delete(k),
    },
  });
});
afterEach(() => vi.unstubAllGlobals());

describe('signed-in hint', () => {
  it('when nobody was seen signed in, then the loaders wait for the sign-in check', () => {
    expect(probablySignedIn()).toBe(false);
  });

  it('when the person is seen signed in, then the hint holds for hours and ends at sign-out', () => {
    const client = new QueryClient();
    followSignedIn(client);
    client.setQueryData(ME_KEY, { id: 1, name: 'Mara' });
    expect(probablySignedIn()).toBe(true);
    expect(probablySignedIn(Date.now() + 13 * 60 * 60 * 1000)).toBe(false);
    client.setQueryData(ME_KEY, null);
    expect(probablySignedIn()).toBe(false);
  });

  it('when another query changes, then the hint is left alone', () => {
    const client = new QueryClient();
    followSignedIn(client);
    client.setQueryData(['restorations', 1], { id: 1 });
    expect(probablySignedIn()).toBe(false);
  });
});

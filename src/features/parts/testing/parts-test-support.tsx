import type { Part, PartInput } from '../../../../shared/schemas/parts';
import { makePart } from './part-fixtures';
import { apiError, fakeApi, ok } from '../../../testing/fake-api';
import { fakeRows, idAtEnd } from '../../../testing/fake-rows';

/**
 * Stands in for the parts API behind `fetch`. `refuseChanges` answers every PATCH with that status and message;
 * `holdChanges` keeps PATCH answers back until the promise settles, to watch what shows meanwhile. Every call is recorded.
 */
export function fakePartsApi(
  initial: Part[],
  {
    refuseChanges,
    holdChanges,
    currency = 'GBP',
  }: { refuseChanges?: { status: number; message: string }; holdChanges?: Promise<void>; currency?: string } = {},
) {
  const parts = fakeRows<Part, PartInput & { componentRef: string }>(initial, {
    make: makePart,
    remake: (part, change) => makePart(part.id, { ...part, ...change }),
  });
  const api = fakeApi(async ({ method, path, body }) => {
    if (path.endsWith('/parts') && method === 'GET') return ok(parts.list());
    // The workshop's currency comes with the deployment's meta.
    if (path === '/meta') return ok({ demo: false, devMail: false, demoAccounts: [], currency });
    if (path.endsWith('/parts') && method === 'POST') return parts.add(body as PartInput & { componentRef: string });
    if (!/^\/parts\/\d+$/.test(path)) return undefined;
    if (method === 'PATCH') {
      await holdChanges;
      if (refuseChanges) return apiError(refuseChanges.status, refuseChanges.message);
      return parts.change(idAtEnd(path), body as Partial<PartInput>);
    }
    if (method === 'DELETE') return parts.remove(idAtEnd(path));
    return undefined;
  });
  return { calls: api.urlCalls, fetchMock: api.fetchMock };
}

/** A promise and the function that settles it. */
export function gate() {
  let open = () => {};
  const promise = new Promise<void>((resolve) => (open = resolve));
  return { promise, open };
}

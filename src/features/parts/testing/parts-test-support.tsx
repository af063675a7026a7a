import type { Part, PartInput } from '../../../../shared/schemas/parts';
import { makePart } from './part-fixtures';
import { apiError, fakeApi, notFound, toResponse } from '../../../testing/fake-api';

export interface Call {
  method: string;
  url: string;
  body: unknown;
}

const json = (status: number, body: unknown) =>
  new Response(body === undefined ? null : JSON.stringify(body), {
    status,
    headers: { 'Content-Type': 'application/json' },
  });

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
  let list = [...initial];
  let nextId = 100;
  const calls: Call[] = [];
  const { fetchMock } = fakeApi(async ({ method, path, body }) => {
    const url = `/api${path}`;
    calls.push({ method, url, body });
    if (url.endsWith('/parts') && method === 'GET') return json(200, list);
    // The workshop's currency comes with the deployment's meta.
    if (url.endsWith('/api/meta')) return json(200, { demo: false, devMail: false, demoAccounts: [], currency });
    if (url.endsWith('/parts') && method === 'POST') {
      const made = makePart(nextId++, body as PartInput & { componentRef: string });
      list = [...list, made];
      return json(201, made);
    }
    const id = Number(/\/api\/parts\/(\d+)$/.exec(url)?.[1]);
    if (method === 'PATCH') {
      await holdChanges;
      if (refuseChanges) return toResponse(apiError(refuseChanges.status, refuseChanges.message));
      list = list.map((p) => (p.id === id ? makePart(id, { ...p, ...(body as Partial<PartInput>) }) : p));
      return json(
        200,
        list.find((p) => p.id === id),
      );
    }
    if (method === 'DELETE') {
      list = list.filter((p) => p.id !== id);
      return new Response(null, { status: 204 });
    }
    return toResponse(notFound());
  });
  return { calls, fetchMock };
}

/** A promise and the function that settles it. */
export function gate() {
  let open = () => {};
  const promise = new Promise<void>((resolve) => (open = resolve));
  return { promise, open };
}

import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { render } from '@testing-library/react';
import type { ReactNode } from 'react';
import { MemoryRouter } from 'react-router';
import { vi } from 'vitest';
import type { Photo } from '../../../../shared/schemas/photos';
import { apiError, notFound, toResponse } from '../../../testing/fake-api';

export interface Call {
  method: string;
  url: string;
  body: unknown;
}

/**
 * Stands in for the API behind `fetch`: the photo list answers GET, PATCH merges, DELETE removes.
 * Every call is recorded so tests can check what was sent.
 */
export function fakePhotoApi(initial: Photo[], { failList = false } = {}) {
  let photos = [...initial];
  const calls: Call[] = [];
  const json = (status: number, body: unknown) =>
    new Response(body === undefined ? null : JSON.stringify(body), {
      status,
      headers: { 'Content-Type': 'application/json' },
    });
  const fetchMock = vi.fn(async (input: RequestInfo | URL, init: RequestInit = {}) => {
    const url = String(input);
    const method = init.method ?? 'GET';
    const body = typeof init.body === 'string' ? JSON.parse(init.body) : undefined;
    calls.push({ method, url, body });
    if (url.endsWith('/photos') && method === 'GET') {
      return failList ? toResponse(apiError(500, 'The photo store is not answering.')) : json(200, photos);
    }
    const id = Number(url.match(/\/api\/photos\/(\d+)$/)?.[1]);
    if (method === 'PATCH') {
      photos = photos.map((p) => (p.id === id ? { ...p, ...(body as Partial<Photo>) } : p));
      return json(
        200,
        photos.find((p) => p.id === id),
      );
    }
    if (method === 'DELETE') {
      photos = photos.filter((p) => p.id !== id);
      return new Response(null, { status: 204 });
    }
    return toResponse(notFound());
  });
  vi.stubGlobal('fetch', fetchMock);
  return { calls, fetchMock };
}

/** Renders inside a fresh QueryClient and a memory router (the lightbox links to the markup page). */
export function renderWithQueries(ui: ReactNode) {
  const client = new QueryClient({ defaultOptions: { queries: { retry: false }, mutations: { retry: false } } });
  return {
    client,
    ...render(
      <QueryClientProvider client={client}>
        <MemoryRouter>{ui}</MemoryRouter>
      </QueryClientProvider>,
    ),
  };
}

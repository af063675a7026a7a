import { apiErrorSchema } from '../../shared/schemas/errors';
import { NEXT_CURSOR_HEADER } from '../../shared/schemas/pagination';

/** An error answer from the API, carrying its status and code for the caller to branch on. */
export class ApiError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly details?: unknown,
  ) {
    super(message);
  }
}

/** JSON requests to /api with the session cookie; throws ApiError with the server's message. */
export async function api<T>(path: string, init: RequestInit & { json?: unknown } = {}): Promise<T> {
  return (await apiWithHeaders<T>(path, init)).body;
}

/** One page of a paged list (see shared/schemas/pagination.ts) and the cursor of the next, null on the last. */
export async function apiPage<T>(path: string, cursor?: string | null): Promise<{ items: T[]; next: string | null }> {
  const url = cursor ? `${path}${path.includes('?') ? '&' : '?'}cursor=${encodeURIComponent(cursor)}` : path;
  const { body, headers } = await apiWithHeaders<T[]>(url);
  return { items: body, next: headers.get(NEXT_CURSOR_HEADER) };
}

/**
 * Every item of a paged list (see shared/schemas/pagination.ts), page after page until the server gives no
 * next cursor; `maxPages` keeps a runaway list from looping for ever.
 */
export async function apiAllPages<T>(path: string, maxPages = 50): Promise<T[]> {
  const items: T[] = [];
  let cursor: string | null = null;
  for (let page = 0; page < maxPages; page++) {
    const { items: more, next }: { items: T[]; next: string | null } = await apiPage<T>(path, cursor);
    items.push(...more);
    cursor = next;
    if (!cursor) break;
  }
  return items;
}

async function apiWithHeaders<T>(path: string, init: RequestInit & { json?: unknown } = {}): Promise<{ body: T; headers: Headers }> {
  const { json, headers, ...rest } = init;
  let response: Response;
  try {
    response = await fetch(`/api${path}`, {
      credentials: 'same-origin',
      ...rest,
      headers: { Accept: 'application/json', ...(json !== undefined ? { 'Content-Type': 'application/json' } : {}), ...headers },
      body: json !== undefined ? JSON.stringify(json) : rest.body,
    });
  } catch {
    throw new ApiError(0, 'network', 'Gridleak could not be reached. Check the connection and try again.');
  }
  if (response.status === 204) return { body: undefined as T, headers: response.headers };
  const body: unknown = await response.json().catch(() => undefined);
  if (!response.ok) {
    const parsed = apiErrorSchema.safeParse(body);
    if (parsed.success) throw new ApiError(response.status, parsed.data.error.code, parsed.data.error.message, parsed.data.error.details);
    throw new ApiError(response.status, 'unknown', `The server answered ${response.status}.`);
  }
  return { body: body as T, headers: response.headers };
}

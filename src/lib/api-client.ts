import type { z } from 'zod';
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

type Init<T> = RequestInit & { json?: unknown; schema?: z.ZodType<T> };

/** In development and tests, answers are checked against the shared schema they should follow; a build trusts them. */
const checksAnswers = import.meta.env.DEV || import.meta.env.MODE === 'test';

/**
 * Throws when a successful answer does not follow its schema (development and tests only): the client and the server
 * then disagree about the contract, which a test should catch rather than a person. The body is returned as sent.
 */
function checkAnswer<T>(path: string, body: unknown, schema: z.ZodType<T> | undefined): T {
  if (schema && checksAnswers) {
    const parsed = schema.safeParse(body);
    if (!parsed.success) throw new Error(`The answer to ${path} does not follow its schema: ${parsed.error.message}`);
  }
  return body as T;
}

/** JSON requests to /api with the session cookie; throws ApiError with the server's message. */
export async function api<T>(path: string, init: Init<T> = {}): Promise<T> {
  return (await apiWithHeaders<T>(path, init)).body;
}

/** One page of a paged list (see shared/schemas/pagination.ts) and the cursor of the next, null on the last. */
export async function apiPage<T>(
  path: string,
  cursor?: string | null,
  item?: z.ZodType<T>,
): Promise<{ items: T[]; next: string | null }> {
  const url = cursor ? `${path}${path.includes('?') ? '&' : '?'}cursor=${encodeURIComponent(cursor)}` : path;
  const { body, headers } = await apiWithHeaders<T[]>(url);
  if (item) body.forEach((one) => checkAnswer(url, one, item));
  return { items: body, next: headers.get(NEXT_CURSOR_HEADER) };
}

/** GET an answer described by a shared schema; its type is the schema's, and dev and tests check it. */
export const apiGet = <S extends z.ZodType>(path: string, schema: S): Promise<z.output<S>> =>
  api<z.output<S>>(path, { schema: schema as z.ZodType<z.output<S>> });

/**
 * Every item of a paged list (see shared/schemas/pagination.ts), page after page until the server gives no
 * next cursor; `maxPages` keeps a runaway list from looping for ever.
 */
export async function apiAllPages<T>(path: string, item?: z.ZodType<T>, maxPages = 50): Promise<T[]> {
  const items: T[] = [];
  let cursor: string | null = null;
  for (let page = 0; page < maxPages; page++) {
    const { items: more, next }: { items: T[]; next: string | null } = await apiPage<T>(path, cursor, item);
    items.push(...more);
    cursor = next;
    if (!cursor) break;
  }
  return items;
}

async function apiWithHeaders<T>(path: string, init: Init<T> = {}): Promise<{ body: T; headers: Headers }> {
  const { json, headers, schema, ...rest } = init;
  let response: Response;
  try {
    response = await fetch(`/api${path}`, {
      credentials: 'same-origin',
      ...rest,
      headers: {
        Accept: 'application/json',
        ...(json !== undefined ? { 'Content-Type': 'application/json' } : {}),
        ...headers,
      },
      body: json !== undefined ? JSON.stringify(json) : rest.body,
    });
  } catch {
    throw new ApiError(0, 'network', 'Gridleak could not be reached. Check the connection and try again.');
  }
  if (response.status === 204) return { body: undefined as T, headers: response.headers };
  const body: unknown = await response.json().catch(() => undefined);
  if (!response.ok) {
    const parsed = apiErrorSchema.safeParse(body);
    if (parsed.success)
      throw new ApiError(response.status, parsed.data.error.code, parsed.data.error.message, parsed.data.error.details);
    throw new ApiError(response.status, 'unknown', `The server answered ${response.status}.`);
  }
  return { body: checkAnswer(path, body, schema), headers: response.headers };
}

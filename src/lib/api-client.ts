import { z } from 'zod';
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

type Request = RequestInit & { json?: unknown };
/** A request whose answer is JSON: it names the shared schema the answer follows. */
type WithAnswer<S extends z.ZodType> = Request & { schema: S; noBody?: never };
/** A request answered with no body (204): it says so. */
type WithoutAnswer = Request & { noBody: true; schema?: never };

/** In development and tests, answers are checked against the shared schema they should follow; a build trusts them. */
const checksAnswers = import.meta.env.DEV || import.meta.env.MODE === 'test';

/**
 * Throws when a successful answer does not follow its schema (development and tests only): the client and the server
 * then disagree about the contract, which a test should catch rather than a person. The body is returned as sent.
 */
export function checkAnswer<S extends z.ZodType>(path: string, body: unknown, schema: S): z.output<S> {
  if (checksAnswers) {
    const parsed = schema.safeParse(body);
    if (!parsed.success) throw new Error(`The answer to ${path} does not follow its schema: ${parsed.error.message}`);
  }
  return body as z.output<S>;
}

/**
 * JSON requests to /api with the session cookie; throws ApiError with the server's message. Every call names the
 * shared schema of its answer (`{ schema }`, whose type it returns and which dev and tests check) or says it has
 * none (`{ noBody: true }`, a 204), so a new call cannot forget the contract.
 */
export function api<S extends z.ZodType>(path: string, init: WithAnswer<S>): Promise<z.output<S>>;
export function api(path: string, init: WithoutAnswer): Promise<void>;
export async function api(path: string, init: Request & { schema?: z.ZodType; noBody?: boolean } = {}) {
  return (await send(path, init)).body;
}

/** GET an answer described by a shared schema; its type is the schema's, and dev and tests check it. */
export const apiGet = <S extends z.ZodType>(path: string, schema: S): Promise<z.output<S>> => api(path, { schema });

/** One page of a paged list (see shared/schemas/pagination.ts) and the cursor of the next, null on the last. */
export async function apiPage<S extends z.ZodType>(
  path: string,
  cursor: string | null | undefined,
  item: S,
): Promise<{ items: z.output<S>[]; next: string | null }> {
  const url = cursor ? `${path}${path.includes('?') ? '&' : '?'}cursor=${encodeURIComponent(cursor)}` : path;
  const { body, headers } = await send(url, {});
  const items = checkAnswer(url, body, z.array(item));
  return { items, next: headers.get(NEXT_CURSOR_HEADER) };
}

/**
 * Every item of a paged list (see shared/schemas/pagination.ts), page after page until the server gives no
 * next cursor; `maxPages` keeps a runaway list from looping for ever.
 */
export async function apiAllPages<S extends z.ZodType>(path: string, item: S, maxPages = 50): Promise<z.output<S>[]> {
  const items: z.output<S>[] = [];
  let cursor: string | null = null;
  for (let page = 0; page < maxPages; page++) {
    const { items: more, next }: { items: z.output<S>[]; next: string | null } = await apiPage(path, cursor, item);
    items.push(...more);
    cursor = next;
    if (!cursor) break;
  }
  return items;
}

async function send(
  path: string,
  init: Request & { schema?: z.ZodType; noBody?: boolean },
): Promise<{ body: unknown; headers: Headers }> {
  const { json, headers, schema, noBody, ...rest } = init;
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
  if (response.status === 204) return { body: undefined, headers: response.headers };
  const body: unknown = await response.json().catch(() => undefined);
  if (noBody && response.ok) return { body: undefined, headers: response.headers };
  if (!response.ok) {
    const parsed = apiErrorSchema.safeParse(body);
    if (parsed.success)
      throw new ApiError(response.status, parsed.data.error.code, parsed.data.error.message, parsed.data.error.details);
    throw new ApiError(response.status, 'unknown', `The server answered ${response.status}.`);
  }
  return { body: schema ? checkAnswer(path, body, schema) : body, headers: response.headers };
}

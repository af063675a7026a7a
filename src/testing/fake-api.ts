import { vi } from 'vitest';
import { knownApiErrorSchema, type ApiErrorCode } from '../../shared/schemas/errors';

/**
 * The one way component tests stand in for the API. Error answers are built by `apiError` and checked against
 * the shared error schema, so a fake can only answer with a code the server really sends.
 */
export interface Call {
  method: string;
  /** The path without /api, e.g. `/parts/3`. */
  path: string;
  body: unknown;
}
/** A call with the URL the client asked for, `/api` included: for tests that name the request as it was sent. */
export interface UrlCall {
  method: string;
  url: string;
  body: unknown;
}
/** `headers`: response headers beyond the content type, such as a page's `X-Next-Cursor`. */
export type Reply = { status: number; body?: unknown; headers?: Record<string, string> };

/** The code the server sends with each status when nothing more specific applies (see server/http/errors.ts). */
const usualCode: Record<number, ApiErrorCode> = {
  400: 'bad_request',
  401: 'unauthorized',
  403: 'forbidden',
  404: 'not_found',
  409: 'conflict',
  410: 'gone',
  413: 'too_large',
  415: 'unsupported_type',
  429: 'too_many_requests',
  500: 'internal',
  503: 'mail_unavailable',
};

/** An error answer as the server writes it; throws when the code is not one the server sends. */
export function apiError(status: number, message: string, code: ApiErrorCode | undefined = usualCode[status]): Reply {
  return { status, body: knownApiErrorSchema.parse({ error: { code, message } }) };
}
export const ok = (body: unknown): Reply => ({ status: 200, body });
export const created = (body: unknown): Reply => ({ status: 201, body });
export const noContent = (): Reply => ({ status: 204 });
export const notFound = (): Reply => apiError(404, 'Not found.');

/** A fetch Response for a reply (204 carries no body). */
export function toResponse(reply: Reply): Response {
  if (reply.status === 204 || reply.body === undefined)
    return new Response(null, { status: reply.status, headers: reply.headers });
  return new Response(JSON.stringify(reply.body), {
    status: reply.status,
    headers: { 'Content-Type': 'application/json', ...reply.headers },
  });
}

/**
 * Stands in for the API behind `fetch`: `answer` gets each call (path without /api) and returns the reply (or a
 * ready Response), or nothing for the server's 404. Every call and its headers are recorded so tests can check what
 * was sent (`calls` by path, `urlCalls` by the URL requested). Successful answers meet the client's schema check (src/lib/api-client.ts), so a fake cannot drift from
 * the contract.
 */
export function fakeApi(answer: (call: Call) => Reply | Response | undefined | Promise<Reply | Response | undefined>) {
  const calls: Call[] = [];
  const urlCalls: UrlCall[] = [];
  /** The request headers of each call, in the same order as `calls`. */
  const headers: Record<string, string>[] = [];
  const fetchMock = vi.fn(async (input: RequestInfo | URL, init: RequestInit = {}) => {
    const call = {
      method: init.method ?? 'GET',
      path: String(input).replace(/^\/api/, ''),
      body: typeof init.body === 'string' ? (JSON.parse(init.body) as unknown) : undefined,
    };
    calls.push(call);
    urlCalls.push({ method: call.method, url: String(input), body: call.body });
    headers.push(Object.fromEntries([...new Headers(init.headers).entries()].map(([k, v]) => [k.toLowerCase(), v])));
    const reply = await answer(call);
    return reply instanceof Response ? reply : toResponse(reply ?? notFound());
  });
  vi.stubGlobal('fetch', fetchMock);
  return { calls, urlCalls, headers, fetchMock };
}

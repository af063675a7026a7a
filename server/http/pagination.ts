import type { Request, Response } from 'express';
import { NEXT_CURSOR_HEADER } from '../../shared/schemas/pagination';
import { BadRequestError } from './errors';

/** A keyset position: the sort values of the last item of a page. Opaque to clients. */
export type Cursor = (string | number)[];

export const encodeCursor = (values: Cursor): string => Buffer.from(JSON.stringify(values)).toString('base64url');

/** The cursor's values, checked against the kinds expected; 400 when it was not made by this server. */
export function decodeCursor(cursor: string | undefined, kinds: ('string' | 'number')[]): Cursor | undefined {
  if (cursor === undefined) return undefined;
  try {
    const values: unknown = JSON.parse(Buffer.from(cursor, 'base64url').toString());
    if (Array.isArray(values) && values.length === kinds.length && values.every((v, i) => typeof v === kinds[i]))
      return values as Cursor;
  } catch {
    // fall through
  }
  throw new BadRequestError('That page cursor is not valid; start again from the first page.');
}

/** What to read for one page: one row more than the page (so `sendPage` knows there is a next), after the cursor. */
export const pageWindow = (query: { limit: number; cursor?: string | undefined }, kinds: ('string' | 'number')[]) => ({
  limit: query.limit + 1,
  cursor: decodeCursor(query.cursor, kinds),
});

/**
 * Cuts `limit + 1` rows read in order to one page and sends it: the body is the plain array (the shape the
 * route always had), and the next page's cursor goes in `X-Next-Cursor` and a `Link` header.
 */
export function sendPage<R, T>(
  req: Request,
  res: Response,
  rows: R[],
  limit: number,
  cursorOf: (row: R) => Cursor,
  toItem: (rows: R[]) => T[] | Promise<T[]>,
) {
  const more = rows.length > limit;
  const page = more ? rows.slice(0, limit) : rows;
  if (more) {
    const next = encodeCursor(cursorOf(page[page.length - 1]!));
    const url = new URL(req.originalUrl, 'http://x');
    url.searchParams.set('cursor', next);
    res.setHeader(NEXT_CURSOR_HEADER, next);
    res.setHeader('Link', `<${url.pathname}${url.search}>; rel="next"`);
  }
  return Promise.resolve(toItem(page)).then((items) => res.json(items));
}

import { asc, desc, sql, type AnyColumn, type SQL } from 'drizzle-orm';

/** A timestamp cut to the millisecond, so a page cursor (an ISO string, as a JS Date holds it) names it exactly. */
export const toMs = (column: AnyColumn) => sql<Date>`date_trunc('milliseconds', ${column})`;

/** One sort key of a keyset page: the column (or expression) and how a cursor value is written in SQL. */
export type Key = { by: AnyColumn | SQL; kind: 'number' | 'string' | 'instant' };

/**
 * A keyset order whose keys all run one way: `orderBy` for the query, and `after(cursor)` for the rows
 * following a page's last row (`(a, b) > (x, y)` ascending, `<` descending), so a page never repeats or skips
 * a row while rows are added elsewhere in the list. The last key must be unique (the id).
 */
export function keyset(direction: 'asc' | 'desc', keys: Key[]) {
  const value = (key: Key, v: string | number) => (key.kind === 'instant' ? sql`${v}::timestamptz` : sql`${v}`);
  return {
    /** The kinds a cursor of this order carries, for `decodeCursor`. */
    kinds: keys.map((k) => (k.kind === 'number' ? 'number' : 'string')) as ('string' | 'number')[],
    orderBy: keys.map((k) => (direction === 'asc' ? asc(k.by) : desc(k.by))),
    after(cursor: (string | number)[] | undefined): SQL | undefined {
      if (!cursor) return undefined;
      const left = sql.join(
        keys.map((k) => sql`${k.by}`),
        sql`, `,
      );
      const right = sql.join(
        keys.map((k, i) => value(k, cursor[i]!)),
        sql`, `,
      );
      return direction === 'asc' ? sql`(${left}) > (${right})` : sql`(${left}) < (${right})`;
    },
  };
}

/** The page's limit and cursor as a repository takes them: read `limit` rows (one more than the page) after `cursor`. */
export type PageWindow = { limit: number; cursor?: (string | number)[] };

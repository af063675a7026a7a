import { randomBytes } from 'node:crypto';
import { sql } from 'drizzle-orm';
import type { Database } from '../../server/db/client';

/**
 * Makes every `operation` on `table` fail inside PostgreSQL (a statement trigger raising an error) until the
 * returned function is called: the way to break one step of a multi-step write without a hook in the product.
 */
export async function failWrites(db: Database, table: string, operation: 'insert' | 'update' | 'delete' = 'insert') {
  if (!/^[a-z_]+$/.test(table)) throw new Error(`not a table name: ${table}`);
  const name = `fail_${table}_${operation}_${randomBytes(4).toString('hex')}`;
  await db.execute(
    sql.raw(
      `create function ${name}() returns trigger language plpgsql as $$ begin raise exception 'injected failure: ${operation} on ${table}'; end $$`,
    ),
  );
  await db.execute(
    sql.raw(`create trigger ${name} before ${operation} on ${table} for each statement execute function ${name}()`),
  );
  return async () => {
    await db.execute(sql.raw(`drop trigger ${name} on ${table}`));
    await db.execute(sql.raw(`drop function ${name}()`));
  };
}

/** Runs `body` while `table` refuses `operation`; the failure is removed even when `body` throws. */
export async function whileFailing<T>(
  db: Database,
  table: string,
  operation: 'insert' | 'update' | 'delete',
  body: () => Promise<T>,
): Promise<T> {
  const restore = await failWrites(db, table, operation);
  try {
    return await body();
  } finally {
    await restore();
  }
}

import { sql } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startTestApp } from '../support/test-app';

let t: Awaited<ReturnType<typeof startTestApp>>;
beforeAll(async () => {
  t = await startTestApp();
});
afterAll(() => t.stop());

describe('indexes on foreign keys', () => {
  it('when the migrated schema is read from pg_catalog, then every foreign key column leads an index of its table', async () => {
    // A list by parent (photos of a restoration) and a cascade from the parent (deleting a restoration) both
    // look rows up by the foreign key column; without an index led by it each is a scan of the whole table.
    const result = await t.db.execute<{ table: string; column: string; constraint: string }>(sql`
      select c.conrelid::regclass::text as "table", a.attname as "column", c.conname as "constraint"
      from pg_constraint c
      join pg_attribute a on a.attrelid = c.conrelid and a.attnum = c.conkey[1]
      join pg_namespace n on n.oid = (select relnamespace from pg_class where oid = c.conrelid)
      where c.contype = 'f' and n.nspname = 'public'
        and not exists (
          select 1 from pg_index i
          where i.indrelid = c.conrelid and i.indkey[0] = c.conkey[1] and i.indpred is null
        )
      order by 1, 2`);
    const foreignKeys = await t.db.execute<{ n: number }>(sql`
      select count(*)::int as n from pg_constraint c join pg_class r on r.oid = c.conrelid
      join pg_namespace n on n.oid = r.relnamespace where c.contype = 'f' and n.nspname = 'public'`);
    // The schema has foreign keys at all (a query that found none would prove nothing).
    expect(foreignKeys.rows[0]!.n).toBeGreaterThan(20);
    expect(result.rows.map((r) => `${r.table}.${r.column} (${r.constraint})`)).toEqual([]);
  });
});

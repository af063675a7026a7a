import { sql } from 'drizzle-orm';
import type { Executor } from '../../db/client';

/** Whether PostgreSQL answers a trivial query. */
export const databaseAnswers = (db: Executor): Promise<boolean> =>
  db.execute(sql`select 1`).then(
    () => true,
    () => false,
  );

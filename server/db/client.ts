import { drizzle, type NodePgDatabase } from 'drizzle-orm/node-postgres';
import pg from 'pg';
import * as schema from './schema';

export type Database = NodePgDatabase<typeof schema>;
/** An open transaction: what `db.transaction(async (tx) => …)` hands to its callback. */
export type Tx = Parameters<Parameters<Database['transaction']>[0]>[0];
/** What repositories run their statements on: the pool, or the transaction of the action in progress. */
export type Executor = Database | Tx;

export interface DatabaseHandle {
  db: Database;
  pool: pg.Pool;
}

export function connectDatabase(url: string): DatabaseHandle {
  const pool = new pg.Pool({ connectionString: url, max: 10 });
  // An idle client losing its connection must not crash the process.
  pool.on('error', (err) => console.error(`database pool: ${err.message}`));
  return { db: drizzle(pool, { schema, casing: 'snake_case' }), pool };
}

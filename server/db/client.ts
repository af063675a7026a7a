import { drizzle, type NodePgDatabase } from 'drizzle-orm/node-postgres';
import pg from 'pg';
import * as schema from './schema';

export type Database = NodePgDatabase<typeof schema>;

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

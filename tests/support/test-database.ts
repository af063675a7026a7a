import { randomBytes } from 'node:crypto';
import pg from 'pg';
import { connectDatabase, type DatabaseHandle } from '../../server/db/client';

/** The run's migrated template database (set by tests/run.ts). */
export function templateUrl(): string {
  const url = process.env.GRIDLEAK_TEST_TEMPLATE_URL;
  if (!url) throw new Error('GRIDLEAK_TEST_TEMPLATE_URL is not set: run the suite with `npm test`.');
  return url;
}

/** A fresh database copied from the migrated template, so each test file is isolated. */
export async function createTestDatabase(): Promise<DatabaseHandle & { url: string; drop(): Promise<void> }> {
  const template = new URL(templateUrl());
  const name = `t_${randomBytes(6).toString('hex')}`;
  const admin = new pg.Client({ connectionString: new URL('/postgres', template).toString() });
  await admin.connect();
  try {
    // Parallel test files copy the same template; PostgreSQL refuses a copy while another is reading it.
    for (let attempt = 0; ; attempt++) {
      try {
        await admin.query(`create database ${name} template ${template.pathname.slice(1)}`);
        break;
      } catch (err) {
        if (attempt > 40 || !/being accessed by other users/.test((err as Error).message)) throw err;
        await new Promise((r) => setTimeout(r, 100 + Math.random() * 200));
      }
    }
  } finally {
    await admin.end();
  }
  const url = new URL(`/${name}`, template).toString();
  const handle = connectDatabase(url);
  return {
    ...handle,
    url,
    async drop() {
      await handle.pool.end().catch(() => {});
      const c = new pg.Client({ connectionString: new URL('/postgres', template).toString() });
      await c.connect();
      await c.query(`drop database if exists ${name} with (force)`);
      await c.end();
    },
  };
}

import { chmodSync, mkdtempSync, rmSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { startLocalPostgres } from '../../server/local-services/postgres';
import { applyMigrations } from '../../server/db/migrate';

export const TEMPLATE_DB = 'gridleak_template';

/** A throwaway PostgreSQL cluster for one test run, with a migrated template database. */
export async function startTestCluster(port = Number(process.env.GRIDLEAK_TEST_PG_PORT ?? 54339)) {
  const dir = mkdtempSync(path.join(os.tmpdir(), 'gridleak-test-'));
  // mkdtemp makes the folder private; the postgres system user must be able to pass through it.
  chmodSync(dir, 0o755);
  const pg = await startLocalPostgres({ dataDir: path.join(dir, 'pg'), port, database: TEMPLATE_DB, throwaway: true });
  await applyMigrations(pg.url);
  return {
    templateUrl: pg.url,
    stop() {
      pg.stop();
      rmSync(dir, { recursive: true, force: true });
    },
  };
}

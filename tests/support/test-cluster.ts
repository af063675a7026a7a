import { chmodSync, mkdtempSync, rmSync } from 'node:fs';
import net from 'node:net';
import os from 'node:os';
import path from 'node:path';
import { startLocalPostgres } from '../../server/local-services/postgres';
import { applyMigrations } from '../../server/db/migrate';

export const TEMPLATE_DB = 'gridleak_template';

/** A port nobody listens on right now, so a run never collides with another run or a stale cluster. */
function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const server = net.createServer();
    server.once('error', reject);
    server.listen(0, '127.0.0.1', () => {
      const { port } = server.address() as net.AddressInfo;
      server.close(() => resolve(port));
    });
  });
}

/** A throwaway PostgreSQL cluster for one test run, with a migrated template database. */
export async function startTestCluster(port?: number) {
  port ??= process.env.GRIDLEAK_TEST_PG_PORT ? Number(process.env.GRIDLEAK_TEST_PG_PORT) : await freePort();
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

import { spawn, type ChildProcess } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { createTestDatabase } from './test-database';

/**
 * Starts the product through the same entry point as `npm start` (server/main.ts: migrations, demo seed,
 * s3rver, SMTP capture, client build, one Express process), on a fresh database of the test cluster.
 */
export async function startProduct() {
  const database = await createTestDatabase();
  await database.pool.end();
  const dataDir = mkdtempSync(path.join(os.tmpdir(), 'gridleak-e2e-'));
  const portBase = 41000 + Math.floor(Math.random() * 8000);
  const port = portBase + 3;
  const origin = `http://localhost:${port}`;
  const child: ChildProcess = spawn('node_modules/.bin/tsx', ['server/main.ts'], {
    env: {
      ...process.env,
      DATABASE_URL: database.url,
      PORT: String(port),
      PUBLIC_URL: origin,
      GRIDLEAK_DATA_DIR: dataDir,
      GRIDLEAK_PORT_BASE: String(portBase),
      LOG_LEVEL: 'warn',
    },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  let output = '';
  child.stdout?.on('data', (d) => (output += d));
  child.stderr?.on('data', (d) => (output += d));
  await new Promise<void>((resolve, reject) => {
    const timer = setTimeout(() => reject(new Error(`The product did not start in time:\n${output}`)), 150_000);
    child.once('exit', (code) => reject(new Error(`The product exited (${code}):\n${output}`)));
    child.stdout?.on('data', () => {
      if (output.includes('Gridleak is running')) {
        clearTimeout(timer);
        resolve();
      }
    });
  });
  return {
    origin,
    databaseUrl: database.url,
    output: () => output,
    async stop() {
      const exited = new Promise((r) => child.once('exit', r));
      child.kill('SIGTERM');
      await exited;
      await database.drop();
      rmSync(dataDir, { recursive: true, force: true });
    },
  };
}

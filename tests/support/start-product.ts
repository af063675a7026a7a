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
  // A port taken by something else (Node's EADDRINUSE, PostgreSQL's "Address already in use") means another draw of
  // ports, not a failed run.
  for (let attempt = 1; ; attempt++) {
    try {
      return await startOn(database);
    } catch (err) {
      if (attempt >= 3 || !/EADDRINUSE|address already in use/i.test(String(err))) {
        await database.drop();
        throw err;
      }
    }
  }
}

/**
 * The stand-ins and the app on five ports from a random base (base + 0 … + 4: database, storage, mail, app,
 * payments), drawn below Linux's ephemeral range (32768 and up), where outgoing connections take their local ports.
 */
async function startOn(database: Awaited<ReturnType<typeof createTestDatabase>>) {
  const dataDir = mkdtempSync(path.join(os.tmpdir(), 'gridleak-e2e-'));
  const portBase = 20000 + Math.floor(Math.random() * 12000);
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
    child.once('exit', (code) => {
      clearTimeout(timer);
      rmSync(dataDir, { recursive: true, force: true });
      reject(new Error(`The product exited (${code}):\n${output}`));
    });
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

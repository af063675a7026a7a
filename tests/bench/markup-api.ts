/**
 * Benchmark (prints figures measured in one run; no assertions): GET a photo's 1,000 findings (with
 * 5,000 comments in the restoration) under 50 concurrent connections, p95 latency on loopback, as a
 * ratio to a bare Express route returning the same JSON from memory.
 * Run: npx tsx tests/bench/markup-api.ts
 */
import { spawn } from 'node:child_process';
import autocannon from 'autocannon';
import { startTestCluster } from '../support/test-cluster';

const p95 = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length * 0.95)] ?? NaN;

async function load(url: string, headers: Record<string, string>) {
  const latencies: number[] = [];
  const result = await new Promise<autocannon.Result>((resolve, reject) => {
    const instance = autocannon({ url, connections: 50, duration: 8, headers }, (err, res) =>
      err ? reject(err) : resolve(res),
    );
    instance.on('response', (_client, status, _bytes, ms) => status === 200 && latencies.push(ms));
  });
  return { p95: p95(latencies), requests: result.requests.total, errors: result.errors + result.non2xx };
}

const cluster = await startTestCluster();
const child = spawn('node_modules/.bin/tsx', ['tests/bench/markup-api-server.ts'], {
  env: {
    ...process.env,
    GRIDLEAK_TEST_TEMPLATE_URL: cluster.templateUrl,
    AWS_SDK_JS_NODE_VERSION_SUPPORT_WARNING_DISABLED: 'true',
  },
  stdio: ['ignore', 'pipe', 'inherit'],
});
try {
  const info = await new Promise<{ appPort: number; barePort: number; cookie: string; photoId: number; bytes: number }>(
    (resolve) => child.stdout!.once('data', (d) => resolve(JSON.parse(String(d)))),
  );
  const app = await load(`http://127.0.0.1:${info.appPort}/api/photos/${info.photoId}/findings`, {
    Cookie: info.cookie,
  });
  const bare = await load(`http://127.0.0.1:${info.barePort}/findings`, {});
  console.log(
    `\nmarkup API, findings of one photo (1,000 findings, 5,000 comments, ${(info.bytes / 1024).toFixed(0)} kB JSON), 50 connections, 8 s each:`,
  );
  console.log(`  Gridleak route: p95 ${app.p95.toFixed(1)} ms over ${app.requests} requests (${app.errors} errors)`);
  console.log(`  bare Express, same JSON from memory: p95 ${bare.p95.toFixed(1)} ms over ${bare.requests} requests`);
  console.log(`  ratio: ${(app.p95 / bare.p95).toFixed(1)}×`);
} finally {
  child.kill('SIGTERM');
  await new Promise((r) => child.once('exit', r));
  cluster.stop();
}

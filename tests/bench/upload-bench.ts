/**
 * What the upload benchmarks share (photo-pipeline.ts, sheet-pipeline.ts): the app in a child process on a fresh
 * test cluster, an upload through its API, and the timing loop that sets it against bare sharp in the same run.
 */
import { spawn } from 'node:child_process';
import { TEST_ORIGIN } from '../support/test-app';
import { startTestCluster } from '../support/test-cluster';
import { mallocEnv } from './malloc-env';

export const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)]!;

export async function timed(fn: () => Promise<unknown>) {
  const start = performance.now();
  await fn();
  return performance.now() - start;
}

/** The app of photo-bench-server.ts with a signed-in technician and a restoration; `stop` ends both processes. */
export async function startBenchServer() {
  const cluster = await startTestCluster();
  const child = spawn('node_modules/.bin/tsx', ['tests/bench/photo-bench-server.ts'], {
    env: {
      ...mallocEnv().env,
      GRIDLEAK_TEST_TEMPLATE_URL: cluster.templateUrl,
      AWS_SDK_JS_NODE_VERSION_SUPPORT_WARNING_DISABLED: 'true',
    },
    stdio: ['ignore', 'pipe', 'inherit'],
  });
  const info = await new Promise<{ port: number; cookie: string; restorationId: number }>((resolve) =>
    child.stdout!.once('data', (d) => resolve(JSON.parse(String(d)))),
  );
  /** Posts `fields` and the file to the restoration's `collection` (photos, sheets) and waits for the 201. */
  const upload = async (collection: string, fields: Record<string, string>, file: Blob, name: string) => {
    const form = new FormData();
    for (const [key, value] of Object.entries(fields)) form.set(key, value);
    form.set('file', file, name);
    const res = await fetch(`http://127.0.0.1:${info.port}/api/restorations/${info.restorationId}/${collection}`, {
      method: 'POST',
      body: form,
      headers: { Cookie: info.cookie, Origin: TEST_ORIGIN },
    });
    if (res.status !== 201) throw new Error(`upload answered ${res.status}: ${await res.text()}`);
    await res.arrayBuffer();
  };
  const stop = async () => {
    child.kill('SIGTERM');
    await new Promise((r) => child.once('exit', r));
    cluster.stop();
  };
  return { child, upload, stop };
}

/**
 * Times the upload against bare sharp, alternating, `runs` times each after one warm-up of both (first-use costs:
 * module loading, connections). Answers every time in ms.
 */
export async function againstBareSharp(upload: () => Promise<void>, bareSharp: () => Promise<void>, runs = 5) {
  await upload();
  await bareSharp();
  const api: number[] = [];
  const bare: number[] = [];
  for (let i = 0; i < runs; i++) {
    bare.push(await timed(bareSharp));
    api.push(await timed(upload));
  }
  return { api, bare };
}

/**
 * Load test (prints figures measured in one run; no assertions): 50 virtual users, each signed in as a
 * technician of one of 10 restorations, for 60 s, each going round a realistic mix: the bench, the
 * restoration's tabs, a photo's findings, a comment, a reading, and an upload every tenth round.
 * Prints requests per second, p95 per route, errors (goal: none), and the server's memory: at start, after a
 * warm-up of the same mix (the baseline: what any server holds once it has served), right after the run and after
 * 10 s at rest. Each is read once the server has answered every request it had (the load stops first, so a queued
 * upload's image buffers are not counted) and after a full garbage collection, so garbage not yet collected is not
 * counted as growth. Growth is judged against the warm-up figure; "at rest" shows what V8 and malloc give back.
 * Run: npx tsx tests/bench/load.ts [seconds] [warm-up seconds]
 * The server runs with glibc's malloc set as `npm start` sets it (malloc-env.ts); `MALLOC_MMAP_THRESHOLD_= npx tsx …` leaves one setting at glibc's default.
 */
import { fork } from 'node:child_process';
import { readFileSync } from 'node:fs';
import autocannon from 'autocannon';
import { twoToneJpeg } from '../factories/images';
import { mallocEnv } from './malloc-env';
import { startTestCluster } from '../support/test-cluster';

type Person = { cookie: string; restorationId: number; photoId: number; findingId: number };
type Ctx = { person?: Person; route?: string };
const seconds = Number(process.argv[2] ?? 60);
/**
 * The same mix run first, so that what any server holds once it has served (pools, compiled code, libvips' threads,
 * V8's and malloc's working sizes) is not counted as growth. 15 s proved too short: the resident set was still rising
 * to its working size; after 60 s it had reached it (a second 60 s added nothing).
 */
const warmUpSeconds = Number(process.argv[3] ?? 60);
const boundary = 'gridleak-load-boundary';
const jpeg = await twoToneJpeg(1600, 1200);
const uploadBody = Buffer.concat([
  Buffer.from(
    `--${boundary}\r\nContent-Disposition: form-data; name="view"\r\n\r\nunderside\r\n--${boundary}\r\nContent-Disposition: form-data; name="phase"\r\n\r\nbefore\r\n`,
  ),
  Buffer.from(
    `--${boundary}\r\nContent-Disposition: form-data; name="file"; filename="chassis.jpg"\r\nContent-Type: image/jpeg\r\n\r\n`,
  ),
  jpeg,
  Buffer.from(`\r\n--${boundary}--\r\n`),
]);

const p95 = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length * 0.95)] ?? NaN;
const malloc = mallocEnv();
const cluster = await startTestCluster();
const child = fork('tests/bench/load-server.ts', [], {
  execArgv: ['--expose-gc', '--import', 'tsx'],
  env: {
    ...malloc.env,
    GRIDLEAK_TEST_TEMPLATE_URL: cluster.templateUrl,
    AWS_SDK_JS_NODE_VERSION_SUPPORT_WARNING_DISABLED: 'true',
  },
  stdio: ['ignore', 'pipe', 'inherit', 'ipc'],
});
type Memory = NodeJS.MemoryUsage & { waitedMs: number; inFlight: number };
const memory = () =>
  new Promise<Memory>((resolve) => {
    child.once('message', (m) => resolve(m as Memory));
    child.send('rss');
  });
try {
  const info = await new Promise<{ port: number; people: Person[] }>((resolve) =>
    child.stdout!.once('data', (d) => resolve(JSON.parse(String(d)))),
  );
  let next = 0;
  let rounds = 0;
  // One step of the round: its route name for the figures, and how to make the request for this person.
  const step = (
    route: string,
    make: (
      p: Person,
      c: Ctx,
    ) => { method?: string; path: string; body?: string | Buffer; headers?: Record<string, string> },
  ) => ({
    setupRequest: (req: Record<string, unknown>, context: Ctx) => {
      context.person ??= info.people[next++ % info.people.length];
      context.route = route;
      const r = make(context.person!, context);
      return {
        ...req,
        method: r.method ?? 'GET',
        path: r.path,
        body: r.body,
        headers: {
          cookie: context.person!.cookie,
          origin: 'http://gridleak.test',
          'accept-encoding': 'gzip, br',
          ...(r.body ? { 'content-type': 'application/json' } : {}),
          ...r.headers,
        },
      };
    },
  });
  const requests = [
    step('GET /restorations (bench)', () => ({ path: '/api/restorations' })),
    step('GET /activity (bench)', () => ({ path: '/api/activity' })),
    step('GET /notifications', () => ({ path: '/api/notifications?limit=50' })),
    step('GET /restorations/:id', (p) => ({ path: `/api/restorations/${p.restorationId}` })),
    step('GET /restorations/:id/photos', (p) => ({ path: `/api/restorations/${p.restorationId}/photos` })),
    step('GET /photos/:id/findings', (p) => ({ path: `/api/photos/${p.photoId}/findings` })),
    step('GET /restorations/:id/findings', (p) => ({ path: `/api/restorations/${p.restorationId}/findings` })),
    step('GET /restorations/:id/measurements', (p) => ({ path: `/api/restorations/${p.restorationId}/measurements` })),
    step('GET /restorations/:id/parts', (p) => ({ path: `/api/restorations/${p.restorationId}/parts` })),
    step('GET /restorations/:id/events', (p) => ({ path: `/api/restorations/${p.restorationId}/events` })),
    step('POST /findings/:id/comments', (p) => ({
      method: 'POST',
      path: `/api/findings/${p.findingId}/comments`,
      body: JSON.stringify({ body: 'Re-measured: 248 V at the anode.' }),
    })),
    step('POST /restorations/:id/measurements', (p) => ({
      method: 'POST',
      path: `/api/restorations/${p.restorationId}/measurements`,
      body: JSON.stringify({
        location: 'V3 pin 7',
        quantity: 'dc-voltage',
        expected: '250 V',
        tolerance: '±10%',
        reading: '243 V',
      }),
    })),
    step('GET /photos/:id/findings', (p) => ({ path: `/api/photos/${p.photoId}/findings` })),
    // An upload every tenth round; the other rounds read the photo list again.
    step('upload or photos', (p, c) => {
      // autocannon resets each connection's context after a round, so the rounds are counted here.
      rounds += 1;
      if (rounds % 10 !== 5) return { path: `/api/restorations/${p.restorationId}/photos` };
      c.route = 'POST /restorations/:id/photos (upload)';
      return {
        method: 'POST',
        path: `/api/restorations/${p.restorationId}/photos`,
        body: uploadBody,
        headers: { 'content-type': `multipart/form-data; boundary=${boundary}` },
      };
    }),
  ];
  const atStart = await memory();
  let byRoute = new Map<string, number[]>();
  let failures = new Map<string, number>();
  const run = (duration: number) =>
    new Promise<autocannon.Result>((resolve, reject) => {
      const instance = autocannon(
        { url: `http://127.0.0.1:${info.port}`, connections: 50, duration, requests: requests as never, timeout: 30 },
        (err, res) => (err ? reject(err) : resolve(res)),
      );
      instance.on('response', (client, status, _bytes, ms) => {
        const ctx = (client as unknown as { requestIterator: { context: Ctx } }).requestIterator.context;
        const route = ctx.route === 'upload or photos' ? 'GET /restorations/:id/photos' : (ctx.route ?? '?');
        if (!byRoute.has(route)) byRoute.set(route, []);
        byRoute.get(route)!.push(ms);
        if (status >= 400) failures.set(`${route} → ${status}`, (failures.get(`${route} → ${status}`) ?? 0) + 1);
      });
    });
  if (warmUpSeconds > 0) await run(warmUpSeconds);
  const afterWarmUp = await memory();
  byRoute = new Map();
  failures = new Map();
  // The resident set under load, read from /proc every tenth of the run: a plateau is a working set, a steady rise a leak.
  const underLoad: number[] = [];
  const sampler = setInterval(
    () => underLoad.push(Number(/VmRSS:\s+(\d+)/.exec(readFileSync(`/proc/${child.pid}/status`, 'utf8'))![1]) * 1024),
    (seconds * 1000) / 10,
  );
  const result = await run(seconds).finally(() => clearInterval(sampler));
  const afterRun = await memory();
  // Ten quiet seconds later: memory V8 and glibc give back once the load stops, versus memory still held.
  await new Promise((r) => setTimeout(r, 10_000));
  const afterRest = await memory();
  const mb = (n: number) => `${(n / 1024 / 1024).toFixed(0)} MB`;
  const line = (what: string, m: Memory) =>
    `    ${what}: RSS ${mb(m.rss)} (V8 heap used ${mb(m.heapUsed)} of ${mb(m.heapTotal)}, external ${mb(m.external)}, of which array buffers ${mb(m.arrayBuffers)})${m.waitedMs >= 100 ? `, read ${(m.waitedMs / 1000).toFixed(1)} s later once ${m.inFlight ? `${m.inFlight} requests were still open` : 'the last request was answered'}` : ''}`;
  console.log(
    `\nload: 50 signed-in users, ${seconds} s, a round of ${requests.length} requests each (an upload every tenth round)`,
  );
  console.log(
    `  requests: ${result.requests.total} (${(result.requests.total / seconds).toFixed(0)}/s); errors: ${result.errors} connection, ${result.non2xx} non-2xx; timeouts ${result.timeouts}`,
  );
  for (const [what, n] of failures) console.log(`    ${what}: ${n}`);
  console.log('  p95 per route:');
  for (const [route, xs] of [...byRoute].sort((a, b) => p95(b[1]) - p95(a[1])))
    console.log(`    ${p95(xs).toFixed(0).padStart(6)} ms  ${route} (${xs.length})`);
  console.log(
    `  server memory (${malloc.words}), each once no request was in flight and after a full garbage collection:`,
  );
  console.log(line('at start', atStart));
  console.log(line(`after a ${warmUpSeconds} s warm-up of the same mix`, afterWarmUp));
  console.log(
    `    under load, every ${seconds / 10} s (requests in flight, garbage not collected): ${underLoad.map(mb).join(', ')}`,
  );
  console.log(line(`after the ${seconds} s run`, afterRun));
  console.log(line('after 10 s without requests', afterRest));
  const growth = (m: Memory) =>
    `${mb(afterWarmUp.rss)} → ${mb(m.rss)} (${(((m.rss - afterWarmUp.rss) / afterWarmUp.rss) * 100).toFixed(0)} %)`;
  console.log(
    `  server RSS growth from the warm-up (goal: at most 20 %): right after the run ${growth(afterRun)}; after 10 s at rest ${growth(afterRest)}`,
  );
} finally {
  child.kill('SIGTERM');
  await new Promise((r) => child.once('exit', r));
  cluster.stop();
}

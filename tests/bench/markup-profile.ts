/// <reference lib="dom" />
/**
 * Profile (prints what the browser did, measured in one run; no assertions): the markup page with 1,000 findings,
 * cold cache, from navigation to the first drawn frame, recorded with Chromium's performance trace. Prints when each
 * request finished and the renderer's main-thread work in that time: by kind of task, by script, and its longest tasks.
 * Run: npx tsx tests/bench/markup-profile.ts   (MARKUP_PROFILE_FEW=1 profiles the page with the demo's few findings;
 *   MARKUP_PROFILE_OUT=<file>.cpuprofile keeps the JavaScript samples)
 */
import { rmSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import { launchBrowser, newPage } from '../support/browser';
import { signInAs } from '../support/journey';
import { startProduct } from '../support/start-product';
import { startTestCluster } from '../support/test-cluster';
import { markupFixture } from './markup-fixture';

type TraceEvent = {
  name: string;
  ph: string;
  ts: number;
  dur?: number;
  pid: number;
  tid: number;
  cat: string;
  args?: { name?: string; data?: Record<string, unknown>; beginData?: Record<string, unknown> };
};

// A journey run leaves a test build in dist/ (React's development runtime, answers checked against their schemas):
// the product rebuilds the client as \`npm start\` would, so the figures are those of a production build.
rmSync('dist/index.html', { force: true });
const cluster = await startTestCluster();
process.env.GRIDLEAK_TEST_TEMPLATE_URL = cluster.templateUrl;
const product = await startProduct();
const browser = await launchBrowser();
try {
  const fixture = await markupFixture(product);
  if (!process.env.MARKUP_PROFILE_FEW) await fixture.addFindings();
  await fixture.close();
  // A warm-up visit in its own context, so the server's caches and the client build are ready; the profiled one is cold.
  const warm = await newPage(browser, { width: 1280, height: 900 });
  await signInAs(warm, product.origin, 'mara@cobbold-lane.test');
  await warm.goto(fixture.url);
  await warm.waitForFunction(
    () => (window as { __gridleakMarkup?: { view: { scale: number } } }).__gridleakMarkup?.view.scale,
    null,
    {
      timeout: 60_000,
    },
  );
  await warm.context().close();

  const page = await newPage(browser, { width: 1280, height: 900 });
  await signInAs(page, product.origin, 'mara@cobbold-lane.test');
  await page.goto(`${product.origin}/api/meta`);
  await browser.startTracing(page, {
    categories: [
      'devtools.timeline',
      'disabled-by-default-devtools.timeline',
      'v8.execute',
      'blink.user_timing',
      'loading',
      'toplevel',
    ],
  });
  // JavaScript samples alongside the trace: where script time goes, by function.
  const cdp = await page.context().newCDPSession(page);
  await cdp.send('Profiler.enable');
  await cdp.send('Profiler.setSamplingInterval', { interval: 200 });
  await cdp.send('Profiler.start');
  const started = Date.now();
  await page.goto(fixture.url);
  await page.waitForFunction(
    () => (window as { __gridleakMarkup?: { view: { scale: number } } }).__gridleakMarkup?.view.scale,
    null,
    {
      timeout: 60_000,
    },
  );
  await page.evaluate(() => new Promise((r) => requestAnimationFrame(() => requestAnimationFrame(r))));
  const ms = Date.now() - started;
  const { profile } = await cdp.send('Profiler.stop');
  // MARKUP_PROFILE_OUT=file.cpuprofile keeps the JavaScript samples (opens in Chromium's DevTools; map with dist/assets/*.map).
  if (process.env.MARKUP_PROFILE_OUT) writeFileSync(process.env.MARKUP_PROFILE_OUT, JSON.stringify(profile));
  const trace = JSON.parse((await browser.stopTracing()).toString()) as { traceEvents: TraceEvent[] };
  const resources = (await page.evaluate(
    `performance.getEntriesByType('resource').map((e) => ({ name: e.name.replace(location.origin, '').split('?')[0].slice(0, 70), start: Math.round(e.startTime), sent: Math.round(e.requestStart), first: Math.round(e.responseStart), end: Math.round(e.responseEnd), kB: Math.round(e.encodedBodySize / 1024) }))`,
  )) as { name: string; start: number; sent: number; first: number; end: number; kB: number }[];

  const events = trace.traceEvents;
  const navStart =
    events.find(
      (e) => e.name === 'navigationStart' && (e.args?.data as { url?: string } | undefined)?.url?.includes('/photos/'),
    )?.ts ?? Math.min(...events.filter((e) => e.ts > 0).map((e) => e.ts));
  // The renderer main thread that ran the most work after the navigation.
  const threadNames = new Map(
    events.filter((e) => e.name === 'thread_name').map((e) => [`${e.pid}:${e.tid}`, e.args?.name]),
  );
  const busy = new Map<string, number>();
  for (const e of events)
    if (e.ph === 'X' && threadNames.get(`${e.pid}:${e.tid}`) === 'CrRendererMain' && e.ts >= navStart)
      busy.set(`${e.pid}:${e.tid}`, (busy.get(`${e.pid}:${e.tid}`) ?? 0) + (e.dur ?? 0));
  const main = [...busy.entries()].sort((a, b) => b[1] - a[1])[0]![0];
  const end = navStart + ms * 1000;
  const onMain = events.filter((e) => e.ph === 'X' && `${e.pid}:${e.tid}` === main && e.ts >= navStart && e.ts <= end);
  const tasks = onMain.filter((e) => e.name === 'ThreadControllerImpl::RunTask');
  // Each task is named by the most telling event inside it.
  const telling = [
    'EvaluateScript',
    'v8.compileModule',
    'v8.evaluateModule',
    'FunctionCall',
    'TimerFire',
    'FireAnimationFrame',
    'EventDispatch',
    'ParseHTML',
    'Layout',
    'UpdateLayoutTree',
    'Paint',
    'Decode Image',
    'ImageDecodeTask',
    'v8.compile',
    'MajorGC',
    'MinorGC',
    'ResourceReceivedData',
    'XHRReadyStateChange',
  ];
  const inside = (t: TraceEvent) =>
    onMain.filter((e) => e !== t && e.ts >= t.ts && e.ts + (e.dur ?? 0) <= t.ts + (t.dur ?? 0));
  const label = (t: TraceEvent) => {
    const kids = inside(t)
      .filter((e) => telling.includes(e.name))
      .sort((a, b) => (b.dur ?? 0) - (a.dur ?? 0));
    const k = kids[0];
    if (!k) return 'other';
    const d = (k.args?.data ?? k.args?.beginData ?? {}) as { url?: string; functionName?: string; type?: string };
    const where = d.url ? ` ${String(d.url).replace(product.origin, '').split('?')[0]}` : '';
    return `${k.name}${d.type ? ` ${d.type}` : ''}${d.functionName ? ` ${d.functionName}` : ''}${where}`;
  };
  const totals = new Map<string, number>();
  for (const e of onMain)
    if (telling.includes(e.name) || e.name === 'ParseAuthorStyleSheet' || e.name === 'PrePaint' || e.name === 'Commit')
      totals.set(e.name, (totals.get(e.name) ?? 0) + (e.dur ?? 0));
  const byScript = new Map<string, number>();
  for (const e of onMain.filter((x) =>
    ['EvaluateScript', 'v8.compileModule', 'v8.evaluateModule', 'v8.compile'].includes(x.name),
  )) {
    const d = (e.args?.data ?? e.args?.beginData ?? {}) as { url?: string; fileName?: string };
    const u = String(d.url ?? d.fileName ?? '?')
      .replace(product.origin, '')
      .split('?')[0]!;
    byScript.set(`${e.name} ${u}`, (byScript.get(`${e.name} ${u}`) ?? 0) + (e.dur ?? 0));
  }
  const msOf = (us: number) => `${(us / 1000).toFixed(0).padStart(5)} ms`;
  console.log(
    `\nmarkup page, ${process.env.MARKUP_PROFILE_FEW ? "the demo's few findings" : '1,000 findings'}, cold cache: navigation to first drawn frame ${ms} ms (load average ${os
      .loadavg()
      .map((l) => l.toFixed(1))
      .join(', ')})`,
  );
  console.log(
    `main thread busy ${msOf(tasks.reduce((s, t) => s + (t.dur ?? 0), 0))} of ${ms} ms in ${tasks.length} tasks`,
  );
  console.log(
    '\nrequests (asked → sent → first byte → end, ms from navigation; asked to sent is time queued for a connection):',
  );
  for (const r of resources.sort((a, b) => a.end - b.end))
    console.log(
      `  ${String(r.start).padStart(5)} → ${String(r.sent).padStart(5)} → ${String(r.first).padStart(5)} → ${String(r.end).padStart(5)}  ${String(r.kB).padStart(4)} kB  ${r.name}`,
    );
  console.log('\nmain-thread time by kind (nested kinds overlap):');
  for (const [k, v] of [...totals.entries()].sort((a, b) => b[1] - a[1])) console.log(`  ${msOf(v)}  ${k}`);
  console.log('\nscript compile and evaluation:');
  for (const [k, v] of [...byScript.entries()].sort((a, b) => b[1] - a[1]).slice(0, 15))
    console.log(`  ${msOf(v)}  ${k}`);
  console.log('\ntasks of 8 ms or more, in order (start ms from navigation, length):');
  for (const t of tasks.filter((x) => (x.dur ?? 0) >= 8000))
    console.log(`  ${String(Math.round((t.ts - navStart) / 1000)).padStart(5)}  ${msOf(t.dur ?? 0)}  ${label(t)}`);
  // Self time per function (and per script), from the samples.
  const self = new Map<number, number>();
  const deltas = profile.timeDeltas ?? [];
  (profile.samples ?? []).forEach((id, i) => self.set(id, (self.get(id) ?? 0) + (deltas[i + 1] ?? 0)));
  const byFunction = new Map<string, number>();
  const byFile = new Map<string, number>();
  for (const node of profile.nodes) {
    const t = self.get(node.id) ?? 0;
    const f = node.callFrame;
    const file = f.url.replace(product.origin, '').split('?')[0] || `(${f.functionName || 'native'})`;
    const key = `${f.functionName || '(anonymous)'} ${file}:${f.lineNumber + 1}:${f.columnNumber + 1}`;
    byFunction.set(key, (byFunction.get(key) ?? 0) + t);
    byFile.set(file, (byFile.get(file) ?? 0) + t);
  }
  console.log('\nJavaScript self time by script (samples):');
  for (const [k, v] of [...byFile.entries()].sort((a, b) => b[1] - a[1]).slice(0, 12))
    console.log(`  ${msOf(v)}  ${k}`);
  console.log('\nJavaScript self time by function (samples):');
  for (const [k, v] of [...byFunction.entries()].sort((a, b) => b[1] - a[1]).slice(0, 30))
    console.log(`  ${msOf(v)}  ${k}`);
} finally {
  await browser.close();
  await product.stop();
  cluster.stop();
}

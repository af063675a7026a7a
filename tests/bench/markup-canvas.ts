/// <reference lib="dom" />
/**
 * Benchmark (prints figures measured in one run; no assertions): the markup page with 1,000 findings on
 * one photo in headless Chromium — time from navigation to the first drawn frame with the marks, and
 * frame times while panning and zooming (goal: median under 16 ms).
 * Run: npx tsx tests/bench/markup-canvas.ts
 */
import { rmSync } from 'node:fs';
import os from 'node:os';
import { launchBrowser, newPage } from '../support/browser';
import { signInAs } from '../support/journey';
import { startProduct } from '../support/start-product';
import { startTestCluster } from '../support/test-cluster';
import { markupFixture } from './markup-fixture';

/** A fresh context (cold cache), signed in, then navigation to the first drawn frame: its time and what came when. */
async function firstFrame(url: string) {
  const page = await newPage(browser, { width: 1280, height: 900 });
  await signInAs(page, product.origin, 'mara@cobbold-lane.test');
  await page.goto(`${product.origin}/api/meta`); // leave the app, so the markup page loads from scratch
  const started = Date.now();
  await page.goto(url);
  await page.waitForFunction(
    () => (window as unknown as { __gridleakMarkup?: { view: { scale: number } } }).__gridleakMarkup?.view.scale,
    null,
    { timeout: 60_000 },
  );
  // Two animation frames after the probe appears, the marks have been drawn.
  await page.evaluate(() => new Promise((r) => requestAnimationFrame(() => requestAnimationFrame(r))));
  const ms = Date.now() - started;
  // When each part of the page had arrived, from the navigation's start (ms).
  const parts = (await page.evaluate(`(() => {
    const at = (test) => Math.round(Math.max(0, ...performance.getEntriesByType('resource').filter((e) => test(e.name)).map((e) => e.responseEnd)));
    return { findings: at((n) => n.includes('/api/photos/') && n.includes('/findings')), photos: at((n) => n.includes('/api/') && n.split('?')[0].endsWith('/photos')),
      markupChunk: at((n) => n.includes('photo-markup')), image: at((n) => n.includes('display')) };
  })()`)) as Record<string, number>;
  return { page, ms, parts };
}

// A journey run leaves a test build in dist/ (React's development runtime, answers checked against their schemas):
// the product rebuilds the client as \`npm start\` would, so the figures are those of a production build.
rmSync('dist/index.html', { force: true });
const cluster = await startTestCluster();
process.env.GRIDLEAK_TEST_TEMPLATE_URL = cluster.templateUrl;
const product = await startProduct();
const browser = await launchBrowser();
try {
  const fixture = await markupFixture(product);
  const url = fixture.url;
  // Side by side: the same page with the demo's few findings first (each in a fresh browser context, cold cache).
  const few = await firstFrame(url);
  await fixture.addFindings();
  await fixture.close();

  const many = await firstFrame(url);
  const page = many.page;

  const stage = page.getByTestId('markup-stage');
  const box = (await stage.boundingBox())!;
  // Passed as text: tsx wraps named functions in a helper that does not exist inside the page.
  await page.evaluate(`(() => {
    // The canvas's own work per redraw: every layer's scene drawing, timed inside the page.
    window.__draws = [];
    const original = window.Konva.Layer.prototype.drawScene;
    window.Konva.Layer.prototype.drawScene = function (...args) {
      const t0 = performance.now();
      const result = original.apply(this, args);
      window.__draws.push(performance.now() - t0);
      return result;
    };
    window.__frames = [];
    let last = performance.now();
    const tick = (t) => { window.__frames.push(t - last); last = t; if (window.__frames.length < 100000) requestAnimationFrame(tick); };
    requestAnimationFrame(tick);
  })()`);
  const cx = box.x + box.width / 2;
  const cy = box.y + box.height / 2;
  for (let round = 0; round < 3; round++) {
    await page.mouse.move(cx, cy);
    for (let i = 0; i < 6; i++) await page.mouse.wheel(0, -120);
    await page.mouse.down({ button: 'middle' });
    for (let i = 0; i < 30; i++) await page.mouse.move(cx + i * 8, cy + i * 4);
    await page.mouse.up({ button: 'middle' });
    for (let i = 0; i < 6; i++) await page.mouse.wheel(0, 120);
  }
  const frames = await page.evaluate(() => (window as unknown as { __frames: number[] }).__frames.slice(2));
  const draws = await page.evaluate(() => (window as unknown as { __draws: number[] }).__draws);
  const pick = (xs: number[]) => {
    const sorted = [...xs].sort((a, b) => a - b);
    return (q: number) => sorted[Math.floor(sorted.length * q)] ?? NaN;
  };
  const at = pick(frames);
  const drawAt = pick(draws);
  console.log(`\nmarkup canvas, 1,000 findings on one photo, headless Chromium (software rendering) on this machine:`);
  const said = (f: { ms: number; parts: Record<string, number> }) =>
    `${f.ms} ms (arrived: findings ${f.parts.findings} ms, photo list ${f.parts.photos} ms, markup chunk ${f.parts.markupChunk} ms, display image ${f.parts.image || 'after the frame'}${f.parts.image ? ' ms' : ''})`;
  console.log(
    `  load average ${os
      .loadavg()
      .map((l) => l.toFixed(1))
      .join(', ')} on ${os.cpus().length} cores`,
  );
  console.log(`  navigation to first drawn frame, the demo's few findings: ${said(few)}`);
  console.log(
    `  navigation to first drawn frame, 1,000 findings: ${said(many)}; ratio ${(many.ms / few.ms).toFixed(2)}×`,
  );
  console.log(
    `  frame intervals while zooming and panning (${frames.length} frames, 60 Hz display = 16.7 ms): median ${at(0.5).toFixed(1)} ms, p95 ${at(0.95).toFixed(1)} ms`,
  );
  console.log(
    `  canvas drawing per layer redraw (${draws.length} redraws): median ${drawAt(0.5).toFixed(1)} ms, p95 ${drawAt(0.95).toFixed(1)} ms (goal: median < 16 ms)`,
  );
} finally {
  await browser.close();
  await product.stop();
  cluster.stop();
}

/**
 * Benchmark (prints figures measured in one run; no assertions): bytes of JavaScript transferred by the
 * sign-in page on a cold cache, as the built client is served (precompressed, content-negotiated), next
 * to the uncompressed size of the same files. Builds the client first.
 * Run: npx tsx tests/bench/sign-in-weight.ts
 */
import type { AddressInfo } from 'node:net';
import path from 'node:path';
import express from 'express';
import { build } from 'vite';
import { serveBuiltClient } from '../../server/client-serving/serve-client';
import { launchBrowser, newPage } from '../support/browser';
import { ensureChromium } from '../support/chromium';

const root = path.resolve(import.meta.dirname, '../..');
await build({ root, logLevel: 'warn' });
const app = express();
// No session: the shell asks who is signed in and is told nobody.
app.use('/api', (_req, res) => res.status(401).json({ error: { code: 'unauthorized', message: 'Sign in first.' } }));
serveBuiltClient(app, path.join(root, 'dist'));
const server = app.listen(0, '127.0.0.1');
await new Promise((r) => server.once('listening', r));
ensureChromium();
const browser = await launchBrowser();
try {
  const page = await newPage(browser, { width: 1280, height: 900 });
  const scripts: { url: string; transferred: number; decoded: number }[] = [];
  page.on(
    'requestfinished',
    (request) =>
      void (async () => {
        if (request.resourceType() !== 'script') return;
        const sizes = await request.sizes();
        const body = await (await request.response())!.body();
        scripts.push({
          url: request.url(),
          transferred: sizes.responseBodySize + sizes.responseHeadersSize,
          decoded: body.length,
        });
      })(),
  );
  await page.goto(`http://127.0.0.1:${(server.address() as AddressInfo).port}/sign-in`, { waitUntil: 'networkidle' });
  await page
    .getByRole('button', { name: /sign in/i })
    .first()
    .waitFor();
  const kb = (n: number) => `${(n / 1024).toFixed(1)} KB`;
  const transferred = scripts.reduce((s, x) => s + x.transferred, 0);
  const decoded = scripts.reduce((s, x) => s + x.decoded, 0);
  console.log(`\nsign-in page, cold cache: ${scripts.length} scripts`);
  for (const s of scripts.sort((a, b) => b.transferred - a.transferred))
    console.log(`  ${kb(s.transferred).padStart(9)}  ${new URL(s.url).pathname}`);
  console.log(
    `  JavaScript transferred: ${kb(transferred)} (uncompressed ${kb(decoded)}; ratio ${(transferred / decoded).toFixed(2)})`,
  );
} finally {
  await browser.close();
  server.close();
}

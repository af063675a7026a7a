import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import http from 'node:http';
import type { AddressInfo } from 'node:net';
import os from 'node:os';
import path from 'node:path';
import { brotliDecompressSync, gunzipSync } from 'node:zlib';
import express from 'express';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { precompressDirectory } from '../../server/client-serving/precompress';
import { serveBuiltClient } from '../../server/client-serving/serve-client';
import { findings } from '../../server/db/schema';
import { createPhotoRow } from '../factories/photos';
import { createRestoration } from '../factories/restorations';
import { createUser } from '../factories/users';
import { startTestApp, TEST_ORIGIN } from '../support/test-app';

type Raw = { status: number; headers: http.IncomingHttpHeaders; body: Buffer };

/** A plain HTTP GET that hands back the bytes as sent (no automatic decompression). */
function rawGet(server: http.Server, urlPath: string, headers: Record<string, string>): Promise<Raw> {
  const { port } = server.address() as AddressInfo;
  return new Promise((resolve, reject) => {
    http
      .get({ host: '127.0.0.1', port, path: urlPath, headers }, (res) => {
        const chunks: Buffer[] = [];
        res.on('data', (c: Buffer) => chunks.push(c));
        res.on('end', () => resolve({ status: res.statusCode!, headers: res.headers, body: Buffer.concat(chunks) }));
      })
      .on('error', reject);
  });
}
const listen = (app: express.Express) =>
  new Promise<http.Server>((resolve) => {
    const server = app.listen(0, '127.0.0.1', () => resolve(server));
  });
const decode = (r: Raw) =>
  r.headers['content-encoding'] === 'br'
    ? brotliDecompressSync(r.body)
    : r.headers['content-encoding'] === 'gzip'
      ? gunzipSync(r.body)
      : r.body;

let t: Awaited<ReturnType<typeof startTestApp>>;
let server: http.Server;
beforeAll(async () => {
  t = await startTestApp();
  server = await listen(t.app);
});
afterAll(async () => {
  await new Promise((r) => server.close(r));
  await t.stop();
});

describe('compressed JSON answers', () => {
  it('when the client accepts brotli or gzip, then the findings list decodes to the same bytes as the plain answer', async () => {
    const user = await createUser(t.db);
    const r = await createRestoration(t.db, [{ userId: user.id, role: 'technician' }]);
    const photoId = await createPhotoRow(t.db, r.id);
    await t.db.insert(findings).values(
      Array.from({ length: 40 }, (_, i) => ({
        restorationId: r.id,
        photoId,
        number: i + 1,
        shape: 'pin' as const,
        points: [{ x: 0.1, y: 0.2 }],
        title: `Dry joint at tag strip ${i + 1}`,
        kind: 'note' as const,
        severity: 'info' as const,
        authorId: user.id,
      })),
    );
    const signIn = await t
      .request()
      .post('/api/auth/sign-in')
      .set('Origin', TEST_ORIGIN)
      .send({ email: user.email, password: user.password });
    const cookie = String(signIn.headers['set-cookie']![0]).split(';')[0]!;
    const url = `/api/photos/${photoId}/findings`;
    const plain = await rawGet(server, url, { Cookie: cookie, 'Accept-Encoding': 'identity' });
    expect(plain.status).toBe(200);
    expect(plain.headers['content-encoding']).toBeUndefined();
    expect(JSON.parse(plain.body.toString())).toHaveLength(40);
    for (const encoding of ['br', 'gzip']) {
      const packed = await rawGet(server, url, { Cookie: cookie, 'Accept-Encoding': encoding });
      expect(packed.status).toBe(200);
      expect(packed.headers['content-encoding']).toBe(encoding);
      expect(packed.body.length).toBeLessThan(plain.body.length);
      expect(decode(packed).equals(plain.body)).toBe(true);
    }
  });
});

describe('the built client', () => {
  let dist: string;
  let client: http.Server;
  const script = `export const marks = ${JSON.stringify(Array.from({ length: 500 }, (_, i) => ({ ref: `R${i}`, value: i * 47 })))};\n`;
  beforeAll(async () => {
    dist = mkdtempSync(path.join(os.tmpdir(), 'gridleak-dist-'));
    mkdirSync(path.join(dist, 'assets'));
    writeFileSync(path.join(dist, 'assets', 'marks-abc123.js'), script);
    writeFileSync(path.join(dist, 'assets', 'marks-abc123.js.map'), '{"version":3,"sources":["secret.ts"]}');
    writeFileSync(
      path.join(dist, 'index.html'),
      `<!doctype html><title>Gridleak</title>${'<!-- bench -->'.repeat(200)}`,
    );
    precompressDirectory(dist);
    const app = express();
    serveBuiltClient(app, dist);
    client = await listen(app);
  });
  afterAll(async () => {
    await new Promise((r) => client.close(r));
    rmSync(dist, { recursive: true, force: true });
  });

  it('when a browser accepts brotli, gzip or neither, then an asset decodes to the file built, with its type and a year of caching', async () => {
    for (const [accept, expected] of [
      ['br, gzip', 'br'],
      ['gzip', 'gzip'],
      ['identity', undefined],
    ] as const) {
      const res = await rawGet(client, '/assets/marks-abc123.js', { 'Accept-Encoding': accept });
      expect(res.status).toBe(200);
      expect(res.headers['content-encoding']).toBe(expected);
      expect(res.headers['content-type']).toMatch(/javascript/);
      expect(res.headers['cache-control']).toMatch(/max-age=31536000/);
      expect(decode(res).toString()).toBe(script);
    }
  });

  it('when a page route is asked for, then index.html comes compressed and is not cached for long', async () => {
    const res = await rawGet(client, '/restorations/4/photos', { 'Accept-Encoding': 'br' });
    expect(res.headers['content-encoding']).toBe('br');
    expect(res.headers['content-type']).toMatch(/html/);
    expect(decode(res).toString()).toContain('<title>Gridleak</title>');
    expect(res.headers['cache-control']).toBe('no-cache');
  });

  it('when a source map is asked for, then the answer is 404 though the file stays in the build folder', async () => {
    const res = await rawGet(client, '/assets/marks-abc123.js.map', {});
    expect(res.status).toBe(404);
  });
});

import { mkdtempSync, rmSync } from 'node:fs';
import net from 'node:net';
import os from 'node:os';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createStorage, STORAGE_TIMEOUT_MS, type Storage } from '../storage';
import { startS3StandIn, type S3StandIn } from './s3-stand-in';

let dir: string;
let s3: S3StandIn;
let storage: Storage;
beforeAll(async () => {
  dir = mkdtempSync(path.join(os.tmpdir(), 'gridleak-s3-gate-'));
  s3 = await startS3StandIn(dir, 0, 'gate-bucket');
  storage = createStorage({ ...s3, region: 'us-east-1' });
  await storage.putObject('photos/1/abc/original', Buffer.from('an original with GPS'), 'image/jpeg');
});
afterAll(async () => {
  await s3.close();
  rmSync(dir, { recursive: true, force: true });
});

describe('the local S3 stand-in', () => {
  it('when started, then it uses credentials of its own, not the well-known default pair', () => {
    expect(s3.accessKeyId).not.toBe('S3RVER');
    expect(s3.secretAccessKey).not.toBe('S3RVER');
    expect(s3.secretAccessKey.length).toBeGreaterThanOrEqual(32);
  });

  it('when someone else on the machine lists the bucket anonymously or with the default keys, then access is denied', async () => {
    const anonymous = await fetch(`${s3.endpoint}/gate-bucket?list-type=2`);
    expect(anonymous.status).toBe(403);
    expect(await anonymous.text()).not.toContain('original');
    const withDefaults = createStorage({
      ...s3,
      accessKeyId: 'S3RVER',
      secretAccessKey: 'S3RVER',
      region: 'us-east-1',
    });
    await expect(withDefaults.getObject('photos/1/abc/original')).rejects.toThrow();
    const listed: string[] = [];
    await expect(
      (async () => {
        for await (const o of withDefaults.listObjects('photos/')) listed.push(o.key);
      })(),
    ).rejects.toThrow();
    expect(listed).toEqual([]);
  });

  it('when the app uses its own keys, then objects list and read, and a presigned URL reads one object but lists nothing', async () => {
    const keys: string[] = [];
    for await (const o of storage.listObjects('photos/')) keys.push(o.key);
    expect(keys).toEqual(['photos/1/abc/original']);
    const url = await storage.getSignedUrl('photos/1/abc/original');
    const read = await fetch(url);
    expect(read.status).toBe(200);
    expect(await read.text()).toBe('an original with GPS');
    const download = await fetch(
      await storage.getSignedUrl('photos/1/abc/original', { downloadName: 'photo 7 (bench).jpg' }),
    );
    expect(download.status).toBe(200);
    expect(download.headers.get('content-disposition')).toMatch(/attachment/);
    await download.body?.cancel();
    const listUrl = new URL(url);
    listUrl.pathname = '/gate-bucket';
    listUrl.searchParams.set('list-type', '2');
    const list = await fetch(listUrl);
    expect(list.status).toBe(403);
    await list.body?.cancel();
  });
});

describe('signatures at the stand-in', () => {
  it('when someone who saw a presigned URL (and so the key id) forges a signature, then access is denied', async () => {
    const url = new URL(await storage.getSignedUrl('photos/1/abc/original'));
    const zeroed = new URL(url);
    zeroed.searchParams.set('X-Amz-Signature', '0'.repeat(64));
    const forgedUrl = await fetch(zeroed);
    expect(forgedUrl.status).toBe(403);
    await forgedUrl.body?.cancel();
    const scope = url.searchParams.get('X-Amz-Credential')!;
    const forgedHeader = await fetch(`${s3.endpoint}/gate-bucket?list-type=2`, {
      headers: {
        authorization: `AWS4-HMAC-SHA256 Credential=${scope}, SignedHeaders=host;x-amz-date, Signature=${'ab'.repeat(32)}`,
        'x-amz-date': url.searchParams.get('X-Amz-Date')!,
      },
    });
    expect(forgedHeader.status).toBe(403);
    expect(await forgedHeader.text()).not.toContain('original');
  });

  it('when a presigned URL is for another object than the one it names, then access is denied', async () => {
    await storage.putObject('photos/1/abc/display.webp', Buffer.from('shared display'), 'image/webp');
    const url = new URL(await storage.getSignedUrl('photos/1/abc/display.webp'));
    url.pathname = url.pathname.replace('display.webp', 'original');
    const res = await fetch(url);
    expect(res.status).toBe(403);
    await res.body?.cancel();
  });
});

describe('storage calls', () => {
  it('when storage accepts the connection but never answers, then the call gives up within its time limit', async () => {
    const silent = net.createServer(() => {}); // holds every socket open, says nothing
    await new Promise<void>((r) => silent.listen(0, '127.0.0.1', r));
    const port = (silent.address() as net.AddressInfo).port;
    const hung = createStorage({
      endpoint: `http://127.0.0.1:${port}`,
      bucket: 'b',
      region: 'us-east-1',
      accessKeyId: 'k',
      secretAccessKey: 's',
    });
    const before = STORAGE_TIMEOUT_MS.request;
    STORAGE_TIMEOUT_MS.request = 300;
    try {
      const start = Date.now();
      await expect(hung.exists('x')).rejects.toThrow();
      expect(Date.now() - start).toBeLessThan(5_000);
    } finally {
      STORAGE_TIMEOUT_MS.request = before;
      silent.close();
    }
  });

  it('when the caller’s signal aborts (the client went away), then the call stops at once', async () => {
    const silent = net.createServer(() => {});
    await new Promise<void>((r) => silent.listen(0, '127.0.0.1', r));
    const port = (silent.address() as net.AddressInfo).port;
    const hung = createStorage({
      endpoint: `http://127.0.0.1:${port}`,
      bucket: 'b',
      region: 'us-east-1',
      accessKeyId: 'k',
      secretAccessKey: 's',
    });
    try {
      const start = Date.now();
      await expect(
        hung.putObject('x', Buffer.from('abc'), 'text/plain', 3, { signal: AbortSignal.timeout(200) }),
      ).rejects.toThrow();
      expect(Date.now() - start).toBeLessThan(5_000);
    } finally {
      silent.close();
    }
  });
});

import { promisify } from 'node:util';
import { brotliCompress, constants, gzip } from 'node:zlib';
import type { Request, Response } from 'express';

const brotli = promisify(brotliCompress);
const gzipAsync = promisify(gzip);

type Entry = {
  version: number;
  body: Buffer;
  etag: string;
  bytes: number;
  br?: Promise<Buffer>;
  gzip?: Promise<Buffer>;
  /** Counts a compressed copy kept with the entry against the cache's byte cap. */
  account: (bytes: number) => void;
};

/**
 * A thin memo around the list builder of a photo's findings: one entry per photo and visibility variant
 * (the reader's role, so an owner's list and a technician's never share an entry), valid while the
 * photo's `findings_version` is unchanged. Database triggers bump that version on every write that
 * changes the list (findings, comments, sharing), so a stale entry is never served, on any instance.
 * Least recently used entries are dropped beyond `maxBytes`, counting the JSON and its compressed copies.
 */
export function findingsListCache(maxBytes = 32 * 1024 * 1024) {
  const entries = new Map<string, Entry>();
  let total = 0;
  const drop = (key: string) => {
    const old = entries.get(key);
    if (old) total -= old.bytes;
    entries.delete(key);
  };
  const trim = (keep: string) => {
    for (const oldest of entries.keys()) {
      if (total <= maxBytes || oldest === keep) break;
      drop(oldest);
    }
  };

  return {
    /** The list for (photo, variant) at `version`, built by `build` when not held (errors are not kept). */
    async read(photoId: number, variant: string, version: number, build: () => Promise<string>): Promise<Entry> {
      const key = `${photoId}:${variant}`;
      const held = entries.get(key);
      if (held && held.version === version) {
        entries.delete(key);
        entries.set(key, held); // most recently used goes last
        return held;
      }
      const body = Buffer.from(await build());
      const entry: Entry = {
        version,
        body,
        etag: `W/"f${photoId}.${version}.${variant}"`,
        bytes: body.length,
        account: (bytes) => {
          if (entries.get(key) !== entry) return; // dropped meanwhile: nothing held
          entry.bytes += bytes;
          total += bytes;
          trim(key);
        },
      };
      drop(key);
      entries.set(key, entry);
      total += entry.bytes;
      trim(key);
      return entry;
    },
    get size() {
      return entries.size;
    },
    /** Bytes held: every entry's JSON and compressed copies. */
    get bytes() {
      return total;
    },
  };
}

/**
 * Sends a cached list: 304 when the client holds this version, else the JSON, compressed once per entry
 * (brotli or gzip as the client accepts) rather than on every request.
 */
export async function sendCachedList(req: Request, res: Response, entry: Entry): Promise<void> {
  res.setHeader('ETag', entry.etag);
  res.setHeader('Cache-Control', 'private, no-cache');
  res.vary('Accept-Encoding');
  if (req.fresh) {
    res.status(304).end();
    return;
  }
  res.type('application/json');
  const encoding = entry.bytes >= 1024 ? req.acceptsEncodings('br', 'gzip', 'identity') : 'identity';
  if (encoding === 'br' || encoding === 'gzip') {
    const fresh = encoding === 'br' ? !entry.br : !entry.gzip;
    const packed =
      encoding === 'br'
        ? (entry.br ??= brotli(entry.body, { params: { [constants.BROTLI_PARAM_QUALITY]: 5 } }))
        : (entry.gzip ??= gzipAsync(entry.body, { level: 6 }));
    if (fresh)
      void packed.then(
        (b) => entry.account(b.length),
        () => undefined,
      );
    res.setHeader('Content-Encoding', encoding);
    res.send(await packed);
    return;
  }
  res.send(entry.body);
}

import { existsSync, readdirSync, statSync } from 'node:fs';
import path from 'node:path';
import type { RequestHandler } from 'express';

const ENCODINGS = [
  { name: 'br', suffix: '.br' },
  { name: 'gzip', suffix: '.gz' },
] as const;

function listFiles(dir: string, prefix = ''): string[] {
  if (!existsSync(dir)) return [];
  return readdirSync(dir).flatMap((name) => {
    const full = path.join(dir, name);
    return statSync(full).isDirectory() ? listFiles(full, `${prefix}/${name}`) : [`${prefix}/${name}`];
  });
}

/**
 * Content negotiation for the build's precompressed files: a request for `/assets/x.js` from a browser
 * that accepts brotli gets `x.js.br` with `Content-Encoding: br` (or `.gz` for gzip), otherwise it falls
 * through to the plain file. The set of files is read once, at start-up, from the build folder.
 */
export function servePrecompressed(dist: string, cache: (urlPath: string) => string): RequestHandler {
  const files = new Set(listFiles(dist));
  return (req, res, next) => {
    if (req.method !== 'GET' && req.method !== 'HEAD') return next();
    const urlPath = req.path;
    if (!files.has(urlPath)) return next();
    const available = ENCODINGS.filter((e) => files.has(urlPath + e.suffix));
    if (available.length === 0) return next();
    res.vary('Accept-Encoding');
    const chosen = req.acceptsEncodings(...available.map((e) => e.name), 'identity');
    const encoding = available.find((e) => e.name === chosen);
    if (!encoding) return next();
    res.type(path.extname(urlPath));
    res.setHeader('Content-Encoding', encoding.name);
    res.setHeader('Cache-Control', cache(urlPath));
    res.sendFile(path.join(dist, urlPath + encoding.suffix), { cacheControl: false }, (err) => err && next(err));
  };
}

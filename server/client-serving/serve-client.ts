import type { Server } from 'node:http';
import path from 'node:path';
import express, { type Express } from 'express';
import { servePrecompressed } from './serve-precompressed';

const YEAR = 'public, max-age=31536000, immutable';

/**
 * Serves the built client: hashed assets cached for a year (brotli or gzip when the browser accepts it,
 * precompressed at build), every other path gets index.html. Source maps stay in the build folder and
 * are never served.
 */
export function serveBuiltClient(app: Express, dist: string): void {
  const indexHtml = path.join(dist, 'index.html');
  app.use((req, res, next) => (req.path.endsWith('.map') ? res.status(404).end() : next()));
  app.use(servePrecompressed(dist, (p) => (p.startsWith('/assets/') ? YEAR : 'no-cache')));
  app.use('/assets', express.static(path.join(dist, 'assets'), { maxAge: '1y', immutable: true, fallthrough: false }));
  app.use(express.static(dist, { index: false }));
  const compressedIndex = servePrecompressed(dist, () => 'no-cache');
  app.get('/{*splat}', (req, res, next) => {
    req.url = '/index.html';
    compressedIndex(req, res, () => res.sendFile(indexHtml, (err) => err && next(err)));
  });
}

/** Development: Vite in middleware mode with hot reload over the same HTTP server. */
export async function serveViteDev(app: Express, server: Server, root: string): Promise<() => Promise<void>> {
  const { createServer } = await import('vite');
  const vite = await createServer({ root, appType: 'spa', server: { middlewareMode: true, ws: { server } } });
  app.use(vite.middlewares);
  return () => vite.close();
}

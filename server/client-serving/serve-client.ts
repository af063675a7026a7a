import type { Server } from 'node:http';
import path from 'node:path';
import express, { type Express } from 'express';

/** Serves the built client: hashed assets cached for a year, every other path gets index.html. */
export function serveBuiltClient(app: Express, dist: string): void {
  app.use('/assets', express.static(path.join(dist, 'assets'), { maxAge: '1y', immutable: true, fallthrough: false }));
  app.use(express.static(dist, { index: false }));
  app.get('/{*splat}', (_req, res) => res.sendFile(path.join(dist, 'index.html')));
}

/** Development: Vite in middleware mode with hot reload over the same HTTP server. */
export async function serveViteDev(app: Express, server: Server, root: string): Promise<() => Promise<void>> {
  const { createServer } = await import('vite');
  const vite = await createServer({ root, appType: 'spa', server: { middlewareMode: true, ws: { server } } });
  app.use(vite.middlewares);
  return () => vite.close();
}

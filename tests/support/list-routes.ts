import type { Express } from 'express';

interface Layer {
  route?: { path: string; methods: Record<string, boolean> };
  handle?: { stack?: Layer[] };
}

/**
 * Every API route the app registers, as "METHOD /api/path". The app mounts exactly one router at /api
 * and the feature routers inside it without a prefix, so the walk adds /api to what it finds below.
 */
export function listApiRoutes(app: Express): string[] {
  const found: string[] = [];
  const walk = (stack: Layer[], prefix: string) => {
    for (const layer of stack) {
      if (layer.route)
        for (const method of Object.keys(layer.route.methods))
          found.push(`${method.toUpperCase()} ${prefix}${layer.route.path}`);
      else if (layer.handle?.stack) walk(layer.handle.stack, prefix || '/api');
    }
  };
  walk((app as unknown as { router: { stack: Layer[] } }).router.stack, '');
  return [...new Set(found)].sort();
}

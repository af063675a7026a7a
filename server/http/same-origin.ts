import type { RequestHandler } from 'express';
import { HttpError } from './errors';

const SAFE = new Set(['GET', 'HEAD', 'OPTIONS']);

/**
 * Cookie-authenticated writes are accepted only from the app's own public origin (PRODUCT.md);
 * with SameSite=Lax cookies this closes cross-site request forgery. Clients without cookies are unaffected.
 */
export function requireSameOrigin(publicOrigin: string): RequestHandler {
  return (req, _res, next) => {
    if (SAFE.has(req.method) || !req.headers.cookie) return next();
    if (req.headers.origin === publicOrigin) return next();
    throw new HttpError(
      403,
      'bad_origin',
      `Writes must come from ${publicOrigin}; send an Origin header with that value.`,
    );
  };
}

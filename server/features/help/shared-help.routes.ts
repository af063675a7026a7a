import { Router, type RequestHandler, type Response } from 'express';
import { helpReplyInputSchema, helpTokenParamsSchema } from '../../../shared/schemas/help';
import type { AppDeps } from '../../app-deps';
import { input, validate } from '../../http/validate';
import { sharedHelpService } from './shared-help.service';

const read = { params: helpTokenParamsSchema };
const reply = { params: helpTokenParamsSchema, body: helpReplyInputSchema };

/** Every answer about a link (the API and the page itself) is kept out of search engines, caches and referrers. */
function private_(res: Response) {
  res.set('X-Robots-Tag', 'noindex, nofollow, noarchive');
  res.set('Cache-Control', 'no-store');
  res.set('Referrer-Policy', 'no-referrer');
}

/** For the page at /shared/help/:token, whichever way the client is served. */
export const privateSharedPage: RequestHandler = (_req, res, next) => {
  private_(res);
  next();
};

/** The read-only link to a help request: no session, the token is the only key. */
export function sharedHelpRoutes(deps: AppDeps): Router {
  const shared = sharedHelpService(deps);
  const router = Router();
  router.use('/shared/help', (_req, res, next) => {
    private_(res);
    next();
  });
  router.get('/shared/help/:token', validate(read), async (_req, res) => {
    res.json(await shared.read(input(res, read).params.token));
  });
  router.post('/shared/help/:token/replies', validate(reply), async (req, res) => {
    const { params, body } = input(res, reply);
    res.status(202).json(await shared.reply(params.token, body, req.ip ?? 'unknown'));
  });
  return router;
}

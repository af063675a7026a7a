import { desc } from 'drizzle-orm';
import { Router } from 'express';
import { z } from 'zod';
import type { CapturedMail } from '../../../shared/schemas/dev-mail';
import type { AppDeps } from '../../app-deps';
import { devMails } from '../../db/schema';
import { NotFoundError } from '../../http/errors';
import { isLoopbackRequest } from '../../http/loopback';
import { input, validate } from '../../http/validate';

const list = { query: z.object({ limit: z.coerce.number().int().min(1).max(500).default(100) }) };

/**
 * GET /api/dev/mail: what the local SMTP capture caught, newest first. Never mounted in production, and
 * answered only on this machine: captured mail holds sign-in links for every account.
 */
export function devMailRoutes(deps: AppDeps): Router {
  const router = Router();
  router.get('/dev/mail', (req, _res, next) => {
    if (!isLoopbackRequest(req)) throw new NotFoundError('Captured mail is readable only on the machine running Gridleak.');
    next();
  }, validate(list), async (_req, res) => {
    const rows = await deps.db.select().from(devMails).orderBy(desc(devMails.id)).limit(input(res, list).query.limit);
    const mails: CapturedMail[] = rows.map((m) => ({
      to: m.to,
      from: m.from,
      subject: m.subject,
      text: m.text,
      html: m.html,
      date: m.receivedAt.toISOString(),
    }));
    res.json(mails);
  });
  return router;
}

import { and, asc, eq, inArray, isNull, ne, or } from 'drizzle-orm';
import { Router } from 'express';
import { z } from 'zod';
import type { OpenQuestion } from '../../../shared/schemas/findings';
import { pageQuerySchema } from '../../../shared/schemas/pagination';
import type { AppDeps } from '../../app-deps';
import { findings, memberships, restorations } from '../../db/schema';
import { requireUser } from '../../http/guard';
import { decodeCursor, sendPage } from '../../http/pagination';
import { input, validate } from '../../http/validate';
import { notificationsService } from './notifications.service';
import { bodyIdSchema } from '../../../shared/schemas/ids';

const paged = { query: pageQuerySchema };
const read = { body: z.object({ ids: z.array(bodyIdSchema).max(500).optional() }) };

/** The signed-in person's unread items and the open questions waiting on their bench. */
export function notificationsRoutes(deps: AppDeps): Router {
  const service = notificationsService(deps);
  const router = Router();
  // Newest first, in pages (see shared/schemas/pagination.ts).
  router.get('/notifications', requireUser, validate(paged), async (req, res) => {
    const { query } = input(res, paged);
    const cursor = decodeCursor(query.cursor, ['number']);
    const items = await service.listFor(req.user!.id, query.limit + 1, cursor?.[0] as number | undefined);
    await sendPage(req, res, items, query.limit, (n) => [n.id], (page) => page);
  });
  router.post('/notifications/read', requireUser, validate(read), async (req, res) => {
    await service.markRead(req.user!.id, input(res, read).body.ids);
    res.status(204).end();
  });
  router.get('/questions', requireUser, async (req, res) => {
    const rows = await deps.db
      .select({ f: findings, make: restorations.make, model: restorations.model })
      .from(findings)
      .innerJoin(restorations, eq(restorations.id, findings.restorationId))
      .innerJoin(memberships, and(eq(memberships.restorationId, findings.restorationId), eq(memberships.userId, req.user!.id)))
      .where(and(eq(findings.questionOpen, true), inArray(memberships.role, ['technician', 'mentor']),
        // A question waits for the others on the set, not for the person who asked it.
        or(isNull(findings.questionAskedById), ne(findings.questionAskedById, req.user!.id))))
      .orderBy(asc(findings.questionAskedAt));
    const questions: OpenQuestion[] = rows.map(({ f, make, model }) => ({
      findingId: f.id, photoId: f.photoId, restorationId: f.restorationId, set: `${make} ${model}`, number: f.number,
      title: f.title, componentRef: f.componentRef, askedAt: (f.questionAskedAt ?? f.updatedAt).toISOString(),
    }));
    res.json(questions);
  });
  return router;
}

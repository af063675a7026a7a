import { Router } from 'express';
import {
  readingAnswerInputSchema,
  readingRequestInputSchema,
  readingRequestParamsSchema,
} from '../../../shared/schemas/reading-requests';
import { idParamsSchema } from '../../../shared/schemas/restorations';
import type { AppDeps } from '../../app-deps';
import { guarded, requireUser, roleOf } from '../../http/guard';
import { input } from '../../http/validate';
import { readingRequestsService } from './reading-requests.service';

const list = { params: idParamsSchema };
const create = { params: idParamsSchema, body: readingRequestInputSchema };
const answer = { params: readingRequestParamsSchema, body: readingAnswerInputSchema };

/** Requests for readings: mentors (and technicians) ask, a technician answers; owners never see them. */
export function readingRequestsRoutes(deps: AppDeps): Router {
  const { db } = deps;
  const requests = readingRequestsService(deps);
  const actor = (req: { user?: { id: number; name: string } }, res: Parameters<typeof roleOf>[0]) => ({
    id: req.user!.id,
    name: req.user!.name,
    role: roleOf(res),
  });
  const router = Router();
  router.get('/restorations/:id/reading-requests', ...guarded(db, list, 'help.view'), async (_req, res) => {
    res.json(await requests.list(input(res, list).params.id, roleOf(res)));
  });
  router.post('/restorations/:id/reading-requests', ...guarded(db, create, 'help.view'), async (req, res) => {
    const { params, body } = input(res, create);
    res.status(201).json(await requests.create(params.id, body, actor(req, res)));
  });
  // The bench: open tasks and recent answers on every set where the person is a technician or mentor.
  router.get('/reading-requests', requireUser, async (req, res) => {
    res.json(await requests.bench(req.user!.id));
  });
  router.post(
    '/reading-requests/:readingRequestId/answer',
    ...guarded(db, answer, 'help.ask', (_req, res) =>
      requests.restorationOf(input(res, answer).params.readingRequestId),
    ),
    async (req, res) => {
      const { params, body } = input(res, answer);
      res.json(await requests.answer(params.readingRequestId, body, actor(req, res)));
    },
  );
  return router;
}

import { Router } from 'express';
import { idParamsSchema } from '../../../shared/schemas/restorations';
import type { AppDeps } from '../../app-deps';
import { NotFoundError } from '../../http/errors';
import { guarded } from '../../http/guard';
import { input } from '../../http/validate';
import { reportData } from './report.repo';
import { renderReport } from './report-pdf';

const one = { params: idParamsSchema };
const fileName = (make: string, model: string) =>
  `${`${make}-${model}`.replace(/[^\w]+/g, '-').toLowerCase()}-hand-back-report.pdf`;

/** The owner's report as a PDF with its file name and page count. */
export async function buildReport(deps: Pick<AppDeps, 'db' | 'storage' | 'config'>, id: number) {
  const data = await reportData(deps, id);
  if (!data) throw new NotFoundError();
  const { pdf, pageCount } = await renderReport(data);
  return { pdf, pageCount, name: fileName(data.set.make, data.set.model), set: data.set };
}

/** The hand-back report: the owner's document (only what is shared with them), for every member to download. Sending is in the safety feature. */
export function reportRoutes(deps: AppDeps): Router {
  const router = Router();
  router.get('/restorations/:id/report.pdf', ...guarded(deps.db, one, 'report.download'), async (_req, res) => {
    const { pdf, name } = await buildReport(deps, input(res, one).params.id);
    res.type('application/pdf').attachment(name).send(pdf);
  });
  return router;
}

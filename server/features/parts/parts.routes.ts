import { Router, type Request, type Response } from 'express';
import { can } from '../../../shared/permissions';
import { pageQuerySchema } from '../../../shared/schemas/pagination';
import { partInputSchema, partPatchSchema, partsCsvQuerySchema } from '../../../shared/schemas/parts';
import { idParamsSchema } from '../../../shared/schemas/restorations';
import type { AppDeps } from '../../app-deps';
import { guarded, roleOf } from '../../http/guard';
import { decodeCursor, sendPage } from '../../http/pagination';
import { input } from '../../http/validate';
import { readWorkshopSettings } from '../workshop/workshop-settings';
import { partsCsv } from './parts-csv';
import { partsService, toPart } from './parts.service';

const one = { params: idParamsSchema };
const csv = { params: idParamsSchema, query: partsCsvQuerySchema };
const paged = { params: idParamsSchema, query: pageQuerySchema };
const create = { params: idParamsSchema, body: partInputSchema };
const patch = { params: idParamsSchema, body: partPatchSchema };

/** The parts ledger: everyone on the restoration reads it (owners without costs); technicians keep it. */
export function partsRoutes({ db }: AppDeps): Router {
  const service = partsService(db);
  const ofPart = (_req: Request, res: Response) => service.restorationOf(input(res, one).params.id);
  const router = Router();
  // The ledger in pages (see shared/schemas/pagination.ts), as this role may see it; the CSV below stays whole.
  router.get('/restorations/:id/parts', ...guarded(db, paged, 'parts.view'), async (req, res) => {
    const { params, query } = input(res, paged);
    const cursor = decodeCursor(query.cursor, ['string', 'number']);
    const rows = await service.page(
      params.id,
      roleOf(res),
      query.limit + 1,
      cursor && { componentRef: cursor[0] as string, id: cursor[1] as number },
    );
    await sendPage(
      req,
      res,
      rows,
      query.limit,
      (p) => [p.componentRef, p.id],
      (page) => page.map((p) => toPart(p, roleOf(res))),
    );
  });
  router.get('/restorations/:id/parts.csv', ...guarded(db, csv, 'parts.view'), async (_req, res) => {
    const { params, query } = input(res, csv);
    const lines = (await service.forExport(params.id, roleOf(res))).map(({ row, finding }) => ({
      part: toPart(row, roleOf(res)),
      finding,
    }));
    // Costs in the workshop's currency; `?currency=` still overrides it for a reader who asks. Mentors see no money,
    // so their export has no cost column at all (owners keep it, blank, as the ledger they read has no costs).
    const currency = query.currency ?? (await readWorkshopSettings(db)).currency;
    const reader = { costs: can(roleOf(res), 'money.view') };
    res
      .type('text/csv; charset=utf-8')
      .attachment(`restoration-${params.id}-parts.csv`)
      .send(partsCsv(lines, { ...query, currency }, reader));
  });
  router.post('/restorations/:id/parts', ...guarded(db, create, 'parts.edit'), async (req, res) => {
    const { params, body } = input(res, create);
    res.status(201).json(toPart(await service.create(params.id, body, req.user!.id), roleOf(res)));
  });
  router.patch('/parts/:id', ...guarded(db, patch, 'parts.edit', ofPart), async (req, res) => {
    const { params, body } = input(res, patch);
    res.json(toPart(await service.update(params.id, body, req.user!.id), roleOf(res)));
  });
  router.delete('/parts/:id', ...guarded(db, one, 'parts.edit', ofPart), async (_req, res) => {
    await service.remove(input(res, one).params.id);
    res.status(204).end();
  });
  return router;
}

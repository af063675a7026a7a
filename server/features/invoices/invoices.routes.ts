import { Router, type Request, type Response } from 'express';
import { depositInputSchema, invoiceParamsSchema, voidInputSchema } from '../../../shared/schemas/invoices';
import { idParamsSchema } from '../../../shared/schemas/restorations';
import type { AppDeps } from '../../app-deps';
import { guard, requireUser } from '../../http/guard';
import { input, validate } from '../../http/validate';
import { invoicesService } from './invoices.service';

const one = { params: idParamsSchema };
const deposit = { params: idParamsSchema, body: depositInputSchema };
const voiding = { params: invoiceParamsSchema, body: voidInputSchema };

/** Deposits, invoices and credit notes: technicians issue and void; the owner reads their own; mentors see none. */
export function invoicesRoutes({ db }: AppDeps): Router {
  const service = invoicesService(db);
  const ofInvoice = (_req: Request, res: Response) => service.restorationOf(input(res, voiding).params.invoiceId);
  const router = Router();
  router.get('/restorations/:id/invoices', requireUser, validate(one), guard(db, 'money.view'), async (_req, res) => {
    res.json(await service.list(input(res, one).params.id));
  });
  router.post('/restorations/:id/deposits', requireUser, validate(deposit), guard(db, 'money.edit'), async (req, res) => {
    const { params, body } = input(res, deposit);
    res.status(201).json(await service.deposit(params.id, body, req.user!.id));
  });
  router.post('/restorations/:id/invoices', requireUser, validate(one), guard(db, 'money.edit'), async (req, res) => {
    res.status(201).json(await service.final(input(res, one).params.id, req.user!.id));
  });
  router.post('/invoices/:invoiceId/void', requireUser, validate(voiding), guard(db, 'money.edit', ofInvoice), async (req, res) => {
    const { params, body } = input(res, voiding);
    res.json(await service.void(params.invoiceId, body.reason, req.user!.id));
  });
  return router;
}

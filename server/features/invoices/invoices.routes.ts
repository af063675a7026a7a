import { Router, type Request, type Response } from 'express';
import {
  depositInputSchema,
  documentQuerySchema,
  invoiceParamsSchema,
  voidInputSchema,
} from '../../../shared/schemas/invoices';
import { idParamsSchema } from '../../../shared/schemas/restorations';
import type { AppDeps } from '../../app-deps';
import { ConflictError, NotFoundError } from '../../http/errors';
import { guarded } from '../../http/guard';
import { input } from '../../http/validate';
import { readWorkshopSettings } from '../workshop/workshop-settings';
import { invoiceDocument } from './invoice-document';
import { documentTitle, renderInvoice, type DocumentKind } from './invoice-pdf';
import { invoicesService } from './invoices.service';

const one = { params: idParamsSchema };
const deposit = { params: idParamsSchema, body: depositInputSchema };
const voiding = { params: invoiceParamsSchema, body: voidInputSchema };
const document = { params: invoiceParamsSchema, query: documentQuerySchema };

/** Deposits, invoices and credit notes: technicians issue and void; the owner reads their own; mentors see none. */
export function invoicesRoutes(deps: AppDeps): Router {
  const { db } = deps;
  const service = invoicesService(deps);
  const ofInvoice = (_req: Request, res: Response) => service.restorationOf(input(res, voiding).params.invoiceId);
  const router = Router();
  router.get('/restorations/:id/invoices', ...guarded(db, one, 'money.view'), async (_req, res) => {
    res.json(await service.list(input(res, one).params.id));
  });
  router.get('/restorations/:id/invoices/preview', ...guarded(db, one, 'money.edit'), async (_req, res) => {
    res.json(await service.preview(input(res, one).params.id));
  });
  router.post('/restorations/:id/deposits', ...guarded(db, deposit, 'money.edit'), async (req, res) => {
    const { params, body } = input(res, deposit);
    res.status(201).json(await service.deposit(params.id, body, req.user!.id));
  });
  router.post('/restorations/:id/invoices', ...guarded(db, one, 'money.edit'), async (req, res) => {
    res.status(201).json(await service.final(input(res, one).params.id, req.user!.id));
  });
  router.post('/invoices/:invoiceId/void', ...guarded(db, voiding, 'money.edit', ofInvoice), async (req, res) => {
    const { params, body } = input(res, voiding);
    res.json(await service.void(params.invoiceId, body.reason, req.user!.id));
  });
  // The PDFs: for the set's technicians and its owners (an owner reaches only their own sets); mentors see no money.
  const pdf = (kind: DocumentKind) => async (_req: Request, res: Response) => {
    const { params, query } = input(res, document);
    const d = await invoiceDocument(db, params.invoiceId);
    if (!d) throw new NotFoundError();
    if (kind === 'receipt' && d.invoice.paid <= 0 && d.invoice.refunded <= 0)
      throw new ConflictError(`Nothing has been paid against ${d.reference} yet, so there is no receipt.`);
    const timeZone = query.timeZone ?? (await readWorkshopSettings(db)).timeZone;
    const title = documentTitle(d, kind);
    res
      .type('application/pdf')
      .attachment(`${title.replace(/[^\w]+/g, '-').toLowerCase()}.pdf`)
      .send(await renderInvoice(d, kind, timeZone));
  };
  router.get('/invoices/:invoiceId/invoice.pdf', ...guarded(db, document, 'money.view', ofInvoice), pdf('invoice'));
  router.get('/invoices/:invoiceId/receipt.pdf', ...guarded(db, document, 'money.view', ofInvoice), pdf('receipt'));
  return router;
}

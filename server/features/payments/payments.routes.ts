import express, { Router, type Request, type Response } from 'express';
import { invoiceParamsSchema } from '../../../shared/schemas/invoices';
import { manualPaymentInputSchema, paymentParamsSchema, refundInputSchema } from '../../../shared/schemas/payments';
import { idParamsSchema } from '../../../shared/schemas/restorations';
import type { AppDeps } from '../../app-deps';
import { BadRequestError } from '../../http/errors';
import { guarded, roleOf } from '../../http/guard';
import { input } from '../../http/validate';
import { applyPaymentEvent } from './payment-webhook';
import { paymentsService } from './payments.service';

const one = { params: idParamsSchema };
const ofInvoiceId = { params: invoiceParamsSchema };
const manual = { params: invoiceParamsSchema, body: manualPaymentInputSchema };
const refund = { params: paymentParamsSchema, body: refundInputSchema };

/**
 * The payment service's events: the raw body (the signature covers its exact bytes), checked by the SDK; a bad
 * signature is 400 and changes nothing. Mounted before the JSON parser, with no session or same-origin check.
 */
export function paymentWebhookRoute({ db, payments }: AppDeps): Router {
  const router = Router();
  router.post('/payments/webhook', express.raw({ type: () => true, limit: '1mb' }), async (req, res) => {
    const signature = req.headers['stripe-signature'];
    let event;
    try {
      if (!Buffer.isBuffer(req.body) || typeof signature !== 'string') throw new Error('missing');
      event = payments.sdk.webhooks.constructEvent(req.body, signature, payments.webhookSecret);
    } catch {
      throw new BadRequestError('The event’s signature does not verify.');
    }
    const applied = await applyPaymentEvent(db, event);
    res.json({ received: true, applied });
  });
  return router;
}

/** Checkout, payments recorded by hand, refunds and the list of payment lines. Mentors see no money. */
export function paymentsRoutes(deps: AppDeps): Router {
  const { db } = deps;
  const service = paymentsService(deps);
  const ofInvoice = (_req: Request, res: Response) =>
    service.restorationOfInvoice(input(res, ofInvoiceId).params.invoiceId);
  const ofPayment = (_req: Request, res: Response) => service.restorationOfPayment(input(res, refund).params.paymentId);
  const router = Router();
  router.get('/restorations/:id/payments', ...guarded(db, one, 'money.view'), async (_req, res) => {
    res.json(await service.list(input(res, one).params.id, roleOf(res)));
  });
  router.post(
    '/invoices/:invoiceId/checkout',
    ...guarded(db, ofInvoiceId, 'payments.checkout', ofInvoice),
    async (_req, res) => {
      res.json(await service.checkout(input(res, ofInvoiceId).params.invoiceId, roleOf(res)));
    },
  );
  router.post(
    '/invoices/:invoiceId/payments',
    ...guarded(db, manual, 'payments.record', ofInvoice),
    async (req, res) => {
      const { params, body } = input(res, manual);
      res.status(201).json(await service.record(params.invoiceId, body, req.user!.id, roleOf(res)));
    },
  );
  router.post('/payments/:paymentId/refund', ...guarded(db, refund, 'payments.record', ofPayment), async (req, res) => {
    const { params, body } = input(res, refund);
    const answer = await service.refund(params.paymentId, body, req.user!.id, roleOf(res));
    res.status(answer.status).json(answer.body);
  });
  return router;
}

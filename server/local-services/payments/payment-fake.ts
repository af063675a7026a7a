import { randomBytes } from 'node:crypto';
import type { AddressInfo } from 'node:net';
import express, { type ErrorRequestHandler, type RequestHandler } from 'express';
import { checkoutPage } from './checkout-page';
import { webhookSender } from './fake-webhooks';
import { FakeApiError, fakeState, type FakeSession } from './payment-fake-state';

/** The API version the fake answers as: the one the installed SDK sends. */
const API_VERSION = '2026-10-28.endive';

export interface PaymentFakeOptions {
  /** 0 picks a free port. */
  port: number;
  /** Where events are posted (the app's /api/payments/webhook); can be set later. */
  webhookUrl?: string;
}

/**
 * A local stand-in for the hosted payment service, on loopback: exactly the calls Gridleak makes through the
 * official SDK (create and retrieve a checkout session, create a refund), a checkout page with Pay, Decline and
 * Cancel, and events signed as the real service signs them. It makes a secret key and a signing secret of its
 * own at each start and refuses any other key.
 */
export async function startPaymentFake(options: PaymentFakeOptions) {
  const secretKey = `sk_test_local_${randomBytes(18).toString('hex')}`;
  const webhookSecret = `whsec_local_${randomBytes(18).toString('hex')}`;
  let origin = '';
  const state = fakeState(() => origin);
  const hooks = webhookSender(webhookSecret, API_VERSION);
  hooks.setUrl(options.webhookUrl);
  // Idempotency keys, per path, as the service keeps them: a retried POST gets the first answer.
  const replies = new Map<string, unknown>();

  const app = express();
  app.disable('x-powered-by');
  app.use(express.urlencoded({ extended: true, limit: '100kb' }));

  const api = express.Router();
  const auth: RequestHandler = (req, _res, next) => {
    if (req.headers.authorization !== `Bearer ${secretKey}`)
      throw new FakeApiError(401, 'Invalid API Key provided.', undefined, 'authentication_error');
    next();
  };
  const once =
    (make: (body: Record<string, never>) => unknown): RequestHandler =>
    (req, res) => {
      const key = req.headers['idempotency-key'];
      const cacheKey = typeof key === 'string' ? `${req.path} ${key}` : undefined;
      const reply = cacheKey && replies.has(cacheKey) ? replies.get(cacheKey) : make(req.body ?? {});
      if (cacheKey) replies.set(cacheKey, reply);
      res.json(reply);
    };
  api.use(auth);
  api.post(
    '/checkout/sessions',
    once((body) => state.create(body)),
  );
  api.get('/checkout/sessions/:id', (req, res) => void res.json(state.get(req.params.id as string)));
  api.post(
    '/refunds',
    once((body) => {
      const { refund, charge } = state.refund(body);
      hooks.emit('refund.created', refund);
      hooks.emit('charge.refunded', charge);
      return refund;
    }),
  );
  app.use('/v1', api);

  // Browsers ask for an icon; an empty answer keeps their console quiet.
  app.get('/favicon.ico', (_req, res) => void res.status(204).end());
  const page = (s: FakeSession, notice = '') => checkoutPage(s, notice);
  app.get('/checkout/:id', (req, res) => void res.type('html').send(page(state.get(req.params.id))));
  const outcome =
    (paid: boolean): RequestHandler =>
    (req, res) => {
      const s = state.get(req.params.id as string);
      if (s.status !== 'open')
        return void res.status(409).type('html').send(page(s, 'This checkout is already finished.'));
      state.complete(s, paid);
      hooks.emit('checkout.session.completed', s);
      // A decline arrives after checkout, as a delayed payment method's failure does.
      if (!paid) hooks.emit('checkout.session.async_payment_failed', s);
      res.redirect(303, s.success_url.replace('{CHECKOUT_SESSION_ID}', s.id));
    };
  app.post('/checkout/:id/pay', outcome(true));
  app.post('/checkout/:id/decline', outcome(false));
  app.post('/checkout/:id/cancel', (req, res) => {
    const s = state.get(req.params.id);
    res.redirect(303, s.cancel_url ?? s.success_url);
  });
  const errors: ErrorRequestHandler = (err, req, res, _next) => {
    const e =
      err instanceof FakeApiError
        ? err
        : new FakeApiError(500, 'The local payment fake failed.', undefined, 'api_error');
    if (req.path.startsWith('/v1'))
      res
        .status(e.status)
        .json({ error: { type: e.type, message: e.message, ...(e.param ? { param: e.param } : {}) } });
    else res.status(e.status).type('text').send(e.message);
  };
  app.use(errors);

  const server = app.listen(options.port, '127.0.0.1');
  await new Promise<void>((resolve, reject) => server.once('listening', resolve).once('error', reject));
  const port = (server.address() as AddressInfo).port;
  origin = `http://127.0.0.1:${port}`;
  return {
    secretKey,
    webhookSecret,
    /** Where the SDK is pointed: its `host`, `port` and `protocol` options. */
    api: { host: '127.0.0.1', port, protocol: 'http' as const },
    origin,
    sessions: state.sessions,
    /** Every event sent, in order. */
    sent: hooks.sent,
    setWebhookUrl: hooks.setUrl,
    /** Resolves once every event so far has been delivered (or given up on). */
    settled: hooks.settled,
    post: hooks.post,
    close: () =>
      new Promise<void>((resolve) => {
        server.closeAllConnections();
        server.close(() => resolve());
      }),
  };
}

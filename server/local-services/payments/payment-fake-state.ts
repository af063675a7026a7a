import { fakeId } from './fake-webhooks';

/** A checkout session as the payment service returns it (the fields Gridleak reads, and a few more). */
export interface FakeSession {
  id: string;
  object: 'checkout.session';
  mode: 'payment';
  status: 'open' | 'complete' | 'expired';
  payment_status: 'unpaid' | 'paid';
  amount_total: number;
  currency: string;
  line_name: string;
  client_reference_id: string | null;
  metadata: Record<string, string>;
  payment_intent: string | null;
  success_url: string;
  cancel_url: string | null;
  url: string | null;
  created: number;
  livemode: false;
}

export interface FakeRefund {
  id: string;
  object: 'refund';
  amount: number;
  currency: string;
  payment_intent: string;
  charge: string;
  status: 'succeeded';
  metadata: Record<string, string>;
  created: number;
}

interface LineItem {
  quantity?: string;
  price_data?: { currency?: string; unit_amount?: string; product_data?: { name?: string } };
}
export interface SessionParams {
  mode?: string;
  success_url?: string;
  cancel_url?: string;
  client_reference_id?: string;
  metadata?: Record<string, string>;
  line_items?: LineItem[] | Record<string, LineItem>;
}

/** A request the real service would refuse, with its error type and the parameter at fault. */
export class FakeApiError extends Error {
  constructor(
    readonly status: number,
    message: string,
    readonly param?: string,
    readonly type = 'invalid_request_error',
  ) {
    super(message);
  }
}

const now = () => Math.floor(Date.now() / 1000);

/** The sessions, charges and refunds the fake holds in memory. */
export function fakeState(origin: () => string) {
  const sessions = new Map<string, FakeSession>();
  const refunds = new Map<string, FakeRefund[]>();
  const charges = new Map<string, string>();

  return {
    sessions,
    create(p: SessionParams): FakeSession {
      if (p.mode !== 'payment')
        throw new FakeApiError(400, 'Only mode=payment is supported by the local fake.', 'mode');
      if (!p.success_url) throw new FakeApiError(400, 'Missing required param: success_url.', 'success_url');
      const lines = Object.values(p.line_items ?? {});
      if (!lines.length) throw new FakeApiError(400, 'Missing required param: line_items.', 'line_items');
      const currency = lines[0]!.price_data?.currency?.toLowerCase() ?? '';
      if (!/^[a-z]{3}$/.test(currency) || lines.some((l) => l.price_data?.currency?.toLowerCase() !== currency))
        throw new FakeApiError(400, 'Every line needs price_data[currency], and the same one.', 'line_items');
      const amount = lines.reduce((a, l) => a + Number(l.price_data?.unit_amount ?? NaN) * Number(l.quantity ?? 1), 0);
      if (!Number.isInteger(amount) || amount < 1)
        throw new FakeApiError(400, 'Invalid unit_amount or quantity.', 'line_items');
      const id = fakeId('cs');
      const session: FakeSession = {
        id,
        object: 'checkout.session',
        mode: 'payment',
        status: 'open',
        payment_status: 'unpaid',
        amount_total: amount,
        currency,
        line_name: lines.map((l) => l.price_data?.product_data?.name ?? 'Payment').join(', '),
        client_reference_id: p.client_reference_id ?? null,
        metadata: p.metadata ?? {},
        payment_intent: null,
        success_url: p.success_url,
        cancel_url: p.cancel_url ?? null,
        url: `${origin()}/checkout/${id}`,
        created: now(),
        livemode: false,
      };
      sessions.set(id, session);
      return session;
    },
    get(id: string): FakeSession {
      const s = sessions.get(id);
      if (!s) throw new FakeApiError(404, `No such checkout.session: '${id}'`, 'id');
      return s;
    },
    /** Completes an open session; a paid one gets its payment intent and charge. */
    complete(s: FakeSession, paid: boolean) {
      s.status = 'complete';
      s.payment_status = paid ? 'paid' : 'unpaid';
      s.payment_intent = fakeId('pi');
      s.url = null;
      if (paid) charges.set(s.payment_intent, fakeId('ch'));
    },
    refund(p: { payment_intent?: string; amount?: string; metadata?: Record<string, string> }) {
      const s = [...sessions.values()].find((x) => x.payment_intent && x.payment_intent === p.payment_intent);
      if (!s || s.payment_status !== 'paid')
        throw new FakeApiError(
          400,
          `No succeeded payment for payment_intent '${p.payment_intent ?? ''}'.`,
          'payment_intent',
        );
      const done = refunds.get(s.payment_intent!) ?? [];
      const left = s.amount_total - done.reduce((a, r) => a + r.amount, 0);
      const amount = p.amount === undefined ? left : Number(p.amount);
      if (!Number.isInteger(amount) || amount < 1 || amount > left)
        throw new FakeApiError(
          400,
          `Refund amount (${amount}) is greater than unrefunded amount on charge (${left}).`,
          'amount',
        );
      const refund: FakeRefund = {
        id: fakeId('re'),
        object: 'refund',
        amount,
        currency: s.currency,
        payment_intent: s.payment_intent!,
        charge: charges.get(s.payment_intent!)!,
        status: 'succeeded',
        metadata: p.metadata ?? {},
        created: now(),
      };
      refunds.set(s.payment_intent!, [...done, refund]);
      const all = [...done, refund];
      const refunded = all.reduce((a, r) => a + r.amount, 0);
      const charge = {
        id: refund.charge,
        object: 'charge',
        amount: s.amount_total,
        amount_refunded: refunded,
        currency: s.currency,
        payment_intent: s.payment_intent,
        paid: true,
        refunded: refunded === s.amount_total,
        status: 'succeeded',
        refunds: { object: 'list', data: all, has_more: false },
      };
      return { refund, charge };
    },
  };
}

import type { Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import { and, eq } from 'drizzle-orm';
import type { Agent } from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Invoice } from '../../shared/schemas/invoices';
import type { Payment } from '../../shared/schemas/payments';
import { events, notifications, paymentEvents, payments } from '../../server/db/schema';
import { signatureHeader } from '../../server/local-services/payments/webhook-signature';
import { writeWorkshopSettings } from '../../server/features/workshop/workshop-settings';
import { createRestoration } from '../factories/restorations';
import { createUser, signedIn } from '../factories/users';
import { startTestApp } from '../support/test-app';

let t: Awaited<ReturnType<typeof startTestApp>>;
let server: Server;
let tech: Agent, owner: Agent, mentor: Agent;
let techId: number, ownerId: number, mentorId: number;
beforeAll(async () => {
  t = await startTestApp();
  // The fake posts its signed events to the app over loopback, as the real service would over the internet.
  server = t.app.listen(0, '127.0.0.1');
  await new Promise((r) => server.once('listening', r));
  t.paymentFake.setWebhookUrl(`http://127.0.0.1:${(server.address() as AddressInfo).port}/api/payments/webhook`);
  const [a, b, c] = await Promise.all([createUser(t.db), createUser(t.db), createUser(t.db)]);
  [techId, ownerId, mentorId] = [a.id, b.id, c.id];
  [tech, owner, mentor] = await Promise.all([signedIn(t.app, a), signedIn(t.app, b), signedIn(t.app, c)]);
  await writeWorkshopSettings(t.db, {
    currency: 'GBP',
    labourRate: 4000,
    partsMarkupBasisPoints: 2500,
    taxName: 'VAT',
    taxRateBasisPoints: null,
    taxRounding: 'invoice-down',
    estimateApprovalRequired: false,
  });
});
afterAll(async () => {
  server.closeAllConnections();
  await new Promise((r) => server.close(r));
  await t.stop();
});

const newDeposit = async (amount = 5000) => {
  const id = (
    await createRestoration(t.db, [
      { userId: techId, role: 'technician' },
      { userId: ownerId, role: 'owner' },
      { userId: mentorId, role: 'mentor' },
    ])
  ).id;
  const deposit = (await tech.post(`/api/restorations/${id}/deposits`).send({ amount })).body as Invoice;
  return { id, deposit };
};
const invoiceOf = async (restorationId: number, invoiceId: number) =>
  ((await owner.get(`/api/restorations/${restorationId}/invoices`)).body as Invoice[]).find((i) => i.id === invoiceId)!;
const paymentsOf = async (restorationId: number) =>
  (await owner.get(`/api/restorations/${restorationId}/payments`)).body as Payment[];
const historyKinds = async (restorationId: number) =>
  (await t.db.select({ kind: events.kind }).from(events).where(eq(events.restorationId, restorationId))).map(
    (e) => e.kind,
  );

/** The owner checks out, then presses a button on the fake's page; resolves once its events are delivered. */
async function checkout(invoiceId: number, button: 'pay' | 'decline' | 'cancel') {
  const res = await owner.post(`/api/invoices/${invoiceId}/checkout`);
  expect(res.status).toBe(200);
  const url = (res.body as { url: string }).url;
  const page = await fetch(url);
  expect(await page.text()).toContain('Local test payment page');
  const pressed = await fetch(`${url}/${button}`, { method: 'POST', redirect: 'manual' });
  await pressed.arrayBuffer();
  await t.paymentFake.settled();
  return { url, redirect: pressed.headers.get('location') };
}

describe('card payments through the hosted checkout (the real SDK against the local fake)', () => {
  it('when a checkout is paid and its event is delivered twice, then the deposit is paid once, with one line and one history entry', async () => {
    const { id, deposit } = await newDeposit(5000);
    const before = t.paymentFake.sent.length;
    const { redirect } = await checkout(deposit.id, 'pay');
    expect(redirect).toMatch(
      new RegExp(
        `^http://gridleak.test/home\\?set=${id}&payment=processing&invoice=${deposit.id}&session=cs_test_\\w+$`,
      ),
    );
    const completed = t.paymentFake.sent.slice(before).find((e) => e.type === 'checkout.session.completed')!;
    expect(completed.status).toBe(200);
    expect(await invoiceOf(id, deposit.id)).toMatchObject({ status: 'paid', paid: { amount: 5000, currency: 'GBP' } });

    const again = await t.paymentFake.post(completed.payload, completed.header);
    expect(again).toBe(200);
    expect(await invoiceOf(id, deposit.id)).toMatchObject({ status: 'paid', paid: { amount: 5000, currency: 'GBP' } });
    const lines = await paymentsOf(id);
    expect(lines).toHaveLength(1);
    expect(lines[0]).toMatchObject({
      kind: 'payment',
      method: 'card',
      status: 'succeeded',
      amount: { amount: 5000, currency: 'GBP' },
      invoiceNumber: deposit.number,
    });
    expect((await historyKinds(id)).filter((k) => k === 'payment-received')).toHaveLength(1);
    // One notification each for the technician and the owner (written with the payment), none for the mentor.
    const notes = await t.db
      .select()
      .from(notifications)
      .where(and(eq(notifications.restorationId, id), eq(notifications.kind, 'payment')));
    expect(notes.map((n) => n.userId).sort()).toEqual([techId, ownerId].sort());
    expect(notes[0]!.summary).toBe(`Payment of £50.00 received for deposit request no. ${deposit.number} (card)`);
    const ownerList = (await owner.get('/api/notifications')).body as {
      kind: string;
      restorationId: number;
      findingId: number | null;
    }[];
    expect(ownerList.filter((n) => n.kind === 'payment' && n.restorationId === id)).toEqual([
      expect.objectContaining({ findingId: null }),
    ]);
    expect(
      ((await mentor.get('/api/notifications')).body as { kind: string }[]).filter((n) => n.kind === 'payment'),
    ).toEqual([]);
    const stored = await t.db.select().from(payments).where(eq(payments.restorationId, id));
    expect(stored[0]!.checkoutSessionId).toMatch(/^cs_test_/);
    expect(stored[0]!.paymentIntentId).toMatch(/^pi_test_/);
    expect((await t.db.select().from(paymentEvents).where(eq(paymentEvents.id, completed.id))).length).toBe(1);
    // Nothing is left to pay, so no second checkout.
    expect((await owner.post(`/api/invoices/${deposit.id}/checkout`)).status).toBe(409);
  });

  it('when an event carries a bad signature, then it is refused with 400 and nothing changes', async () => {
    const { id, deposit } = await newDeposit(3000);
    const res = await owner.post(`/api/invoices/${deposit.id}/checkout`);
    const sessionId = new URL((res.body as { url: string }).url).pathname.split('/').pop()!;
    const session = {
      ...t.paymentFake.sessions.get(sessionId)!,
      status: 'complete',
      payment_status: 'paid',
      payment_intent: 'pi_test_forged',
    };
    const payload = JSON.stringify({
      id: 'evt_test_forged',
      object: 'event',
      type: 'checkout.session.completed',
      created: 1796200000,
      data: { object: session },
    });
    const forged =
      t.paymentFake.sent[0]?.header.replace(/v1=[0-9a-f]+/, `v1=${'0'.repeat(64)}`) ??
      `t=${Math.floor(Date.now() / 1000)},v1=${'0'.repeat(64)}`;
    for (const header of [forged, 'nonsense', undefined]) {
      const answer = await t
        .request()
        .post('/api/payments/webhook')
        .set('content-type', 'application/json')
        .set(header ? { 'stripe-signature': header } : {})
        .send(payload);
      expect(answer.status).toBe(400);
    }
    expect(await invoiceOf(id, deposit.id)).toMatchObject({ status: 'open', paid: { amount: 0, currency: 'GBP' } });
    expect(await paymentsOf(id)).toEqual([]);
    expect((await t.db.select().from(paymentEvents).where(eq(paymentEvents.id, 'evt_test_forged'))).length).toBe(0);
  });

  it('when the payment is declined, then the deposit stays open, the line shows it failed, and it can be paid again', async () => {
    const { id, deposit } = await newDeposit(4200);
    await checkout(deposit.id, 'decline');
    expect(await invoiceOf(id, deposit.id)).toMatchObject({ status: 'open', paid: { amount: 0, currency: 'GBP' } });
    expect((await paymentsOf(id)).map((p) => p.status)).toEqual(['failed']);
    expect(await historyKinds(id)).not.toContain('payment-received');
    // Delivered late, the earlier "completed, not yet paid" event does not bring the failed payment back to pending.
    const completed = t.paymentFake.sent.filter((e) => e.type === 'checkout.session.completed').at(-1)!;
    expect(await t.paymentFake.post(completed.payload, completed.header)).toBe(200);
    expect((await paymentsOf(id)).map((p) => p.status)).toEqual(['failed']);
    await checkout(deposit.id, 'pay');
    expect(await invoiceOf(id, deposit.id)).toMatchObject({ status: 'paid', paid: { amount: 4200, currency: 'GBP' } });
  });

  it('when the owner cancels on the checkout page, then they go back to their set and nothing is recorded', async () => {
    const { id, deposit } = await newDeposit(1500);
    const { redirect } = await checkout(deposit.id, 'cancel');
    expect(redirect).toMatch(
      new RegExp(`^http://gridleak.test/home\\?set=${id}&payment=cancelled&invoice=${deposit.id}$`),
    );
    expect(await paymentsOf(id)).toEqual([]);
    expect((await invoiceOf(id, deposit.id)).status).toBe('open');
  });

  it('when a technician refunds part and then the rest of a card payment, then each refund arrives by its event and the deposit ends refunded, with nothing to pay', async () => {
    const { id, deposit } = await newDeposit(6000);
    await checkout(deposit.id, 'pay');
    const [paid] = await paymentsOf(id);
    expect((await owner.post(`/api/payments/${paid!.id}/refund`).send({})).status).toBe(403);
    const part = await tech
      .post(`/api/payments/${paid!.id}/refund`)
      .send({ amount: { amount: 2500, currency: 'GBP' } });
    expect(part.status).toBe(202);
    await t.paymentFake.settled();
    // A refund gives money back; it never asks for it again: the deposit stays paid with nothing left.
    expect(await invoiceOf(id, deposit.id)).toMatchObject({
      status: 'paid',
      paid: { amount: 3500, currency: 'GBP' },
      refunded: { amount: 2500, currency: 'GBP' },
      left: { amount: 0, currency: 'GBP' },
    });
    // Both the refund event and the charge event describe the same refund: it is recorded once.
    expect((await paymentsOf(id)).filter((p) => p.kind === 'refund')).toHaveLength(1);
    expect(
      (await tech.post(`/api/payments/${paid!.id}/refund`).send({ amount: { amount: 3501, currency: 'GBP' } })).status,
    ).toBe(409);
    expect(
      (await tech.post(`/api/payments/${paid!.id}/refund`).send({ amount: { amount: 100, currency: 'EUR' } })).status,
    ).toBe(400);
    expect((await tech.post(`/api/payments/${paid!.id}/refund`).send({})).status).toBe(202);
    await t.paymentFake.settled();
    const lines = await paymentsOf(id);
    expect(lines.map((p) => [p.kind, p.status, p.amount.amount])).toEqual([
      ['payment', 'succeeded', 6000],
      ['refund', 'succeeded', 2500],
      ['refund', 'succeeded', 3500],
    ]);
    expect(lines[0]!.refunded).toEqual({ amount: 6000, currency: 'GBP' });
    expect(await invoiceOf(id, deposit.id)).toMatchObject({
      status: 'refunded',
      paid: { amount: 0, currency: 'GBP' },
      refunded: { amount: 6000, currency: 'GBP' },
      left: { amount: 0, currency: 'GBP' },
    });
    // Refunded in full is not open again: no checkout, no transfer against it.
    expect((await owner.post(`/api/invoices/${deposit.id}/checkout`)).status).toBe(409);
    expect(
      (
        await tech
          .post(`/api/invoices/${deposit.id}/payments`)
          .send({ amount: { amount: 100, currency: 'GBP' }, method: 'cash', receivedOn: '2026-12-01' })
      ).status,
    ).toBe(409);
    // Every refund event again, in reverse order: nothing changes.
    for (const e of t.paymentFake.sent.filter((x) => x.type.includes('refund')).reverse())
      await t.paymentFake.post(e.payload, e.header);
    expect((await paymentsOf(id)).length).toBe(3);
    expect((await historyKinds(id)).filter((k) => k === 'payment-refunded')).toHaveLength(2);
    expect((await tech.post(`/api/payments/${paid!.id}/refund`).send({})).status).toBe(409);
  });

  it('when a refund event arrives before its payment is known, then it is answered with an error (to be sent again) and not stored', async () => {
    const refund = {
      id: 're_test_early',
      object: 'refund',
      amount: 100,
      currency: 'gbp',
      payment_intent: 'pi_test_unknown',
      status: 'succeeded',
      metadata: {},
    };
    const payload = JSON.stringify({
      id: 'evt_test_early',
      object: 'event',
      type: 'refund.created',
      created: Math.floor(Date.now() / 1000),
      data: { object: refund },
    });
    expect(await t.paymentFake.post(payload, signatureHeader(payload, t.paymentFake.webhookSecret))).toBe(409);
    expect((await t.db.select().from(paymentEvents).where(eq(paymentEvents.id, 'evt_test_early'))).length).toBe(0);
  });
});

describe('payments recorded by hand', () => {
  it('when a technician records a bank transfer, then it is paid at once with the day it arrived, and more than is due is refused', async () => {
    const { id, deposit } = await newDeposit(8000);
    const body = { amount: { amount: 3000, currency: 'GBP' }, method: 'transfer', receivedOn: '2026-11-30' };
    expect((await owner.post(`/api/invoices/${deposit.id}/payments`).send(body)).status).toBe(403);
    const res = await tech.post(`/api/invoices/${deposit.id}/payments`).send(body);
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({
      kind: 'payment',
      method: 'transfer',
      status: 'succeeded',
      receivedOn: '2026-11-30',
      amount: { amount: 3000, currency: 'GBP' },
    });
    expect(await invoiceOf(id, deposit.id)).toMatchObject({ status: 'open', paid: { amount: 3000, currency: 'GBP' } });
    expect(
      (
        await tech
          .post(`/api/invoices/${deposit.id}/payments`)
          .send({ ...body, amount: { amount: 5001, currency: 'GBP' } })
      ).status,
    ).toBe(409);
    expect(
      (
        await tech
          .post(`/api/invoices/${deposit.id}/payments`)
          .send({ ...body, amount: { amount: 100, currency: 'USD' } })
      ).status,
    ).toBe(400);
    expect(
      (
        await tech
          .post(`/api/invoices/${deposit.id}/payments`)
          .send({ ...body, method: 'cash', amount: { amount: 5000, currency: 'GBP' } })
      ).status,
    ).toBe(201);
    expect(await invoiceOf(id, deposit.id)).toMatchObject({ status: 'paid', paid: { amount: 8000, currency: 'GBP' } });
    expect((await historyKinds(id)).filter((k) => k === 'payment-received')).toHaveLength(2);
    // A cash refund is recorded at once, without the payment service.
    const cash = (await paymentsOf(id)).find((p) => p.method === 'cash')!;
    const refund = await tech
      .post(`/api/payments/${cash.id}/refund`)
      .send({ amount: { amount: 1000, currency: 'GBP' } });
    expect(refund.status).toBe(201);
    expect(await invoiceOf(id, deposit.id)).toMatchObject({
      status: 'paid',
      paid: { amount: 7000, currency: 'GBP' },
      refunded: { amount: 1000, currency: 'GBP' },
      left: { amount: 0, currency: 'GBP' },
    });
    // The rest of the cash and all of the transfer back: refunded, with nothing left to pay.
    expect((await tech.post(`/api/payments/${cash.id}/refund`).send({})).status).toBe(201);
    const transfer = (await paymentsOf(id)).find((p) => p.method === 'transfer')!;
    expect((await tech.post(`/api/payments/${transfer.id}/refund`).send({})).status).toBe(201);
    expect(await invoiceOf(id, deposit.id)).toMatchObject({
      status: 'refunded',
      paid: { amount: 0, currency: 'GBP' },
      refunded: { amount: 8000, currency: 'GBP' },
      left: { amount: 0, currency: 'GBP' },
    });
    expect((await owner.post(`/api/invoices/${deposit.id}/checkout`)).status).toBe(409);
  });
});

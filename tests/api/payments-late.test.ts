import type { Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import { and, eq } from 'drizzle-orm';
import type { Agent } from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Invoice } from '../../shared/schemas/invoices';
import type { Payment } from '../../shared/schemas/payments';
import { notifications } from '../../server/db/schema';
import { writeWorkshopSettings } from '../../server/features/workshop/workshop-settings';
import { createRestoration } from '../factories/restorations';
import { createUser, signedIn } from '../factories/users';
import { startTestApp } from '../support/test-app';

let t: Awaited<ReturnType<typeof startTestApp>>;
let server: Server;
let tech: Agent, owner: Agent;
let techId: number, ownerId: number;
beforeAll(async () => {
  t = await startTestApp();
  server = t.app.listen(0, '127.0.0.1');
  await new Promise((r) => server.once('listening', r));
  t.paymentFake.setWebhookUrl(`http://127.0.0.1:${(server.address() as AddressInfo).port}/api/payments/webhook`);
  const [a, b] = await Promise.all([createUser(t.db), createUser(t.db)]);
  [techId, ownerId] = [a.id, b.id];
  [tech, owner] = await Promise.all([signedIn(t.app, a), signedIn(t.app, b)]);
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

const newDeposit = async (amount: number) => {
  const id = (
    await createRestoration(t.db, [
      { userId: techId, role: 'technician' },
      { userId: ownerId, role: 'owner' },
    ])
  ).id;
  return { id, deposit: (await tech.post(`/api/restorations/${id}/deposits`).send({ amount })).body as Invoice };
};
const invoiceOf = async (restorationId: number, invoiceId: number) =>
  ((await tech.get(`/api/restorations/${restorationId}/invoices`)).body as Invoice[]).find((i) => i.id === invoiceId)!;
const paymentsOf = async (restorationId: number) =>
  (await tech.get(`/api/restorations/${restorationId}/payments`)).body as Payment[];
/** Opens a checkout page (nothing recorded yet) and returns a way to press Pay on it later. */
async function openCheckout(invoiceId: number) {
  const res = await owner.post(`/api/invoices/${invoiceId}/checkout`);
  expect(res.status).toBe(200);
  const url = (res.body as { url: string }).url;
  return async () => {
    await (await fetch(`${url}/pay`, { method: 'POST', redirect: 'manual' })).arrayBuffer();
    await t.paymentFake.settled();
  };
}

describe('card payments that arrive when nothing is due', () => {
  it('when the deposit is voided while its checkout page is open and the owner pays, then the payment is recorded and flagged for refund in full', async () => {
    const { id, deposit } = await newDeposit(4000);
    const pay = await openCheckout(deposit.id);
    expect(
      (await tech.post(`/api/invoices/${deposit.id}/void`).send({ reason: 'Asked for the wrong amount' })).status,
    ).toBe(200);
    // A void deposit offers no new checkout.
    expect((await owner.post(`/api/invoices/${deposit.id}/checkout`)).status).toBe(409);
    await pay();
    const [line] = await paymentsOf(id);
    expect(line).toMatchObject({
      kind: 'payment',
      status: 'succeeded',
      amount: { amount: 4000, currency: 'GBP' },
      refundDue: { amount: 4000, currency: 'GBP' },
    });
    expect(await invoiceOf(id, deposit.id)).toMatchObject({ status: 'void', left: { amount: 0, currency: 'GBP' } });
    const [note] = await t.db
      .select()
      .from(notifications)
      .where(
        and(eq(notifications.restorationId, id), eq(notifications.kind, 'payment'), eq(notifications.userId, techId)),
      );
    expect(note!.summary).toContain('£40.00 of it was not due (the invoice is void) and is to be refunded');
    // The technician refunds it; the flag clears once the refund's event is in.
    expect((await tech.post(`/api/payments/${line!.id}/refund`).send({})).status).toBe(202);
    await t.paymentFake.settled();
    const after = (await paymentsOf(id)).find((p) => p.id === line!.id)!;
    expect(after).toMatchObject({
      refunded: { amount: 4000, currency: 'GBP' },
      refundDue: { amount: 0, currency: 'GBP' },
    });
  });

  it('when a transfer settles the deposit while its checkout page is open and the owner pays too, then only the excess is flagged for refund', async () => {
    const { id, deposit } = await newDeposit(5000);
    const pay = await openCheckout(deposit.id);
    const transfer = { amount: { amount: 2000, currency: 'GBP' }, method: 'transfer', receivedOn: '2026-12-01' };
    expect((await tech.post(`/api/invoices/${deposit.id}/payments`).send(transfer)).status).toBe(201);
    await pay();
    const card = (await paymentsOf(id)).find((p) => p.method === 'card')!;
    // The page asked for £50.00, but only £30.00 was still due: £20.00 is to go back.
    expect(card).toMatchObject({
      amount: { amount: 5000, currency: 'GBP' },
      refundDue: { amount: 2000, currency: 'GBP' },
    });
    expect(await invoiceOf(id, deposit.id)).toMatchObject({ status: 'paid', paid: { amount: 7000, currency: 'GBP' } });
  });
});

import { eq } from 'drizzle-orm';
import type { Agent } from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Invoice } from '../../shared/schemas/invoices';
import { invoices } from '../../server/db/schema';
import { writeWorkshopSettings } from '../../server/features/workshop/workshop-settings';
import { createRestoration } from '../factories/restorations';
import { createUser, signedIn } from '../factories/users';
import { whileFailing } from '../support/fail-writes';
import { startTestApp } from '../support/test-app';

let t: Awaited<ReturnType<typeof startTestApp>>;
let tech: Agent, owner: Agent, mentor: Agent;
let techId: number, ownerId: number, mentorId: number;
beforeAll(async () => {
  t = await startTestApp();
  const [a, b, c] = await Promise.all([createUser(t.db), createUser(t.db), createUser(t.db)]);
  [techId, ownerId, mentorId] = [a.id, b.id, c.id];
  [tech, owner, mentor] = await Promise.all([signedIn(t.app, a), signedIn(t.app, b), signedIn(t.app, c)]);
  // £40 an hour, parts at cost plus 25%, VAT 20% on the invoice total rounded down (HMRC VAT Notice 700 §17.5, from memory).
  await writeWorkshopSettings(t.db, {
    currency: 'GBP',
    labourRate: 4000,
    partsMarkupBasisPoints: 2500,
    taxName: 'VAT',
    taxRateBasisPoints: 2000,
    taxRounding: 'invoice-down',
    estimateApprovalRequired: false,
  });
});
afterAll(() => t.stop());

const newSet = async () =>
  (
    await createRestoration(t.db, [
      { userId: techId, role: 'technician' },
      { userId: ownerId, role: 'owner' },
      { userId: mentorId, role: 'mentor' },
    ])
  ).id;
const list = async (agent: Agent, id: number) =>
  (await agent.get(`/api/restorations/${id}/invoices`)).body as Invoice[];

describe('invoices', () => {
  it('when a final invoice is issued, then billable labour and fitted parts are priced with VAT, and every amount carries its currency', async () => {
    const id = await newSet();
    await tech.post(`/api/restorations/${id}/labour`).send({ minutes: 150, stage: 'repair' });
    await tech.post(`/api/restorations/${id}/labour`).send({ minutes: 20, stage: 'repair', billable: false });
    const part = (
      await tech
        .post(`/api/restorations/${id}/parts`)
        .send({ componentRef: 'C27', replacementRating: '22nF 630V', costMinor: 199 })
    ).body as { id: number };
    await tech.patch(`/api/parts/${part.id}`).send({ state: 'fitted' });
    const res = await tech.post(`/api/restorations/${id}/invoices`);
    expect(res.status).toBe(201);
    const inv = res.body as Invoice;
    // Worked by hand: 2.5 h × £40 = £100.00; £1.99 + 25% = 248.75 p → £2.49; net £102.49; VAT 2049.8 p → £20.49 (rounded down); £122.98.
    expect(inv.lines.map((l) => l.net.amount)).toEqual([10000, 249]);
    expect([inv.net, inv.taxAmount, inv.gross, inv.due]).toEqual(
      [10249, 2049, 12298, 12298].map((amount) => ({ amount, currency: 'GBP' })),
    );
    expect((await list(owner, id)).map((i) => i.id)).toEqual([inv.id]);
    expect((await mentor.get(`/api/restorations/${id}/invoices`)).status).toBe(403);
    expect((await tech.post(`/api/restorations/${id}/invoices`)).status).toBe(409);
  });

  it('when invoices are issued on several sets, then their numbers follow one another with no gap, even after a failed issue', async () => {
    const [a, b] = [await newSet(), await newSet()];
    const first = (await tech.post(`/api/restorations/${a}/deposits`).send({ amount: 5000 })).body as Invoice;
    const failed = await whileFailing(t.db, 'events', 'insert', () =>
      tech.post(`/api/restorations/${b}/deposits`).send({ amount: 5000 }),
    );
    expect(failed.status).toBe(500);
    const second = (await tech.post(`/api/restorations/${b}/deposits`).send({ amount: 7000 })).body as Invoice;
    expect(second.number).toBe(first.number + 1);
    const many = await Promise.all(
      [a, b, a, b].map((id) => tech.post(`/api/restorations/${id}/deposits`).send({ amount: 100 })),
    );
    const numbers = many.map((r) => (r.body as Invoice).number).sort((x, y) => x - y);
    expect(numbers).toEqual([1, 2, 3, 4].map((n) => second.number + n));
  });

  it('when a deposit is a share of the approved estimate, then it is that share of the high figure', async () => {
    const id = await newSet();
    const e = (
      await tech
        .post(`/api/restorations/${id}/estimates`)
        .send({ lines: [{ kind: 'labour', description: 'Recap', low: 60, high: 150 }] })
    ).body as { id: number };
    await owner.post(`/api/estimates/${e.id}/decision`).send({ decision: 'approved', name: 'Pat Owner', version: 1 });
    // High: 2.5 h × £40 = £100 + VAT £20 = £120; 30% = £36.00
    const dep = (await tech.post(`/api/restorations/${id}/deposits`).send({ shareBasisPoints: 3000 })).body as Invoice;
    expect(dep.due).toEqual({ amount: 3600, currency: 'GBP' });
  });

  it('when an invoice is voided, then it stays as issued, marked void, and a credit note reverses it exactly', async () => {
    const id = await newSet();
    await tech.post(`/api/restorations/${id}/labour`).send({ minutes: 50, stage: 'repair' });
    const inv = (await tech.post(`/api/restorations/${id}/invoices`)).body as Invoice;
    const credit = (await tech.post(`/api/invoices/${inv.id}/void`).send({ reason: 'Wrong rate' })).body as Invoice;
    // 50 min × £40/h = 3333.3 p → £33.33; VAT 666.6 p → £6.66 down; the credit note is −£39.99
    expect([credit.kind, credit.creditsInvoiceId, credit.gross.amount, credit.number]).toEqual([
      'credit-note',
      inv.id,
      -(3333 + 666),
      inv.number + 1,
    ]);
    expect(inv.gross.amount).toBe(3999);
    const after = await list(tech, id);
    expect(after.find((i) => i.id === inv.id)).toMatchObject({
      status: 'void',
      voidReason: 'Wrong rate',
      gross: inv.gross,
    });
    expect((await tech.post(`/api/invoices/${inv.id}/void`).send({ reason: 'Again' })).status).toBe(409);
    expect((await t.db.select().from(invoices).where(eq(invoices.restorationId, id))).length).toBe(2);
  });
});

import { desc, eq } from 'drizzle-orm';
import type { Agent } from 'supertest';
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import type { CapturedMail } from '../../shared/schemas/dev-mail';
import type { WorkshopSettings } from '../../shared/schemas/estimates';
import type { Invoice, InvoicePreview } from '../../shared/schemas/invoices';
import { invoices } from '../../server/db/schema';
import type { OutgoingMail } from '../../server/mail';
import { createRestoration } from '../factories/restorations';
import { anonymous, createUser, signedIn } from '../factories/users';
import { waitForMail } from '../support/mail';
import { pdfText } from '../support/pdf-text';
import { startTestApp } from '../support/test-app';

let t: Awaited<ReturnType<typeof startTestApp>>;
let tech: Agent, owner: Agent, mentor: Agent;
let techId: number, ownerId: number, mentorId: number, ownerEmail: string;
// £40 an hour, parts at cost plus 25%, VAT 20% on the invoice total rounded down (HMRC VAT Notice 700 §17.5, from memory).
const gbp: WorkshopSettings = {
  currency: 'GBP',
  labourRate: 4000,
  partsMarkupBasisPoints: 2500,
  taxName: 'VAT',
  taxRateBasisPoints: 2000,
  taxRounding: 'invoice-down',
  estimateApprovalRequired: false,
  invoicePrefix: 'CL-',
  timeZone: 'Europe/London',
};
beforeAll(async () => {
  t = await startTestApp();
  const [a, b, c] = await Promise.all([createUser(t.db, { workshopAdmin: true }), createUser(t.db), createUser(t.db)]);
  [techId, ownerId, mentorId, ownerEmail] = [a.id, b.id, c.id, b.email];
  [tech, owner, mentor] = await Promise.all([signedIn(t.app, a), signedIn(t.app, b), signedIn(t.app, c)]);
  await createRestoration(t.db, [{ userId: techId, role: 'technician' }]);
  expect((await tech.put('/api/workshop/settings').send(gbp)).status).toBe(200);
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
const mails = async () => (await tech.get('/api/dev/mail')).body as CapturedMail[];
const markPaid = (id: number) => t.db.update(invoices).set({ paid: invoices.due }).where(eq(invoices.id, id));
const list = async (agent: Agent, id: number) =>
  (await agent.get(`/api/restorations/${id}/invoices`)).body as Invoice[];

describe('workshop settings', () => {
  it('when people with each role ask, then only a technician of the workshop reads and an administrator changes the settings', async () => {
    const people = await Promise.all([
      createUser(t.db, { workshopAdmin: true }),
      createUser(t.db),
      createUser(t.db),
      createUser(t.db),
    ]);
    await createRestoration(t.db, [
      { userId: people[0]!.id, role: 'technician' },
      { userId: people[1]!.id, role: 'mentor' },
      { userId: people[2]!.id, role: 'owner' },
    ]);
    const agents = [...(await Promise.all(people.map((p) => signedIn(t.app, p)))), anonymous(t.app)];
    const reads = await Promise.all(agents.map(async (a) => (await a.get('/api/workshop/settings')).status));
    expect(reads).toEqual([200, 403, 403, 403, 401]); // technician, mentor, owner, on no set, signed out
    const writes = [];
    for (const a of agents)
      writes.push((await a.put('/api/workshop/settings').send({ ...gbp, labourRate: 9999 })).status);
    expect(writes).toEqual([200, 403, 403, 403, 401]);
    expect(((await tech.get('/api/workshop/settings')).body as WorkshopSettings).labourRate).toBe(9999);
    await tech.put('/api/workshop/settings').send(gbp);
  });

  it('when a setting is not valid, then nothing changes and the answer says which', async () => {
    const res = await tech.put('/api/workshop/settings').send({ ...gbp, currency: 'XXQ', timeZone: 'Mars/Olympus' });
    expect(res.status).toBe(400);
    expect(JSON.stringify(res.body)).toMatch(/ISO 4217/);
    expect((await tech.get('/api/workshop/settings')).body).toEqual(gbp);
  });

  it('when the workshop works in euros, then the parts CSV costs are in euros unless the reader asks for another currency', async () => {
    const id = await newSet();
    await tech.post(`/api/restorations/${id}/parts`).send({ componentRef: 'C27', costMinor: 1250 });
    await tech.put('/api/workshop/settings').send({ ...gbp, currency: 'JPY' });
    const csv = (await tech.get(`/api/restorations/${id}/parts.csv`)).text;
    expect(csv).toContain('"Cost (JPY)"');
    expect(csv).toContain('"1250"'); // ISO 4217: yen has no minor unit, so 1250 minor units are ¥1,250
    expect((await tech.get(`/api/restorations/${id}/parts.csv?currency=GBP`)).text).toContain('"12.50"');
    await tech.put('/api/workshop/settings').send(gbp);
  });
});

describe('invoices at hand-back', () => {
  it('when a paid deposit precedes the final invoice, then the invoice deducts it, and the preview showed the same totals', async () => {
    const id = await newSet();
    const deposit = (await tech.post(`/api/restorations/${id}/deposits`).send({ amount: 3600 })).body as Invoice;
    expect([deposit.reference, deposit.due]).toEqual([`CL-${deposit.number}`, { amount: 3600, currency: 'GBP' }]);
    await markPaid(deposit.id);
    await tech.post(`/api/restorations/${id}/labour`).send({ minutes: 150, stage: 'repair' });
    const part = (
      await tech
        .post(`/api/restorations/${id}/parts`)
        .send({ componentRef: 'C27', replacementRating: '22nF 630V', costMinor: 199 })
    ).body as { id: number };
    await tech.patch(`/api/parts/${part.id}`).send({ state: 'fitted' });
    const preview = (await tech.get(`/api/restorations/${id}/invoices/preview`)).body as InvoicePreview;
    const inv = (await tech.post(`/api/restorations/${id}/invoices`)).body as Invoice;
    // Worked by hand: 2.5 h × £40 = £100.00; £1.99 + 25% = 248.75 p → £2.49; net £102.49; VAT 2049.8 p → £20.49 (rounded
    // down, HMRC VAT Notice 700 §17.5, from memory); total £122.98; less the £36.00 deposit paid: £86.98 due.
    expect([inv.net, inv.taxAmount, inv.gross, inv.deducted, inv.due].map((m) => m.amount)).toEqual([
      10249, 2049, 12298, 3600, 8698,
    ]);
    expect(preview).toEqual({
      tax: inv.tax,
      lines: inv.lines,
      net: inv.net,
      taxAmount: inv.taxAmount,
      gross: inv.gross,
      deducted: inv.deducted,
      due: inv.due,
    });
    expect((await list(owner, id)).map((i) => [i.reference, i.kind])).toEqual([
      [inv.reference, 'final'],
      [deposit.reference, 'deposit'],
    ]);
    const mail = await waitForMail(mails, ownerEmail, new RegExp(`Invoice ${inv.reference}`));
    expect(mail.text).toContain('£86.98 after £36.00 of deposits paid');
  });

  it('when two final invoices are issued at the same moment on two sets, then they take consecutive numbers', async () => {
    const sets = [await newSet(), await newSet()];
    for (const id of sets) await tech.post(`/api/restorations/${id}/labour`).send({ minutes: 60, stage: 'repair' });
    const before = (await t.db.select({ n: invoices.number }).from(invoices)).map((r) => r.n);
    const issued = await Promise.all(sets.map((id) => tech.post(`/api/restorations/${id}/invoices`)));
    expect(issued.map((r) => r.status)).toEqual([201, 201]);
    const numbers = issued.map((r) => (r.body as Invoice).number).sort((a, b) => a - b);
    expect(numbers).toEqual([Math.max(...before) + 1, Math.max(...before) + 2]);
  });

  it('when the same set is invoiced twice at the same moment, then one is issued and the other refused without using a number', async () => {
    const id = await newSet();
    await tech.post(`/api/restorations/${id}/labour`).send({ minutes: 60, stage: 'repair' });
    const [a, b] = await Promise.all([
      tech.post(`/api/restorations/${id}/invoices`),
      tech.post(`/api/restorations/${id}/invoices`),
    ]);
    expect([a.status, b.status].sort()).toEqual([201, 409]);
    const next = (await tech.post(`/api/restorations/${id}/deposits`).send({ amount: 100 })).body as Invoice;
    expect(next.number).toBe(((a.status === 201 ? a : b).body as Invoice).number + 1);
  });

  it('when an invoice is voided, then the credit note reverses it, names it, and is e-mailed; the invoice is never rewritten', async () => {
    const id = await newSet();
    await tech.post(`/api/restorations/${id}/labour`).send({ minutes: 50, stage: 'repair' });
    const inv = (await tech.post(`/api/restorations/${id}/invoices`)).body as Invoice;
    const credit = (await tech.post(`/api/invoices/${inv.id}/void`).send({ reason: 'Wrong rate' })).body as Invoice;
    // 50 min × £40/h = 3333.3 p → £33.33; VAT 666.6 p → £6.66 (rounded down); total £39.99, credited −£39.99.
    expect([inv.gross.amount, credit.gross.amount, credit.reference]).toEqual([3999, -3999, `CL-${inv.number + 1}`]);
    const text = await pdfText(
      Buffer.from((await owner.get(`/api/invoices/${credit.id}/invoice.pdf`).buffer(true)).body as Buffer),
    );
    expect(text).toContain(`Credit note ${credit.reference}`);
    expect(text).toContain(`Corrects invoice ${inv.reference}`);
    expect(text).toContain('-£39.99');
    const voided = (await list(tech, id)).find((i) => i.id === inv.id)!;
    expect([voided.status, voided.lines, voided.gross]).toEqual(['void', inv.lines, inv.gross]);
    await waitForMail(mails, ownerEmail, new RegExp(`Credit note ${credit.reference}`));
  });

  it('when an issued invoice is e-mailed, then its PDF goes with it', async () => {
    const sent = vi.spyOn(t.deps.mailer, 'send');
    try {
      const id = await newSet();
      const dep = (await tech.post(`/api/restorations/${id}/deposits`).send({ amount: 2500 })).body as Invoice;
      const mail = sent.mock.calls.map(([m]) => m as OutgoingMail).find((m) => m.subject.includes(dep.reference))!;
      expect(mail.attachments?.[0]?.contentType).toBe('application/pdf');
      expect(await pdfText(mail.attachments![0]!.content)).toContain(`Deposit request ${dep.reference}`);
    } finally {
      sent.mockRestore();
    }
  });
});

describe('invoice mail that cannot go', () => {
  it('when the mail server refuses, then nothing is issued, the answer is 503 and the next invoice takes the number', async () => {
    const id = await newSet();
    const before = await list(tech, id);
    const refused = vi.spyOn(t.deps.mailer, 'send').mockRejectedValueOnce(new Error('SMTP 421 try later'));
    try {
      const res = await tech.post(`/api/restorations/${id}/deposits`).send({ amount: 5000 });
      expect(res.status).toBe(503);
    } finally {
      refused.mockRestore();
    }
    expect(await list(tech, id)).toEqual(before);
    const [{ last }] = (await t.db
      .select({ last: invoices.number })
      .from(invoices)
      .orderBy(desc(invoices.number))
      .limit(1)) as [{ last: number }];
    const next = (await tech.post(`/api/restorations/${id}/deposits`).send({ amount: 5000 })).body as Invoice;
    expect(next.number).toBe(last + 1);
  });
});

describe('invoice PDFs', () => {
  it('when the owner downloads an invoice and a receipt, then each is a PDF with the number, the amounts in the workshop currency and dates in their zone', async () => {
    const id = await newSet();
    const dep = (await tech.post(`/api/restorations/${id}/deposits`).send({ amount: 123456 })).body as Invoice;
    const res = await owner.get(`/api/invoices/${dep.id}/invoice.pdf?timeZone=Pacific/Kiritimati`).buffer(true);
    expect(res.headers['content-type']).toBe('application/pdf');
    const text = await pdfText(res.body as Buffer);
    expect(text).toContain(`Deposit request ${dep.reference}`);
    expect(text).toContain('£1,234.56'); // CLDR en-GB pattern for GBP
    expect(text).toContain('dates in Pacific/Kiritimati');
    expect((await owner.get(`/api/invoices/${dep.id}/receipt.pdf`)).status).toBe(409);
    await markPaid(dep.id);
    const receipt = await pdfText((await owner.get(`/api/invoices/${dep.id}/receipt.pdf`).buffer(true)).body as Buffer);
    expect(receipt).toContain(`Receipt for ${dep.reference}`);
    expect(receipt).toContain('Paid in full');
  });

  it('when a mentor or someone else asks for an invoice PDF, then they get none, and the mentor reads no invoice in the history', async () => {
    const id = await newSet();
    const dep = (await tech.post(`/api/restorations/${id}/deposits`).send({ amount: 1000 })).body as Invoice;
    const stranger = await signedIn(t.app, await createUser(t.db));
    expect((await mentor.get(`/api/invoices/${dep.id}/invoice.pdf`)).status).toBe(403);
    expect((await stranger.get(`/api/invoices/${dep.id}/invoice.pdf`)).status).toBe(404);
    // The history says an invoice was issued to the technician and the owner, and nothing of it to the mentor.
    const kinds = async (agent: Agent) =>
      ((await agent.get(`/api/restorations/${id}/events`)).body as { kind: string }[]).map((e) => e.kind);
    expect(await kinds(tech)).toContain('invoice-issued');
    expect(await kinds(owner)).toContain('invoice-issued');
    const mentorKinds = await kinds(mentor);
    expect(mentorKinds).not.toContain('invoice-issued');
    expect(mentorKinds.length).toBe(
      (await kinds(tech)).filter(
        (k) => !['invoice-issued', 'invoice-voided', 'estimate-sent', 'estimate-decided'].includes(k),
      ).length,
    );
  });
});

describe('deleting a set with invoices', () => {
  it('when a set has an issued invoice, then deleting it is refused and the invoice stays; a set without one is deleted', async () => {
    const id = await newSet();
    const dep = (await tech.post(`/api/restorations/${id}/deposits`).send({ amount: 1000 })).body as Invoice;
    const res = await tech.delete(`/api/restorations/${id}`);
    expect(res.status).toBe(409);
    expect((res.body as { error: { message: string } }).error.message).toMatch(/issued invoice.*cannot be deleted/);
    expect((await list(tech, id)).map((i) => i.id)).toEqual([dep.id]);
    const plain = await newSet();
    expect((await tech.delete(`/api/restorations/${plain}`)).status).toBe(204);
  });
});

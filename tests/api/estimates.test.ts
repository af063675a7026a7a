import { eq } from 'drizzle-orm';
import type { Agent } from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { CapturedMail } from '../../shared/schemas/dev-mail';
import type { Estimate } from '../../shared/schemas/estimates';
import { estimates } from '../../server/db/schema';
import { readWorkshopSettings, writeWorkshopSettings } from '../../server/features/workshop/workshop-settings';
import { createRestoration } from '../factories/restorations';
import { createUser, signedIn } from '../factories/users';
import { whileFailing } from '../support/fail-writes';
import { waitForMail } from '../support/mail';
import { startTestApp } from '../support/test-app';

let t: Awaited<ReturnType<typeof startTestApp>>;
let tech: Agent, owner: Agent, mentor: Agent;
let techId: number, ownerId: number, mentorId: number, ownerEmail: string;
beforeAll(async () => {
  t = await startTestApp();
  const [a, b, c] = await Promise.all([createUser(t.db), createUser(t.db), createUser(t.db)]);
  [techId, ownerId, mentorId, ownerEmail] = [a.id, b.id, c.id, b.email];
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
const mails = async () => (await tech.get('/api/dev/mail')).body as CapturedMail[];
const list = async (agent: Agent, id: number) =>
  (await agent.get(`/api/restorations/${id}/estimates`)).body as Estimate[];

const firstQuote = {
  note: 'Before opening the set.',
  lines: [
    { kind: 'labour', description: 'Recap, clean and align', low: 90, high: 180 },
    { kind: 'part', description: 'Capacitors and resistors', low: 1000, high: 1600 },
    {
      kind: 'extra',
      extra: 'no-schematic',
      description: 'Tracing the circuit without a schematic',
      low: 1500,
      high: 1500,
    },
  ],
};

describe('estimates', () => {
  it('when a technician sends an estimate, then its range is priced at the workshop rates with VAT, and the owner is e-mailed', async () => {
    const id = await newSet();
    const res = await tech.post(`/api/restorations/${id}/estimates`).send(firstQuote);
    expect(res.status).toBe(201);
    const e = res.body as Estimate;
    // Worked by hand. Low: 1.5 h × £40 = £60 + £10 × 1.25 = £12.50 + £15 = £87.50, VAT £17.50 → £105.00.
    // High: 3 h × £40 = £120 + £16 × 1.25 = £20 + £15 = £155, VAT £31 → £186.00.
    expect(e.low).toEqual({ amount: 10500, currency: 'GBP' });
    expect(e.high).toEqual({ amount: 18600, currency: 'GBP' });
    expect(e.lines.map((l) => [l.low.amount, l.high.amount])).toEqual([
      [6000, 12000],
      [1250, 2000],
      [1500, 1500],
    ]);
    expect([e.version, e.sent, e.tax]).toEqual([
      1,
      true,
      { name: 'VAT', rateBasisPoints: 2000, rounding: 'invoice-down' },
    ]);
    const mail = await waitForMail(mails, ownerEmail, /estimate/);
    expect(mail.text).toContain('£105.00 – £186.00');
    expect(mail.text).toContain(`/restorations/${id}`);
  });

  it('when the estimate is revised, then the earlier version stays visible and only the latest can be answered', async () => {
    const id = await newSet();
    await tech.post(`/api/restorations/${id}/estimates`).send(firstQuote);
    const v2 = (
      await tech.post(`/api/restorations/${id}/estimates`).send({ ...firstQuote, note: 'After checking the supply.' })
    ).body as Estimate;
    const seen = await list(owner, id);
    expect(seen.map((e) => e.version)).toEqual([2, 1]);
    const v1 = seen[1]!;
    expect(
      (
        await owner
          .post(`/api/estimates/${v1.id}/decision`)
          .send({ decision: 'approved', name: 'Ada Owner', version: 1 })
      ).status,
    ).toBe(409);
    const before = Date.now();
    const res = await owner
      .post(`/api/estimates/${v2.id}/decision`)
      .send({ decision: 'approved', name: 'Ada Owner', version: 2 });
    expect(res.status).toBe(200);
    const decided = res.body as Estimate;
    expect([decided.decision, decided.decidedByName, decided.version]).toEqual(['approved', 'Ada Owner', 2]);
    expect(Date.parse(decided.decidedAt!)).toBeGreaterThanOrEqual(before - 1000);
    // Answered once: a second answer is refused and changes nothing.
    expect(
      (
        await owner
          .post(`/api/estimates/${v2.id}/decision`)
          .send({ decision: 'declined', name: 'Ada Owner', version: 2 })
      ).status,
    ).toBe(409);
    expect((await list(tech, id))[0]!.decision).toBe('approved');
  });

  it('when an estimate is a draft, then the owner neither sees nor answers it; mentors see no estimates at all', async () => {
    const id = await newSet();
    const draft = (await tech.post(`/api/restorations/${id}/estimates`).send({ ...firstQuote, send: false }))
      .body as Estimate;
    expect(await list(owner, id)).toEqual([]);
    expect(
      (
        await owner
          .post(`/api/estimates/${draft.id}/decision`)
          .send({ decision: 'approved', name: 'Ada Owner', version: 1 })
      ).status,
    ).toBe(404);
    expect((await mentor.get(`/api/restorations/${id}/estimates`)).status).toBe(403);
    expect((await tech.post(`/api/estimates/${draft.id}/send`)).status).toBe(200);
    expect((await list(owner, id)).map((e) => e.version)).toEqual([1]);
  });

  it('when the workshop requires approval, then the set moves past Assessment only after the owner approves the latest estimate', async () => {
    const id = await newSet();
    const settings = await readWorkshopSettings(t.db);
    await writeWorkshopSettings(t.db, { ...settings, estimateApprovalRequired: true });
    try {
      expect((await tech.patch(`/api/restorations/${id}`).send({ stage: 'assessment' })).status).toBe(200);
      const refused = await tech.patch(`/api/restorations/${id}`).send({ stage: 'repair' });
      expect(refused.status).toBe(409);
      expect(refused.body.error.message).toMatch(/No estimate has been sent/);
      const e = (await tech.post(`/api/restorations/${id}/estimates`).send(firstQuote)).body as Estimate;
      await owner.post(`/api/estimates/${e.id}/decision`).send({ decision: 'declined', name: 'Ada Owner', version: 1 });
      expect((await tech.patch(`/api/restorations/${id}`).send({ stage: 'repair' })).body.error.message).toMatch(
        /declined version 1/,
      );
      const v2 = (await tech.post(`/api/restorations/${id}/estimates`).send(firstQuote)).body as Estimate;
      await owner
        .post(`/api/estimates/${v2.id}/decision`)
        .send({ decision: 'approved', name: 'Ada Owner', version: 2 });
      expect((await tech.patch(`/api/restorations/${id}`).send({ stage: 'repair' })).status).toBe(200);
    } finally {
      await writeWorkshopSettings(t.db, settings);
    }
  });

  it('when recording the history line fails, then no estimate stays and no e-mail goes', async () => {
    const id = await newSet();
    const sentBefore = (await mails()).length;
    const res = await whileFailing(t.db, 'events', 'insert', () =>
      tech.post(`/api/restorations/${id}/estimates`).send(firstQuote),
    );
    expect(res.status).toBe(500);
    expect(await t.db.select().from(estimates).where(eq(estimates.restorationId, id))).toEqual([]);
    expect((await mails()).length).toBe(sentBefore);
  });

  it('when the estimate is sent, then the owner reads it in the history without amounts', async () => {
    const id = await newSet();
    await tech.post(`/api/restorations/${id}/estimates`).send(firstQuote);
    const events = (await owner.get(`/api/restorations/${id}/events`)).body as { kind: string; summary: string }[];
    expect(events.find((e) => e.kind === 'estimate-sent')?.summary).toBe('Estimate version 1 sent to the owner');
  });
});

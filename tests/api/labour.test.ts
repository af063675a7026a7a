import { eq } from 'drizzle-orm';
import type { Agent } from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { LabourLog } from '../../shared/schemas/labour';
import { labourEntries } from '../../server/db/schema';
import { weekStart } from '../../server/features/labour/labour.service';
import { createRestoration } from '../factories/restorations';
import { createUser, signedIn } from '../factories/users';
import { whileFailing } from '../support/fail-writes';
import { startTestApp } from '../support/test-app';

let t: Awaited<ReturnType<typeof startTestApp>>;
let tech: Agent, owner: Agent;
let techId: number, ownerId: number;
beforeAll(async () => {
  t = await startTestApp();
  const [a, b] = await Promise.all([createUser(t.db), createUser(t.db)]);
  [techId, ownerId] = [a.id, b.id];
  [tech, owner] = await Promise.all([signedIn(t.app, a), signedIn(t.app, b)]);
});
afterAll(() => t.stop());

const newSet = async () =>
  (
    await createRestoration(t.db, [
      { userId: techId, role: 'technician' },
      { userId: ownerId, role: 'owner' },
    ])
  ).id;

describe('the labour log', () => {
  it('when hours are typed, then they count in the week, billable apart', async () => {
    const id = await newSet();
    expect((await tech.post(`/api/restorations/${id}/labour`).send({ minutes: 90, stage: 'assessment' })).status).toBe(
      201,
    );
    const res = await tech
      .post(`/api/restorations/${id}/labour`)
      .send({ minutes: 30, stage: 'repair', billable: false, note: 'Rework of my own joint' });
    const log = res.body as LabourLog;
    expect(log.entries.map((e) => [e.minutes, e.billable])).toEqual(
      expect.arrayContaining([
        [90, true],
        [30, false],
      ]),
    );
    expect(log.week).toEqual([{ technician: expect.any(String), minutes: 120, billableMinutes: 90 }]);
  });

  it('when a timer is started, then a later request (a reload) still sees it running from the server’s start time, and stopping writes its minutes', async () => {
    const id = await newSet();
    expect((await tech.post(`/api/restorations/${id}/labour/timer`).send({ stage: 'repair' })).status).toBe(201);
    const reloaded = (await tech.get(`/api/restorations/${id}/labour`)).body as LabourLog;
    expect(reloaded.running).toMatchObject({ restorationId: id, stoppedAt: null, minutes: null });
    expect((await tech.post(`/api/restorations/${id}/labour/timer`).send({ stage: 'repair' })).status).toBe(409);
    // 25 minutes ago, as if the bench had been busy.
    await t.db
      .update(labourEntries)
      .set({ startedAt: new Date(Date.now() - 25 * 60_000) })
      .where(eq(labourEntries.id, reloaded.running!.id));
    const stopped = (await tech.post(`/api/restorations/${id}/labour/timer/stop`)).body as LabourLog;
    expect(stopped.running).toBeNull();
    expect(stopped.entries[0]!.minutes).toBe(25);
    expect((await tech.post(`/api/restorations/${id}/labour/timer/stop`)).status).toBe(409);
  });

  it('when time names both a finding and a stage, or neither, then it is refused', async () => {
    const id = await newSet();
    expect((await tech.post(`/api/restorations/${id}/labour`).send({ minutes: 10 })).status).toBe(400);
    expect(
      (await tech.post(`/api/restorations/${id}/labour`).send({ minutes: 10, stage: 'repair', findingId: 1 })).status,
    ).toBe(400);
  });

  it('when the history line cannot be written, then no time is logged', async () => {
    const id = await newSet();
    const res = await whileFailing(t.db, 'events', 'insert', () =>
      tech.post(`/api/restorations/${id}/labour`).send({ minutes: 15, stage: 'repair' }),
    );
    expect(res.status).toBe(500);
    expect(await t.db.select().from(labourEntries).where(eq(labourEntries.restorationId, id))).toEqual([]);
  });

  it('when an owner asks for the labour log, then it is refused', async () => {
    const id = await newSet();
    expect((await owner.get(`/api/restorations/${id}/labour`)).status).toBe(403);
  });

  it('starts the week on Monday 00:00 UTC (ISO 8601 weeks)', () => {
    // 2026-12-02 is a Wednesday (calendar); its ISO week began on Monday 2026-11-30.
    expect(weekStart(new Date('2026-12-02T07:00:00Z')).toISOString()).toBe('2026-11-30T00:00:00.000Z');
    // A Sunday belongs to the week that began six days earlier.
    expect(weekStart(new Date('2026-12-06T23:59:00Z')).toISOString()).toBe('2026-11-30T00:00:00.000Z');
  });
});

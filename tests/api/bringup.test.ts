import type { Agent } from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { prePowerItems } from '../../shared/schemas/bringup';
import type { TimelineEvent } from '../../shared/schemas/events';
import { createRestoration } from '../factories/restorations';
import { createUser, signedIn } from '../factories/users';
import { pdfText } from '../support/pdf-text';
import { startTestApp } from '../support/test-app';

let t: Awaited<ReturnType<typeof startTestApp>>;
let tech: Agent, owner: Agent, mentor: Agent;
let techId: number, ownerId: number, mentorId: number;
beforeAll(async () => {
  t = await startTestApp();
  const [a, b, c] = await Promise.all([createUser(t.db), createUser(t.db), createUser(t.db)]);
  [techId, ownerId, mentorId] = [a.id, b.id, c.id];
  [tech, owner, mentor] = await Promise.all([signedIn(t.app, a), signedIn(t.app, b), signedIn(t.app, c)]);
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

/** Every pre-power item done, except the isolation transformer (not applicable) and the limiter (waived). */
async function completeChecklist(id: number) {
  for (const item of prePowerItems) {
    const body =
      item === 'isolation-transformer'
        ? { item, status: 'not-applicable', reason: 'Mains transformer, earthed chassis' }
        : item === 'current-limiter'
          ? { item, status: 'waived', reason: 'Lamp holder broken; brought up on the variable transformer alone' }
          : { item, status: 'done' };
    expect((await tech.put(`/api/restorations/${id}/bringup/pre-power`).send(body)).status).toBe(200);
  }
}

const history = async (agent: Agent, id: number) =>
  (await agent.get(`/api/restorations/${id}/events`)).body as TimelineEvent[];

describe('the first-power gate', () => {
  it('when the pre-power checklist is not signed off, then moving to Testing is refused with 409 saying what to do, and the stage stays', async () => {
    const id = await newSet();
    const res = await tech.patch(`/api/restorations/${id}`).send({ stage: 'testing' });
    expect(res.status).toBe(409);
    expect(res.body.error.message).toMatch(/Sign off the pre-power checklist before moving the set to Testing/);
    expect(res.body.error.message).toMatch(/Bring-up tab/);
    expect(res.body.error.details.missing).toHaveLength(prePowerItems.length);
    expect((await tech.get(`/api/restorations/${id}`)).body.stage).toBe('intake');
    expect((await history(tech, id)).filter((e) => e.kind === 'stage-changed')).toHaveLength(0);
  });

  it('when a reading taken with power on is recorded before the sign-off, then it is refused with 409; a cold reading is not', async () => {
    const id = await newSet();
    const hot = await tech
      .post(`/api/restorations/${id}/measurements`)
      .send({ location: 'HT', quantity: 'dc-voltage', expected: '250', reading: '262', powerOn: true });
    expect(hot.status).toBe(409);
    expect(hot.body.error.message).toMatch(/before recording a reading taken with the set powered/);
    const cold = await tech
      .post(`/api/restorations/${id}/measurements`)
      .send({ location: 'R23', quantity: 'resistance', expected: '150', reading: '212' });
    expect(cold.status).toBe(201);
    expect(cold.body.powerOn).toBe(false);
    // Marking a cold reading as powered afterwards goes through the same gate.
    expect((await tech.patch(`/api/measurements/${cold.body.id}`).send({ powerOn: true })).status).toBe(409);
    expect((await tech.get(`/api/restorations/${id}/measurements`)).body).toHaveLength(1);
  });

  it('when the checklist is incomplete, then the sign-off is refused and lists what is missing', async () => {
    const id = await newSet();
    await tech.put(`/api/restorations/${id}/bringup/pre-power`).send({ item: 'mains-tap', status: 'done' });
    const res = await tech.post(`/api/restorations/${id}/bringup/pre-power/sign-off`);
    expect(res.status).toBe(409);
    expect(res.body.error.details.missing).toHaveLength(prePowerItems.length - 1);
    expect(res.body.error.message).toMatch(/Filter and reservoir capacitors/);
  });

  it('when "not applicable" or "waived" has no reason, then it is refused with 400', async () => {
    const id = await newSet();
    const res = await tech
      .put(`/api/restorations/${id}/bringup/pre-power`)
      .send({ item: 'isolation-transformer', status: 'waived', reason: '  ' });
    expect(res.status).toBe(400);
    expect(res.body.error.message).toMatch(/reason/);
  });

  it('when a technician signs the checklist off, then Testing and powered readings are allowed, and the waiver is red in the history', async () => {
    const id = await newSet();
    await completeChecklist(id);
    const signed = await tech.post(`/api/restorations/${id}/bringup/pre-power/sign-off`);
    expect(signed.status).toBe(200);
    expect(signed.body.prePower.signedOff).not.toBeNull();
    expect(signed.body.prePower.missing).toEqual([]);

    expect((await tech.patch(`/api/restorations/${id}`).send({ stage: 'testing' })).status).toBe(200);
    expect(
      (
        await tech
          .post(`/api/restorations/${id}/measurements`)
          .send({ location: 'HT', quantity: 'dc-voltage', reading: '262', powerOn: true })
      ).status,
    ).toBe(201);

    for (const agent of [tech, owner]) {
      const events = await history(agent, id);
      const waived = events.filter((e) => e.caution);
      expect(waived.map((e) => e.kind).sort()).toEqual(['pre-power-set', 'pre-power-signed']);
      expect(waived.every((e) => /waived/.test(e.summary) && /Lamp holder broken/.test(e.summary))).toBe(true);
      expect(events.find((e) => e.kind === 'pre-power-set' && /Isolation transformer/.test(e.summary))?.caution).toBe(
        false,
      );
    }
  });

  it('when an item changes after the sign-off, then the sign-off is withdrawn and the gate closes again', async () => {
    const id = await newSet();
    await completeChecklist(id);
    await tech.post(`/api/restorations/${id}/bringup/pre-power/sign-off`);
    const changed = await tech
      .put(`/api/restorations/${id}/bringup/pre-power`)
      .send({ item: 'mains-tap', status: null });
    expect(changed.body.prePower.signedOff).toBeNull();
    expect((await tech.patch(`/api/restorations/${id}`).send({ stage: 'testing' })).status).toBe(409);
    expect((await history(tech, id)).some((e) => e.kind === 'pre-power-voided' && e.caution)).toBe(true);
  });
});

describe('the staged power-up log', () => {
  it('when steps are logged, then they are numbered, their readings are ordinary powered readings with verdicts, and a stop is red', async () => {
    const id = await newSet();
    const refused = await tech.post(`/api/restorations/${id}/bringup/steps`).send({
      supply: 'series-lamp',
      lampWatts: 60,
      lampVolts: 230,
      appliedVolts: 230,
      lampBehaviour: 'flash-then-dim',
      decision: 'go-on',
    });
    expect(refused.status).toBe(409);
    await completeChecklist(id);
    await tech.post(`/api/restorations/${id}/bringup/pre-power/sign-off`);

    const first = await tech.post(`/api/restorations/${id}/bringup/steps`).send({
      supply: 'series-lamp',
      lampWatts: 60,
      lampVolts: 230,
      appliedVolts: 230,
      lampBehaviour: 'bright-staying',
      decision: 'stop',
      notes: 'Reservoir warm',
      readings: [{ location: 'HT', quantity: 'dc-voltage', expected: '250', tolerance: '10', reading: '95' }],
    });
    expect(first.status).toBe(201);
    const second = await tech.post(`/api/restorations/${id}/bringup/steps`).send({
      supply: 'variable-transformer',
      appliedVolts: 230,
      lampBehaviour: 'no-lamp',
      decision: 'go-on',
      readings: [
        { location: 'HT', quantity: 'dc-voltage', expected: '250', tolerance: '10', reading: '255' },
        { location: 'Mains input', quantity: 'current', reading: '0.21 A' },
      ],
    });
    expect(second.body.steps.map((s: { number: number; decision: string }) => [s.number, s.decision])).toEqual([
      [1, 'stop'],
      [2, 'go-on'],
    ]);
    expect(second.body.steps[1].readings.map((r: { verdict: string }) => r.verdict)).toEqual(['within', 'unknown']);

    const readings = (await tech.get(`/api/restorations/${id}/measurements`)).body as {
      location: string;
      verdict: string;
      powerOn: boolean;
      conditions: string;
    }[];
    expect(readings.map((r) => [r.location, r.verdict, r.powerOn])).toEqual([
      ['HT', 'out', true],
      ['HT', 'within', true],
      ['Mains input', 'unknown', true],
    ]);
    expect(readings[0]!.conditions).toMatch(/Power-up step 1: series lamp, 60 W lamp, 230 V applied/);

    const events = await history(tech, id);
    const steps = events.filter((e) => e.kind === 'bringup-step');
    expect(steps.map((e) => e.caution)).toEqual([false, true]);
    expect(events.some((e) => e.kind === 'measurement-out')).toBe(true);
  });

  it('when a series-lamp step has no lamp rating, then it is refused with 400', async () => {
    const id = await newSet();
    await completeChecklist(id);
    await tech.post(`/api/restorations/${id}/bringup/pre-power/sign-off`);
    const res = await tech
      .post(`/api/restorations/${id}/bringup/steps`)
      .send({ supply: 'series-lamp', lampBehaviour: 'flash-then-dim', decision: 'go-on' });
    expect(res.status).toBe(400);
  });
});

describe('who may do what', () => {
  it('when an owner reads the bring-up, then bench notes are withheld; owners and mentors may not record or sign off', async () => {
    const id = await newSet();
    await tech
      .put(`/api/restorations/${id}/bringup/intake`)
      .send({ item: 'mains-lead', done: true, note: 'Perished, replace' });
    const mine = (await tech.get(`/api/restorations/${id}/bringup`)).body;
    expect(mine.intake.find((i: { item: string }) => i.item === 'mains-lead')).toMatchObject({
      done: true,
      note: 'Perished, replace',
    });
    const theirs = (await owner.get(`/api/restorations/${id}/bringup`)).body;
    expect(theirs.intake.find((i: { item: string }) => i.item === 'mains-lead')).toMatchObject({
      done: true,
      note: '',
    });
    for (const agent of [owner, mentor]) {
      expect(
        (await agent.put(`/api/restorations/${id}/bringup/intake`).send({ item: 'mains-lead', done: false })).status,
      ).toBe(403);
      expect((await agent.post(`/api/restorations/${id}/bringup/pre-power/sign-off`)).status).toBe(403);
    }
  });
});

describe('on the report', () => {
  const binary = (res: NodeJS.ReadableStream, cb: (err: Error | null, body: Buffer) => void) => {
    const chunks: Buffer[] = [];
    res.on('data', (c: Buffer) => chunks.push(c));
    res.on('end', () => cb(null, Buffer.concat(chunks)));
  };

  it('when the owner downloads the report, then it shows the sign-off, the waiver with its reason and the steps, without bench notes', async () => {
    const id = await newSet();
    await completeChecklist(id);
    await tech.post(`/api/restorations/${id}/bringup/pre-power/sign-off`);
    await tech.post(`/api/restorations/${id}/bringup/steps`).send({
      supply: 'variable-transformer',
      appliedVolts: 120,
      lampBehaviour: 'no-lamp',
      decision: 'stop',
      notes: 'BENCH-ONLY-NOTE',
    });
    const res = await owner
      .get(`/api/restorations/${id}/report.pdf`)
      .buffer(true)
      .parse(binary as never);
    expect(res.status).toBe(200);
    const text = (await pdfText(res.body as Buffer)).replace(/\s+/g, ' ');
    expect(text).toMatch(/Before the first switch-on/);
    expect(text).toMatch(/The pre-power checklist was signed off by/);
    expect(text).toMatch(/Waived: The first switch-on was made through a current limiter — Lamp holder broken/);
    expect(text).toMatch(/Step 1: Variable transformer, 120 V — stop and find the fault/);
    expect(text).not.toMatch(/BENCH-ONLY-NOTE/);
  });
});

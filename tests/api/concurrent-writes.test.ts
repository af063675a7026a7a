import { and, count, eq } from 'drizzle-orm';
import type { Agent } from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { comments, events, memberships, notifications } from '../../server/db/schema';
import type { Mailer, OutgoingMail } from '../../server/mail';
import { flushNotificationMail } from '../../server/features/notifications/mail-batch';
import { createPhotoRow } from '../factories/photos';
import { createRestoration } from '../factories/restorations';
import { createUser, signedIn } from '../factories/users';
import { startTestApp } from '../support/test-app';

let t: Awaited<ReturnType<typeof startTestApp>>;
beforeAll(async () => {
  t = await startTestApp();
});
afterAll(() => t.stop());

const technicians = async (restorationId: number) =>
  (
    await t.db
      .select({ n: count() })
      .from(memberships)
      .where(and(eq(memberships.restorationId, restorationId), eq(memberships.role, 'technician')))
  )[0]!.n;

describe('the last technician, under concurrency', () => {
  it('when two technicians demote each other at the same moment, then one change wins and one technician is left', async () => {
    const [a, b] = await Promise.all([createUser(t.db), createUser(t.db)]);
    const [agentA, agentB] = await Promise.all([signedIn(t.app, a), signedIn(t.app, b)]);
    // Several rounds: a check-then-write race shows up in at least one of them when nothing serialises it.
    for (let round = 0; round < 6; round++) {
      const set = await createRestoration(t.db, [
        { userId: a.id, role: 'technician' },
        { userId: b.id, role: 'technician' },
      ]);
      const results = await Promise.all([
        agentA.patch(`/api/restorations/${set.id}/members/${b.id}`).send({ role: 'mentor' }),
        round % 2
          ? agentB.delete(`/api/restorations/${set.id}/members/${a.id}`)
          : agentB.patch(`/api/restorations/${set.id}/members/${a.id}`).send({ role: 'mentor' }),
      ]);
      // The loser is refused either by the rule (409) or, when the winner committed before its guard ran, because it
      // is no longer a technician allowed to manage people (403).
      expect(results.filter((r) => r.status < 300)).toHaveLength(1);
      expect([403, 409]).toContain(results.find((r) => r.status >= 300)!.status);
      expect(await technicians(set.id)).toBe(1);
    }
  });
});

describe('a finding changed twice at once', () => {
  it('when two requests ask the mentors together, then the question is recorded once and each mentor notified once', async () => {
    const [tech, mentor] = await Promise.all([createUser(t.db), createUser(t.db)]);
    const set = await createRestoration(t.db, [
      { userId: tech.id, role: 'technician' },
      { userId: mentor.id, role: 'mentor' },
    ]);
    const photoId = await createPhotoRow(t.db, set.id);
    const [a, b] = await Promise.all([signedIn(t.app, tech), signedIn(t.app, tech)]);
    const f = (
      await a
        .post(`/api/photos/${photoId}/findings`)
        .send({ shape: 'pin', points: [{ x: 0.6, y: 0.3 }], title: 'HT sags under load' })
    ).body;
    const results = await Promise.all([
      a.patch(`/api/findings/${f.id}`).send({ questionOpen: true }),
      b.patch(`/api/findings/${f.id}`).send({ questionOpen: true }),
    ]);
    expect(results.map((r) => r.status)).toEqual([200, 200]);
    const asked = await t.db
      .select({ n: count() })
      .from(events)
      .where(and(eq(events.findingId, f.id), eq(events.kind, 'question-asked')));
    expect(asked[0]!.n).toBe(1);
    const notes = await t.db
      .select({ n: count() })
      .from(notifications)
      .where(and(eq(notifications.findingId, f.id), eq(notifications.userId, mentor.id)));
    expect(notes[0]!.n).toBe(1);
  });
});

describe('notification e-mail batches', () => {
  async function setWithPeople(n: number) {
    const people = await Promise.all(Array.from({ length: n + 1 }, () => createUser(t.db)));
    const set = await createRestoration(
      t.db,
      people.map((p, i) => ({ userId: p.id, role: i ? 'mentor' : 'technician' }) as const),
    );
    const photoId = await createPhotoRow(t.db, set.id);
    const tech = await signedIn(t.app, people[0]!);
    const finding = await tech
      .post(`/api/photos/${photoId}/findings`)
      .send({ shape: 'pin', points: [{ x: 0.2, y: 0.2 }], title: 'Leaky coupling capacitor' });
    const mentors = people.slice(1);
    await t.db.insert(notifications).values(
      mentors.map((m) => ({
        userId: m.id,
        restorationId: set.id,
        findingId: finding.body.id,
        kind: 'question' as const,
        summary: `Question for ${m.name}`,
      })),
    );
    return mentors;
  }
  const recordingMailer = (failFor = new Set<string>()): Mailer & { sent: OutgoingMail[] } => ({
    sent: [],
    async send(mail) {
      if (failFor.delete(mail.to)) throw new Error('451 try again later');
      this.sent.push(mail);
    },
    probe: async () => true,
  });
  const deps = (mailer: Mailer) => ({ db: t.db, mailer, config: t.deps.config });

  it('when sending fails for one person mid-batch, then the others are not mailed again and that person is mailed on the next try', async () => {
    const mentors = await setWithPeople(3);
    const unlucky = mentors[1]!.email;
    const mailer = recordingMailer(new Set([unlucky]));
    await expect(flushNotificationMail(deps(mailer))).rejects.toThrow(/1 of \d+ notification e-mails failed/);
    await flushNotificationMail(deps(mailer));
    await flushNotificationMail(deps(mailer));
    const to = mailer.sent
      .map((m) => m.to)
      .filter((address) => mentors.some((p) => p.email === address))
      .sort();
    expect(to).toEqual(mentors.map((m) => m.email).sort());
  });

  it('when two flushes run at once, then each person gets one e-mail', async () => {
    const mentors = await setWithPeople(4);
    const mailer = recordingMailer();
    await Promise.all([
      flushNotificationMail(deps(mailer)),
      flushNotificationMail(deps(mailer)),
      flushNotificationMail(deps(mailer)),
    ]);
    const to = mailer.sent
      .map((m) => m.to)
      .filter((address) => mentors.some((p) => p.email === address))
      .sort();
    expect(to).toEqual(mentors.map((m) => m.email).sort());
  });
});

describe('a comment posted twice by a retry', () => {
  let tech: Agent, mentor: Agent;
  let findingId: number, otherFindingId: number;
  beforeAll(async () => {
    const [a, b] = await Promise.all([createUser(t.db), createUser(t.db)]);
    const set = await createRestoration(t.db, [
      { userId: a.id, role: 'technician' },
      { userId: b.id, role: 'mentor' },
    ]);
    const photoId = await createPhotoRow(t.db, set.id);
    [tech, mentor] = await Promise.all([signedIn(t.app, a), signedIn(t.app, b)]);
    const place = (title: string) =>
      tech.post(`/api/photos/${photoId}/findings`).send({ shape: 'pin', points: [{ x: 0.4, y: 0.4 }], title });
    [findingId, otherFindingId] = [
      (await place('Scorched dropper')).body.id,
      (await place('Noisy volume pot')).body.id,
    ];
  });
  const stored = async (id: number) =>
    (await t.db.select({ n: count() }).from(comments).where(eq(comments.findingId, id)))[0]!.n;
  const post = (id: number, key: string | undefined, body = 'Check the dropper value against the circuit') => {
    const req = mentor.post(`/api/findings/${id}/comments`);
    if (key) req.set('Idempotency-Key', key);
    return req.send({ body, internal: true });
  };

  it('when the same Idempotency-Key comes twice, then one comment is stored, one notification sent, and both answers match', async () => {
    const first = await post(findingId, 'c0ffee00-0000-4000-8000-000000000001');
    const second = await post(findingId, 'c0ffee00-0000-4000-8000-000000000001');
    expect(first.status).toBe(201);
    expect(second.status).toBe(201);
    expect(second.body).toEqual(first.body);
    expect(await stored(findingId)).toBe(1);
    expect(
      (await t.db.select({ n: count() }).from(notifications).where(eq(notifications.commentId, first.body.id)))[0]!.n,
    ).toBe(1);
  });

  it('when two posts with one key arrive together, then both get the one stored comment', async () => {
    const before = await stored(findingId);
    const [a, b] = await Promise.all([post(findingId, 'twin-key-2'), post(findingId, 'twin-key-2')]);
    expect([a.status, b.status]).toEqual([201, 201]);
    expect(a.body.id).toBe(b.body.id);
    expect(await stored(findingId)).toBe(before + 1);
  });

  it('when a key is reused for another finding or other words, then 409; without a key, each post is stored', async () => {
    expect((await post(otherFindingId, 'c0ffee00-0000-4000-8000-000000000001')).status).toBe(409);
    expect(
      (await post(findingId, 'c0ffee00-0000-4000-8000-000000000001', 'Different words under the same key')).status,
    ).toBe(409);
    expect(await stored(otherFindingId)).toBe(0);
    await post(otherFindingId, undefined);
    await post(otherFindingId, undefined);
    expect(await stored(otherFindingId)).toBe(2);
    expect((await post(otherFindingId, 'bad key with spaces')).status).toBe(400);
  });
});

import type { Agent } from 'supertest';
import type { CapturedMail } from '../../shared/schemas/dev-mail';
import { findingSchema } from '../../shared/schemas/findings';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { flushNotificationMail } from '../../server/features/notifications/mail-batch';
import { createPhotoRow } from '../factories/photos';
import { createRestoration } from '../factories/restorations';
import { createUser, signedIn } from '../factories/users';
import { waitForMail } from '../support/mail';
import { startTestApp } from '../support/test-app';

let t: Awaited<ReturnType<typeof startTestApp>>;
let tech: Agent, mentor: Agent, owner: Agent;
let people: Record<'tech' | 'mentor' | 'owner', Awaited<ReturnType<typeof createUser>>>;
let restorationId: number;
let sharedPhoto: number;
let privatePhoto: number;

beforeAll(async () => {
  t = await startTestApp();
  people = {
    tech: await createUser(t.db, { name: 'Mara Bench' }),
    mentor: await createUser(t.db, { name: 'Teodor Afar' }),
    owner: await createUser(t.db, { name: 'Imogen Home' }),
  };
  restorationId = (
    await createRestoration(t.db, [
      { userId: people.tech.id, role: 'technician' },
      { userId: people.mentor.id, role: 'mentor' },
      { userId: people.owner.id, role: 'owner' },
    ])
  ).id;
  sharedPhoto = await createPhotoRow(t.db, restorationId, true);
  privatePhoto = await createPhotoRow(t.db, restorationId, false);
  [tech, mentor, owner] = await Promise.all([
    signedIn(t.app, people.tech),
    signedIn(t.app, people.mentor),
    signedIn(t.app, people.owner),
  ]);
});
afterAll(() => t.stop());

const pin = (title: string, extra: object = {}) => ({
  shape: 'pin',
  points: [{ x: 0.5096, y: 0.4238 }],
  title,
  componentRef: 'R23',
  kind: 'overheated',
  severity: 'fault',
  ...extra,
});
const mails = async () => (await t.request().get('/api/dev/mail')).body as CapturedMail[];

describe('findings', () => {
  it('when a technician pins a finding, then it is numbered, kept in image coordinates and listed on its photo', async () => {
    // A restoration of its own, so the numbers do not depend on what other tests placed.
    const own = await createRestoration(t.db, [
      { userId: people.tech.id, role: 'technician' },
      { userId: people.mentor.id, role: 'mentor' },
    ]);
    const sharedPhoto = await createPhotoRow(t.db, own.id, true);
    const a = await tech.post(`/api/photos/${sharedPhoto}/findings`).send(pin('Leaky coupling capacitor'));
    expect(a.status).toBe(201);
    expect(a.body).toMatchObject({
      number: 1,
      shape: 'pin',
      points: [{ x: 0.5096, y: 0.4238 }],
      status: 'observed',
      componentRef: 'R23',
      ownerVisible: false,
    });
    const b = await mentor.post(`/api/photos/${sharedPhoto}/findings`).send({
      shape: 'circle',
      points: [
        { x: 0.3, y: 0.7 },
        { x: 0.35, y: 0.7 },
      ],
      title: 'Check this joint',
    });
    expect(b.body.number).toBe(2);
    const list = (await mentor.get(`/api/photos/${sharedPhoto}/findings`)).body;
    expect(list.map((f: { number: number }) => f.number)).toEqual([1, 2]);
    // The list is assembled in SQL; it must carry exactly the contract's shape and the same values as one finding.
    expect(findingSchema.array().parse(list)).toEqual(list);
    expect(list[0]).toEqual((await mentor.get(`/api/findings/${a.body.id}`)).body);
  });

  it('when geometry or a reference is malformed, then 400 says what is wrong', async () => {
    const bad = [
      { ...pin('x'), points: [{ x: 1.2, y: 0.5 }] },
      { ...pin('x'), shape: 'rect' },
      { ...pin('x'), componentRef: 'the big one' },
      { ...pin(''), title: '' },
    ];
    for (const body of bad)
      expect((await tech.post(`/api/photos/${sharedPhoto}/findings`).send(body)).status).toBe(400);
  });

  it('when a mentor edits a finding they did not place, then it is refused; their own they may move', async () => {
    const techs = (await tech.post(`/api/photos/${sharedPhoto}/findings`).send(pin('Tech placed'))).body;
    const mine = (await mentor.post(`/api/photos/${sharedPhoto}/findings`).send(pin('Mentor placed'))).body;
    expect((await mentor.patch(`/api/findings/${techs.id}`).send({ points: [{ x: 0.1, y: 0.1 }] })).status).toBe(403);
    expect((await mentor.patch(`/api/findings/${mine.id}`).send({ points: [{ x: 0.2, y: 0.3 }] })).status).toBe(200);
    expect((await mentor.delete(`/api/findings/${techs.id}`)).status).toBe(403);
    expect((await tech.patch(`/api/findings/${mine.id}`).send({ status: 'confirmed' })).body.status).toBe('confirmed');
  });

  it('when a finding is dismissed without a reason, then 400; every change is kept with who and when', async () => {
    const f = (await tech.post(`/api/photos/${sharedPhoto}/findings`).send(pin('Maybe a dry joint'))).body;
    expect((await tech.patch(`/api/findings/${f.id}`).send({ status: 'dismissed' })).status).toBe(400);
    await tech.patch(`/api/findings/${f.id}`).send({ status: 'suspected' });
    await tech
      .patch(`/api/findings/${f.id}`)
      .send({ status: 'dismissed', dismissReason: 'Reflowed, it was flux residue' });
    const history = (await mentor.get(`/api/findings/${f.id}/history`)).body;
    expect(history[0]).toMatchObject({
      actorName: 'Mara Bench',
      changes: { status: ['suspected', 'dismissed'], dismissReason: [null, 'Reflowed, it was flux residue'] },
    });
    expect(history[1].changes.status).toEqual(['observed', 'suspected']);
  });
});

describe('threads and what the owner sees', () => {
  it('when comments are internal, then the owner never receives them by list, notification or e-mail; shared ones reach them', async () => {
    const f = (await tech.post(`/api/photos/${sharedPhoto}/findings`).send(pin('Bulging filter capacitor'))).body;
    expect((await owner.get(`/api/findings/${f.id}`)).status).toBe(404);
    await tech.patch(`/api/findings/${f.id}`).send({ ownerVisible: true });
    expect((await owner.get(`/api/findings/${f.id}`)).status).toBe(200);

    const secret = 'INTERNAL-ONLY: quote was too low, do not mention @Imogen';
    expect((await mentor.post(`/api/findings/${f.id}/comments`).send({ body: secret, internal: true })).status).toBe(
      201,
    );
    const shared = await tech
      .post(`/api/findings/${f.id}/comments`)
      .send({ body: 'We will replace C30 with a modern part of the same rating, @Imogen.', internal: false });
    expect(shared.status).toBe(201);

    const thread = (await owner.get(`/api/findings/${f.id}/comments`)).body;
    expect(thread.map((c: { internal: boolean }) => c.internal)).toEqual([false]);
    const notes = (await owner.get('/api/notifications')).body;
    expect(JSON.stringify(notes)).not.toContain('INTERNAL-ONLY');
    expect(notes[0].kind).toBe('mention');
    // Sent by the flush that each new notification starts; polled because it runs in the background.
    await waitForMail(mails, people.owner.email, /Gridleak/);
    const ownerMail = (await mails()).filter((m) => m.to === people.owner.email);
    expect(JSON.stringify(ownerMail)).not.toContain('INTERNAL-ONLY');
    // An owner's own comment always lands in the shared thread.
    const fromOwner = await owner.post(`/api/findings/${f.id}/comments`).send({ body: 'Thank you!', internal: true });
    expect(fromOwner.body.internal).toBe(false);
  });

  it('when the owner asks for an unshared finding or its thread, then it does not exist for them', async () => {
    const hidden = (
      await tech.post(`/api/photos/${privatePhoto}/findings`).send(pin('Not for the owner', { ownerVisible: true }))
    ).body;
    // Shared finding on an unshared photo: still hidden.
    expect((await owner.get(`/api/findings/${hidden.id}`)).status).toBe(404);
    expect((await owner.get(`/api/findings/${hidden.id}/comments`)).status).toBe(404);
    expect((await owner.post(`/api/findings/${hidden.id}/comments`).send({ body: 'hello' })).status).toBe(404);
    expect((await owner.get(`/api/photos/${privatePhoto}/findings`)).status).toBe(404);
    const table = (await owner.get(`/api/restorations/${restorationId}/findings`)).body;
    expect(table.map((x: { id: number }) => x.id)).not.toContain(hidden.id);
  });

  it('when a comment is edited or deleted, then it is marked so; only its author edits it', async () => {
    const f = (await tech.post(`/api/photos/${sharedPhoto}/findings`).send(pin('Edit me'))).body;
    const c = (await mentor.post(`/api/findings/${f.id}/comments`).send({ body: 'Line one\nhttps://example.org/data' }))
      .body;
    expect((await tech.patch(`/api/comments/${c.id}`).send({ body: 'hijack' })).status).toBe(403);
    const edited = (await mentor.patch(`/api/comments/${c.id}`).send({ body: 'Line one, corrected' })).body;
    expect(edited.editedAt).not.toBeNull();
    expect((await tech.delete(`/api/comments/${c.id}`)).status).toBe(204);
    const [gone] = (await mentor.get(`/api/findings/${f.id}/comments`)).body;
    expect(gone).toMatchObject({ body: '', deletedAt: expect.any(String) });
  });
});

describe('questions and e-mail batching', () => {
  it('when a technician asks the mentors, then it waits on their bench until resolved', async () => {
    const f = (await tech.post(`/api/photos/${sharedPhoto}/findings`).send(pin('Why does HT sag?'))).body;
    expect((await mentor.patch(`/api/findings/${f.id}`).send({ questionOpen: true })).status).toBe(403);
    await tech.patch(`/api/findings/${f.id}`).send({ questionOpen: true });
    expect((await mentor.get('/api/questions')).body.map((q: { findingId: number }) => q.findingId)).toContain(f.id);
    // The technician who asked is not shown their own question as waiting for them.
    expect((await tech.get('/api/questions')).body.map((q: { findingId: number }) => q.findingId)).not.toContain(f.id);
    expect((await owner.get('/api/questions')).body).toEqual([]);
    expect((await mentor.get('/api/notifications')).body[0]).toMatchObject({ kind: 'question', findingId: f.id });
    await mentor.patch(`/api/findings/${f.id}`).send({ questionOpen: false });
    expect((await mentor.get('/api/questions')).body.map((q: { findingId: number }) => q.findingId)).not.toContain(
      f.id,
    );
  });

  it('when a burst of comments mentions someone, then they get one e-mail per window linking to the finding', async () => {
    const reader = await createUser(t.db, { name: 'Quentin Burst' });
    const r = await createRestoration(t.db, [
      { userId: people.tech.id, role: 'technician' },
      { userId: reader.id, role: 'mentor' },
    ]);
    const photo = await createPhotoRow(t.db, r.id, false);
    const f = (await tech.post(`/api/photos/${photo}/findings`).send(pin('Burst'))).body;
    for (let i = 0; i < 4; i++)
      await tech.post(`/api/findings/${f.id}/comments`).send({ body: `@Quentin reading ${i}: 2${i}0 V` });
    await waitForMail(mails, reader.email, /Gridleak/);
    await flushNotificationMail(t.deps);
    const toReader = (await mails()).filter((m) => m.to === reader.email);
    // The first mention went at once; the other three wait for the window and then travel together.
    expect(toReader).toHaveLength(1);
    expect(toReader[0]!.text).toContain(`/restorations/${r.id}/photos/${photo}/findings/${f.id}`);
    await flushNotificationMail(t.deps, new Date(Date.now() + 181_000));
    const later = (await mails()).filter((m) => m.to === reader.email);
    expect(later).toHaveLength(2);
    expect(later[0]!.subject).toMatch(/3 new items/);
    expect((await (await signedIn(t.app, reader)).get('/api/notifications')).body).toHaveLength(4);
  });
});

import type { Agent } from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { CapturedMail } from '../../shared/schemas/dev-mail';
import { flushNotificationMail } from '../../server/features/notifications/mail-batch';
import { createPhotoRow } from '../factories/photos';
import { createRestoration } from '../factories/restorations';
import { createUser, signedIn } from '../factories/users';
import { waitForMail } from '../support/mail';
import { startTestApp } from '../support/test-app';

// Each leak an owner could once see, checked through the API: the expected answers are the product's rule
// that an owner reads only what was shared (PRODUCT.md "Who uses it"); no outside source.
let t: Awaited<ReturnType<typeof startTestApp>>;
let tech: Agent, owner: Agent;
let people: Record<'tech' | 'owner', Awaited<ReturnType<typeof createUser>>>;
let restorationId: number, sharedPhoto: number, privatePhoto: number;

beforeAll(async () => {
  t = await startTestApp({ notificationWindowSeconds: 3600 });
  people = {
    tech: await createUser(t.db, { name: 'Teodor Brask' }),
    owner: await createUser(t.db, { name: 'Orla Home' }),
  };
  restorationId = (
    await createRestoration(t.db, [
      { userId: people.tech.id, role: 'technician' },
      { userId: people.owner.id, role: 'owner' },
    ])
  ).id;
  sharedPhoto = await createPhotoRow(t.db, restorationId, true);
  privatePhoto = await createPhotoRow(t.db, restorationId, false);
  [tech, owner] = await Promise.all([signedIn(t.app, people.tech), signedIn(t.app, people.owner)]);
});
afterAll(() => t.stop());

const pin = (title: string, extra: object = {}) => ({ shape: 'pin', points: [{ x: 0.4, y: 0.4 }], title, ...extra });
const mails = async () => (await t.request().get('/api/dev/mail')).body as CapturedMail[];
const ownerMail = async () => JSON.stringify((await mails()).filter((m) => m.to === people.owner.email));
const ownerNotes = async () => JSON.stringify((await owner.get('/api/notifications')).body);

describe('notifications reach an owner only about what they may see, judged when read and when sent', () => {
  it('when a shared comment mentions the owner on an internal finding, then neither the list nor the e-mail carries it', async () => {
    const f = (await tech.post(`/api/photos/${sharedPhoto}/findings`).send(pin('INTERNAL-FINDING-TITLE'))).body;
    expect(
      (await tech.post(`/api/findings/${f.id}/comments`).send({ body: 'SHARED-ON-INTERNAL @Orla', internal: false }))
        .status,
    ).toBe(201);
    await flushNotificationMail(t.deps, new Date(Date.now() + 7200_000));
    expect(await ownerNotes()).not.toMatch(/SHARED-ON-INTERNAL|INTERNAL-FINDING-TITLE/);
    expect(await ownerMail()).not.toMatch(/SHARED-ON-INTERNAL|INTERNAL-FINDING-TITLE/);
  });

  it('when a finding is unshared after a reply to the owner was written, then the reply leaves their list and is never mailed', async () => {
    const f = (
      await tech.post(`/api/photos/${sharedPhoto}/findings`).send(pin('Hum at switch-on', { ownerVisible: true }))
    ).body;
    expect((await owner.post(`/api/findings/${f.id}/comments`).send({ body: 'It hums when cold.' })).status).toBe(201);
    // The first reply is mailed at once; the second waits for the window.
    await tech
      .post(`/api/findings/${f.id}/comments`)
      .send({ body: 'FIRST-REPLY checking the smoothing', internal: false });
    await waitForMail(mails, people.owner.email, /FIRST-REPLY/);
    await tech.post(`/api/findings/${f.id}/comments`).send({ body: 'SECOND-REPLY before unsharing', internal: false });
    expect(await ownerNotes()).toContain('SECOND-REPLY');

    await tech.patch(`/api/findings/${f.id}`).send({ ownerVisible: false });
    expect(await ownerNotes()).not.toMatch(/FIRST-REPLY|SECOND-REPLY/);
    await flushNotificationMail(t.deps, new Date(Date.now() + 7200_000));
    expect(await ownerMail()).not.toContain('SECOND-REPLY');
    // The technician's own view is untouched.
    expect((await tech.get(`/api/findings/${f.id}/comments`)).body).toHaveLength(3);
  });
});

describe('a finding history from before it was shared stays in the workshop', () => {
  it('when a finding was renamed and dismissed while internal, then the owner reads only changes made after sharing', async () => {
    const f = (await tech.post(`/api/photos/${sharedPhoto}/findings`).send(pin('OLD-TITLE-SECRET'))).body;
    await tech.patch(`/api/findings/${f.id}`).send({ title: 'Charred cathode resistor' });
    await tech.patch(`/api/findings/${f.id}`).send({ status: 'dismissed', dismissReason: 'DISMISS-REASON-SECRET' });
    await tech.patch(`/api/findings/${f.id}`).send({ status: 'suspected' });
    await tech.patch(`/api/findings/${f.id}`).send({ questionOpen: true });
    await tech.patch(`/api/findings/${f.id}`).send({ ownerVisible: true });
    await tech.patch(`/api/findings/${f.id}`).send({ status: 'repaired' });

    const techHistory = JSON.stringify((await tech.get(`/api/findings/${f.id}/history`)).body);
    expect(techHistory).toMatch(/OLD-TITLE-SECRET/);
    expect(techHistory).toMatch(/DISMISS-REASON-SECRET/);
    const history = (await owner.get(`/api/findings/${f.id}/history`)).body as { changes: Record<string, unknown> }[];
    expect(history.map((h) => h.changes)).toEqual([{ status: ['suspected', 'repaired'] }]);

    const events = JSON.stringify((await owner.get(`/api/restorations/${restorationId}/events`)).body);
    expect(events).toContain('Suspected → Repaired');
    // The open question to the mentors stays the workshop's, wherever the owner reads the finding.
    expect((await tech.get(`/api/findings/${f.id}`)).body.questionOpen).toBe(true);
    expect((await owner.get(`/api/findings/${f.id}`)).body.questionOpen).toBe(false);
    expect(
      (await owner.get(`/api/photos/${sharedPhoto}/findings`)).body.find((x: { id: number }) => x.id === f.id)
        .questionOpen,
    ).toBe(false);
    expect(
      (await owner.get(`/api/restorations/${restorationId}/findings`)).body.find((x: { id: number }) => x.id === f.id)
        .questionOpen,
    ).toBe(false);
    expect(events).not.toMatch(/Dismissed|OLD-TITLE-SECRET|question/i);
  });
});

describe('counts and ids', () => {
  it('when a shared finding has internal comments, then the owner counts only the shared ones everywhere', async () => {
    const f = (
      await tech
        .post(`/api/photos/${sharedPhoto}/findings`)
        .send(pin('Crackling volume control', { ownerVisible: true }))
    ).body;
    for (const [body, internal] of [
      ['internal one', true],
      ['internal two', true],
      ['Cleaned the track.', false],
    ] as const)
      await tech.post(`/api/findings/${f.id}/comments`).send({ body, internal });
    const countIn = async (agent: Agent) => ({
      one: (await agent.get(`/api/findings/${f.id}`)).body.commentCount,
      restoration: (await agent.get(`/api/restorations/${restorationId}/findings`)).body.find(
        (x: { id: number }) => x.id === f.id,
      ).commentCount,
      photo: (await agent.get(`/api/photos/${sharedPhoto}/findings`)).body.find((x: { id: number }) => x.id === f.id)
        .commentCount,
    });
    expect(await countIn(owner)).toEqual({ one: 1, restoration: 1, photo: 1 });
    expect(await countIn(tech)).toEqual({ one: 3, restoration: 3, photo: 3 });
  });

  it('when a fitted part and a shared reading point at an internal finding, then the owner gets neither its id nor its event link', async () => {
    const hidden = (
      await tech.post(`/api/photos/${privatePhoto}/findings`).send(pin('HIDDEN-FOR-PART', { ownerVisible: true }))
    ).body;
    const part = (
      await tech
        .post(`/api/restorations/${restorationId}/parts`)
        .send({ componentRef: 'R99', replacementPart: 'Metal film', findingId: hidden.id, state: 'fitted' })
    ).body;
    expect(part.findingId).toBe(hidden.id);
    const reading = (
      await tech.post(`/api/restorations/${restorationId}/measurements`).send({
        location: 'R99',
        quantity: 'resistance',
        expected: '100',
        reading: '180',
        findingId: hidden.id,
        ownerVisible: true,
      })
    ).body;
    expect(reading.findingId).toBe(hidden.id);

    const ledger = (await owner.get(`/api/restorations/${restorationId}/parts`)).body as {
      id: number;
      findingId: number | null;
    }[];
    expect(ledger.find((p) => p.id === part.id)!.findingId).toBeNull();
    const readings = (await owner.get(`/api/restorations/${restorationId}/measurements`)).body as {
      id: number;
      findingId: number | null;
    }[];
    expect(readings.find((m) => m.id === reading.id)!.findingId).toBeNull();
    const events = (await owner.get(`/api/restorations/${restorationId}/events`)).body as {
      kind: string;
      findingId: number | null;
    }[];
    expect(events.some((e) => e.kind === 'part-fitted')).toBe(true);
    expect(events.map((e) => e.findingId)).not.toContain(hidden.id);
    expect(JSON.stringify(events)).not.toContain('HIDDEN-FOR-PART');
    expect(
      (await tech.get(`/api/restorations/${restorationId}/parts`)).body.find((p: { id: number }) => p.id === part.id)
        .findingId,
    ).toBe(hidden.id);
  });

  it('when a fitted replacement is rated below the original, then the technician sees the bench warning and the owner does not', async () => {
    const part = (
      await tech
        .post(`/api/restorations/${restorationId}/parts`)
        .send({ componentRef: 'C30', originalRating: '32µF 450V', replacementRating: '33µF 350V', state: 'fitted' })
    ).body;
    expect(part.warnings.length).toBeGreaterThan(0);
    const ledger = (await owner.get(`/api/restorations/${restorationId}/parts`)).body as {
      id: number;
      warnings: unknown[];
    }[];
    expect(ledger.find((p) => p.id === part.id)!.warnings).toEqual([]);
  });
});

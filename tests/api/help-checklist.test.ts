import { eq } from 'drizzle-orm';
import type { Agent } from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { CapturedMail } from '../../shared/schemas/dev-mail';
import { findings, measurements, readingRequests, symptomChecks } from '../../server/db/schema';
import { findingsRepo } from '../../server/features/findings/findings.repo';
import { createPhotoRow } from '../factories/photos';
import { twoToneJpeg } from '../factories/images';
import { createRestoration } from '../factories/restorations';
import { anonymous, createUser, signedIn } from '../factories/users';
import { whileFailing } from '../support/fail-writes';
import { waitForMail } from '../support/mail';
import { startTestApp } from '../support/test-app';

// The checklist's causes and tests come from shared/bench/symptoms (trade notes, TRADE.md §5). What a help link
// shows follows the product's rule that its reader is judged like an owner (decision 30); no outside source.
const INTERNAL = 'WORKSHOP-ONLY';
let t: Awaited<ReturnType<typeof startTestApp>>;
let tech: Agent, mentor: Agent, owner: Agent;
let people: Record<'tech' | 'mentor' | 'owner', Awaited<ReturnType<typeof createUser>>>;
let r: { id: number }, sharedPhoto: number, privatePhoto: number, sharedFinding: number;
const mails = async () => (await t.request().get('/api/dev/mail')).body as CapturedMail[];
const ripple = {
  location: 'HT after smoothing',
  quantity: 'ac-voltage',
  expected: '1',
  tolerance: 'max',
  reading: '9',
} as const;

beforeAll(async () => {
  t = await startTestApp();
  people = {
    tech: await createUser(t.db, { name: 'Teodor Brask' }),
    mentor: await createUser(t.db, { name: 'Mara Quell' }),
    owner: await createUser(t.db, { name: 'Imogen Tarrant' }),
  };
  r = await createRestoration(
    t.db,
    [
      { userId: people.tech.id, role: 'technician' },
      { userId: people.mentor.id, role: 'mentor' },
      { userId: people.owner.id, role: 'owner' },
    ],
    { make: 'Kestrel Wireless Co.', model: 'Curlew' },
  );
  [tech, mentor, owner] = await Promise.all([
    signedIn(t.app, people.tech),
    signedIn(t.app, people.mentor),
    signedIn(t.app, people.owner),
  ]);
  const upload = await tech
    .post(`/api/restorations/${r.id}/photos`)
    .field('view', 'underside')
    .field('phase', 'before')
    .attach('file', await twoToneJpeg(), 'chassis.jpg');
  expect(upload.status).toBe(201);
  sharedPhoto = upload.body.id;
  expect((await tech.patch(`/api/photos/${sharedPhoto}`).send({ ownerVisible: true })).status).toBe(200);
  privatePhoto = await createPhotoRow(t.db, r.id, false);
  sharedFinding = await findingsRepo(t.db).insert({
    restorationId: r.id,
    photoId: sharedPhoto,
    shape: 'pin',
    points: [{ x: 0.4, y: 0.6 }],
    title: 'Bulging reservoir',
    kind: 'leaking',
    severity: 'fault',
    authorId: people.tech.id,
    ownerVisible: true,
  });
  await findingsRepo(t.db).insert({
    restorationId: r.id,
    photoId: sharedPhoto,
    shape: 'pin',
    points: [{ x: 0.2, y: 0.2 }],
    title: `${INTERNAL} scorched tag`,
    kind: 'overheated',
    severity: 'fault',
    authorId: people.tech.id,
  });
});
afterAll(() => t.stop());

const check = (symptomId: string, causeId: string) =>
  `/api/restorations/${r.id}/symptom-checks/${symptomId}/${causeId}`;
const kinds = async (agent: Agent) =>
  ((await agent.get(`/api/restorations/${r.id}/events?limit=500`)).body as { kind: string }[]).map((e) => e.kind);

describe('the symptom checklist', () => {
  it('when a cause is ticked off with a reading, then the reading is filed with its verdict and linked, and the history says so', async () => {
    const before = (await kinds(tech)).filter((k) => k === 'cause-checked').length;
    const res = await tech
      .put(check('hum', 'smoothing-caps'))
      .send({ result: 'confirmed', note: `${INTERNAL} ripple far too high`, reading: ripple });
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({
      symptomId: 'hum',
      causeId: 'smoothing-caps',
      result: 'confirmed',
      reading: { location: 'HT after smoothing', reading: '9', verdict: 'out' },
    });
    const [m] = await t.db.select().from(measurements).where(eq(measurements.id, res.body.reading.id));
    expect(m).toMatchObject({ restorationId: r.id, readingText: '9', verdict: 'out' });
    expect((await kinds(tech)).filter((k) => k === 'cause-checked')).toHaveLength(before + 1);
    expect(await kinds(owner)).not.toContain('cause-checked');
    const list = (await mentor.get(`/api/restorations/${r.id}/symptom-checks`)).body as {
      causeId: string;
      note: string;
    }[];
    expect(list).toContainEqual(
      expect.objectContaining({ causeId: 'smoothing-caps', note: `${INTERNAL} ripple far too high` }),
    );
  });

  it('when a confirmed cause opens a finding, then a confirmed finding is pinned on the chosen photo; a ruled-out one cannot', async () => {
    const res = await tech
      .put(check('hum', 'poor-earth'))
      .send({ result: 'confirmed', finding: { photoId: privatePhoto } });
    expect(res.status).toBe(200);
    const [f] = await t.db.select().from(findings).where(eq(findings.id, res.body.finding.id));
    expect(f).toMatchObject({
      photoId: privatePhoto,
      status: 'confirmed',
      shape: 'pin',
      title: expect.stringMatching(/earth/i),
    });
    expect(
      (
        await tech
          .put(check('hum', 'heater-cathode-leak'))
          .send({ result: 'ruled-out', finding: { photoId: privatePhoto } })
      ).status,
    ).toBe(400);
    const other = await createRestoration(t.db, []);
    expect(
      (
        await tech
          .put(check('hum', 'heater-cathode-leak'))
          .send({ result: 'confirmed', finding: { photoId: await createPhotoRow(t.db, other.id) } })
      ).status,
    ).toBe(400);
  });

  it('when the cause or symptom is not on the checklist, then 404 or 400, and a mentor may read but not record', async () => {
    expect((await tech.put(check('hum', 'no-such-cause')).send({ result: 'ruled-out' })).status).toBe(404);
    expect((await tech.put(check('no-such-symptom', 'poor-earth')).send({ result: 'ruled-out' })).status).toBe(400);
    expect((await mentor.put(check('hum', 'poor-earth')).send({ result: 'ruled-out' })).status).toBe(403);
    expect((await owner.get(`/api/restorations/${r.id}/symptom-checks`)).status).toBe(403);
  });

  it('when the reading was taken powered before the pre-power sign-off, then 409 and neither the check nor the reading is kept', async () => {
    const checks = (await t.db.select().from(symptomChecks)).length;
    const readings = (await t.db.select().from(measurements)).length;
    const res = await tech.put(check('fades-warm', 'ht-sags')).send({
      result: 'inconclusive',
      reading: { ...ripple, quantity: 'dc-voltage', reading: '180', expected: '250', powerOn: true },
    });
    expect(res.status).toBe(409);
    expect((await t.db.select().from(symptomChecks)).length).toBe(checks);
    expect((await t.db.select().from(measurements)).length).toBe(readings);
  });
});

describe('the checklist, the close-ups and the mentors in a help request', () => {
  it('when a request is made, then it carries the checked symptoms, each mentor is told, and the owner is not', async () => {
    const before = ((await mentor.get('/api/notifications')).body as { kind: string }[]).filter(
      (n) => n.kind === 'help-request',
    ).length;
    const req = (
      await tech.post(`/api/restorations/${r.id}/help-requests`).send({ symptom: 'Hum that rises as it warms' })
    ).body;
    expect(req.symptomIds).toContain('hum');
    expect(
      req.checklist
        .find((c: { symptomId: string }) => c.symptomId === 'hum')
        .checks.map((c: { causeId: string }) => c.causeId),
    ).toEqual(expect.arrayContaining(['smoothing-caps', 'poor-earth']));
    const notes = (await mentor.get('/api/notifications')).body as {
      kind: string;
      helpRequestId: number;
      findingId: number | null;
    }[];
    expect(notes.filter((n) => n.kind === 'help-request')).toHaveLength(before + 1);
    expect(notes.find((n) => n.helpRequestId === req.id)).toMatchObject({ findingId: null });
    expect(((await owner.get('/api/notifications')).body as { kind: string }[]).map((n) => n.kind)).not.toContain(
      'help-request',
    );
    const mail = await waitForMail(mails, people.mentor.email, /help/);
    expect(mail.text).toContain(`/restorations/${r.id}/help`);
  });

  it('when read through a link, then the checklist shows results without notes or unshared readings, and pins carry close-ups; nothing internal', async () => {
    const req = (await tech.post(`/api/restorations/${r.id}/help-requests`).send({ symptom: 'Hum' })).body;
    expect(
      (await tech.patch(`/api/help-requests/${req.id}`).send({ photoIds: [sharedPhoto, privatePhoto] })).status,
    ).toBe(200);
    const link = (await tech.post(`/api/help-requests/${req.id}/links`).send({})).body;
    const res = await anonymous(t.app).get(`/api/shared/help/${link.token}`);
    expect(res.status).toBe(200);
    const hum = res.body.checklist.find((c: { symptomId: string }) => c.symptomId === 'hum');
    expect(hum.checks).toContainEqual(
      expect.objectContaining({
        causeId: 'smoothing-caps',
        result: 'confirmed',
        note: '',
        reading: null,
        checkedBy: null,
      }),
    );
    expect(res.body.photos.map((p: { id: number }) => p.id)).toEqual([sharedPhoto]);
    const [pin] = res.body.photos[0].pins;
    expect(res.body.photos[0].pins).toHaveLength(1);
    expect(pin).toMatchObject({ id: sharedFinding, closeupUrl: expect.stringContaining('closeups') });
    const image = await fetch(pin.closeupUrl);
    expect(image.status).toBe(200);
    expect(image.headers.get('content-type')).toMatch(/webp/);
    for (const secret of [INTERNAL, 'Teodor', 'Mara', 'Imogen']) expect(res.text).not.toContain(secret);
    // The mentor, in the workshop, reads the note and the reading.
    const inside = (await mentor.get(`/api/help-requests/${req.id}`)).body.checklist.find(
      (c: { symptomId: string }) => c.symptomId === 'hum',
    );
    expect(inside.checks).toContainEqual(
      expect.objectContaining({
        causeId: 'smoothing-caps',
        note: `${INTERNAL} ripple far too high`,
        reading: expect.objectContaining({ reading: '9' }),
      }),
    );
  });

  it('when the technician removes the checklist from a request, then the link no longer shows it', async () => {
    const req = (await tech.post(`/api/restorations/${r.id}/help-requests`).send({ symptom: 'Hum' })).body;
    expect((await tech.patch(`/api/help-requests/${req.id}`).send({ symptomIds: [] })).body.checklist).toEqual([]);
    expect((await tech.patch(`/api/help-requests/${req.id}`).send({ symptomIds: ['no-such-symptom'] })).status).toBe(
      400,
    );
  });
});

describe('requests for readings', () => {
  it('when a mentor asks, the technician has a task; answered with a reading, it is filed, linked, and the mentor is told', async () => {
    const asked = await mentor
      .post(`/api/restorations/${r.id}/reading-requests`)
      .send({ kind: 'reading', body: 'Measure V3 pin 6 with no signal' });
    expect(asked.status).toBe(201);
    expect(asked.body).toMatchObject({
      body: 'Measure V3 pin 6 with no signal',
      askedBy: 'Mara Quell',
      answeredAt: null,
    });
    const bench = (await tech.get('/api/reading-requests')).body as {
      id: number;
      answeredAt: string | null;
      set: string;
    }[];
    expect(bench).toContainEqual(
      expect.objectContaining({ id: asked.body.id, answeredAt: null, set: 'Kestrel Wireless Co. Curlew' }),
    );
    expect((await tech.get('/api/notifications')).body as { readingRequestId: number; kind: string }[]).toContainEqual(
      expect.objectContaining({ readingRequestId: asked.body.id, kind: 'reading-requested' }),
    );
    expect((await owner.get('/api/reading-requests')).body).toEqual([]);

    const answer = await tech.post(`/api/reading-requests/${asked.body.id}/answer`).send({
      reading: { location: 'V3 pin 6', quantity: 'dc-voltage', expected: '100', tolerance: '20', reading: '95' },
      note: 'No signal, volume at zero',
    });
    expect(answer.status).toBe(200);
    expect(answer.body).toMatchObject({
      answeredBy: 'Teodor Brask',
      answerNote: 'No signal, volume at zero',
      reading: { location: 'V3 pin 6', reading: '95', verdict: 'within' },
    });
    const readings = (await tech.get(`/api/restorations/${r.id}/measurements`)).body as { id: number }[];
    expect(readings.map((m) => m.id)).toContain(answer.body.reading.id);
    expect((await tech.post(`/api/reading-requests/${asked.body.id}/answer`).send({ note: 'again' })).status).toBe(409);
    const told = (
      (await mentor.get('/api/notifications')).body as { readingRequestId: number; kind: string; summary: string }[]
    ).find((n) => n.readingRequestId === asked.body.id);
    expect(told).toMatchObject({ kind: 'reading-answered', summary: expect.stringContaining('V3 pin 6 reads 95') });
    expect((await mentor.get(`/api/restorations/${r.id}/reading-requests`)).body).toContainEqual(
      expect.objectContaining({ id: asked.body.id, answeredBy: 'Teodor Brask' }),
    );
    expect((await kinds(owner)).filter((k) => k.startsWith('reading-'))).toEqual([]);
    expect(
      ((await owner.get('/api/notifications')).body as { kind: string }[]).filter((n) => n.kind.startsWith('reading-')),
    ).toEqual([]);
  });

  it('when answered with a photo of another set or with nothing, then 400; when the history line fails, then nothing is kept', async () => {
    const asked = (
      await mentor
        .post(`/api/restorations/${r.id}/reading-requests`)
        .send({ kind: 'photo', body: 'Photograph the tag strip under the output transformer' })
    ).body;
    const other = await createRestoration(t.db, []);
    expect(
      (
        await tech
          .post(`/api/reading-requests/${asked.id}/answer`)
          .send({ photoId: await createPhotoRow(t.db, other.id) })
      ).status,
    ).toBe(400);
    expect((await tech.post(`/api/reading-requests/${asked.id}/answer`).send({})).status).toBe(400);
    const readings = (await t.db.select().from(measurements)).length;
    const failed = await whileFailing(t.db, 'events', 'insert', () =>
      tech
        .post(`/api/reading-requests/${asked.id}/answer`)
        .send({ reading: { location: 'V3 pin 6', quantity: 'dc-voltage', reading: '95' } }),
    );
    expect(failed.status).toBe(500);
    expect((await t.db.select().from(measurements)).length).toBe(readings);
    const [row] = await t.db.select().from(readingRequests).where(eq(readingRequests.id, asked.id));
    expect(row!.answeredAt).toBeNull();
    const done = await tech.post(`/api/reading-requests/${asked.id}/answer`).send({ photoId: privatePhoto });
    expect(done.body.photo).toMatchObject({ id: privatePhoto });
    // An owner, not on the workshop side, can neither ask nor answer.
    expect(
      (await owner.post(`/api/restorations/${r.id}/reading-requests`).send({ kind: 'note', body: 'Why?' })).status,
    ).toBe(403);
  });
});

import { createHash, randomBytes } from 'node:crypto';
import { eq } from 'drizzle-orm';
import type { Agent } from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { helpLinks, helpRequests, restorations } from '../../server/db/schema';
import { commentsRepo } from '../../server/features/comments/comments.repo';
import { findingsRepo } from '../../server/features/findings/findings.repo';
import { measurementsService } from '../../server/features/measurements/measurements.service';
import { partsService } from '../../server/features/parts/parts.service';
import { helpReplyLimits } from '../../server/features/help/shared-help.service';
import { createPhotoRow } from '../factories/photos';
import { createRestoration } from '../factories/restorations';
import { anonymous, createUser, signedIn } from '../factories/users';
import { whileFailing } from '../support/fail-writes';
import { startTestApp } from '../support/test-app';

// What a help link shows is the product's rule that its reader is judged like an owner or stricter
// (PRODUCT.md "Who uses it", decision 25); no outside source. SHA-256 is checked with Node's own crypto.
const INTERNAL = 'WORKSHOP-ONLY';
let t: Awaited<ReturnType<typeof startTestApp>>;
let tech: Agent, mentor: Agent, owner: Agent;
let ids: {
  restoration: number;
  sharedPhoto: number;
  privatePhoto: number;
  sharedFinding: number;
  internalFinding: number;
  sharedReading: number;
  privateReading: number;
  fittedPart: number;
};

beforeAll(async () => {
  t = await startTestApp();
  const people = {
    tech: await createUser(t.db, { name: 'Teodor Brask' }),
    mentor: await createUser(t.db, { name: 'Mira Quell' }),
    owner: await createUser(t.db, { name: 'Orla Pennyfeather', email: 'orla.pennyfeather@example.test' }),
  };
  const r = await createRestoration(
    t.db,
    [
      { userId: people.tech.id, role: 'technician' },
      { userId: people.mentor.id, role: 'mentor' },
      { userId: people.owner.id, role: 'owner' },
    ],
    { make: 'Farrowby', model: 'Lark 3' },
  );
  await t.db
    .update(restorations)
    .set({ serial: 'SERIAL-7731', mainsSetting: '240 V tap' })
    .where(eq(restorations.id, r.id));
  const sharedPhoto = await createPhotoRow(t.db, r.id, true);
  const privatePhoto = await createPhotoRow(t.db, r.id, false);
  const findingsR = findingsRepo(t.db);
  const sharedFinding = await findingsR.insert({
    restorationId: r.id,
    photoId: sharedPhoto,
    shape: 'pin',
    points: [{ x: 0.553, y: 0.393 }],
    title: 'Leaky C27',
    kind: 'leaking',
    severity: 'fault',
    authorId: people.tech.id,
    ownerVisible: true,
  });
  const internalFinding = await findingsR.insert({
    restorationId: r.id,
    photoId: sharedPhoto,
    shape: 'pin',
    points: [{ x: 0.2, y: 0.2 }],
    title: `${INTERNAL} cracked HT lead`,
    kind: 'cracked',
    severity: 'fault',
    authorId: people.tech.id,
  });
  await findingsR.insert({
    restorationId: r.id,
    photoId: privatePhoto,
    shape: 'pin',
    points: [{ x: 0.5, y: 0.5 }],
    title: `${INTERNAL} private pin`,
    kind: 'note',
    severity: 'info',
    authorId: people.tech.id,
  });
  await commentsRepo(t.db).insert({
    findingId: sharedFinding,
    authorId: people.tech.id,
    body: `${INTERNAL} quote was too low`,
    internal: true,
  });
  const readings = measurementsService(t.db);
  const sharedReading = (
    await readings.create(
      r.id,
      {
        location: 'HT after smoothing',
        quantity: 'dc-voltage',
        expected: '250',
        tolerance: '10%',
        reading: '212',
        chartMeter: '1k/V 250 V',
        meter: '10 MΩ',
        ownerVisible: true,
      },
      people.tech.id,
    )
  ).id;
  const privateReading = (
    await readings.create(
      r.id,
      { location: `${INTERNAL} R23`, quantity: 'resistance', expected: '150', reading: '212' },
      people.tech.id,
    )
  ).id;
  const ledger = partsService(t.db);
  const fittedPart = (
    await ledger.create(
      r.id,
      {
        componentRef: 'C27',
        action: 'replaced',
        originalPart: 'wax paper',
        originalRating: '22nF 350V',
        replacementPart: 'film',
        replacementRating: '22nF 630V',
        state: 'fitted',
        costMinor: 4321,
        notes: `${INTERNAL} note`,
        source: `${INTERNAL} supplier`,
      },
      people.tech.id,
    )
  ).id;
  await ledger.create(r.id, { componentRef: 'R23', action: 'replaced', state: 'planned' }, people.tech.id);
  ids = {
    restoration: r.id,
    sharedPhoto,
    privatePhoto,
    sharedFinding,
    internalFinding,
    sharedReading,
    privateReading,
    fittedPart,
  };
  [tech, mentor, owner] = await Promise.all([
    signedIn(t.app, people.tech),
    signedIn(t.app, people.mentor),
    signedIn(t.app, people.owner),
  ]);
});
afterAll(() => t.stop());

async function newRequest() {
  const res = await tech
    .post(`/api/restorations/${ids.restoration}/help-requests`)
    .send({ symptom: 'Hum rises as the set warms up' });
  expect(res.status).toBe(201);
  return res.body as { id: number; partIds: number[]; measurementIds: number[]; photoIds: number[] };
}
async function newLink(helpRequestId: number) {
  const res = await tech.post(`/api/help-requests/${helpRequestId}/links`).send({});
  expect(res.status).toBe(201);
  return res.body as { url: string; token: string; expiresAt: string };
}
const visitor = () => anonymous(t.app);

describe('a help request', () => {
  it('when a technician creates one, then it is pre-filled with fitted parts, every reading and the photos with pins', async () => {
    const req = await newRequest();
    expect(req.id).toBeGreaterThan(0);
    expect(req.partIds).toEqual([ids.fittedPart]);
    expect([...req.measurementIds].sort()).toEqual([ids.sharedReading, ids.privateReading].sort());
    expect([...req.photoIds].sort()).toEqual([ids.sharedPhoto, ids.privatePhoto].sort());
  });

  it('when a mentor reads it in the workshop, then the unshared reading is there (the workshop sees everything)', async () => {
    const req = await newRequest();
    const res = await mentor.get(`/api/help-requests/${req.id}`);
    expect(res.status).toBe(200);
    expect(res.body.readings.map((m: { id: number }) => m.id)).toContain(ids.privateReading);
  });

  it("when a request is made, then it waits on the mentor's bench and never reaches the owner", async () => {
    const req = await newRequest();
    const bench = (await mentor.get('/api/help-requests')).body as { id: number; set: string }[];
    expect(bench).toContainEqual(expect.objectContaining({ id: req.id, set: 'Farrowby Lark 3' }));
    expect((await owner.get('/api/help-requests')).body).toEqual([]);
    expect((await owner.get(`/api/help-requests/${req.id}`)).status).toBe(403);
  });

  it('when a link is made, then it lasts 7 days and only the SHA-256 of its 256-bit token is stored', async () => {
    const before = Date.now();
    const link = await newLink((await newRequest()).id);
    expect(Buffer.from(link.token, 'base64url')).toHaveLength(32);
    expect(link.url).toMatch(new RegExp(`/shared/help/${link.token}$`));
    const days = (Date.parse(link.expiresAt) - before) / 86_400_000;
    expect(days).toBeGreaterThan(6.99);
    expect(days).toBeLessThan(7.01);
    const stored = await t.db
      .select()
      .from(helpLinks)
      .where(eq(helpLinks.tokenHash, createHash('sha256').update(link.token).digest('hex')));
    expect(stored).toHaveLength(1);
    expect(JSON.stringify(await t.db.select().from(helpLinks))).not.toContain(link.token);
  });
});

describe('the history of a help request', () => {
  it('when a request is made, shared and withdrawn, then each is a line of the workshop history and none reaches the owner', async () => {
    const count = async () => {
      const kinds = (
        (await tech.get(`/api/restorations/${ids.restoration}/events?limit=500`)).body as { kind: string }[]
      ).map((e) => e.kind);
      return Object.fromEntries(
        ['help-requested', 'help-link-made', 'help-link-withdrawn'].map((k) => [
          k,
          kinds.filter((x) => x === k).length,
        ]),
      );
    };
    const before = await count();
    const req = await newRequest();
    const link = await newLink(req.id);
    expect((await tech.delete(`/api/help-links/${link.token}`)).status).toBe(204);
    // Withdrawing it again changes nothing and writes no second line.
    expect((await tech.delete(`/api/help-links/${link.token}`)).status).toBe(204);
    expect(await count()).toEqual({
      'help-requested': before['help-requested']! + 1,
      'help-link-made': before['help-link-made']! + 1,
      'help-link-withdrawn': before['help-link-withdrawn']! + 1,
    });
    const ownerKinds = (
      (await owner.get(`/api/restorations/${ids.restoration}/events?limit=500`)).body as { kind: string }[]
    ).map((e) => e.kind);
    expect(ownerKinds.filter((k) => k.startsWith('help-'))).toEqual([]);
  });

  it('when the history line cannot be written, then no request and no link are kept', async () => {
    const before = (await t.db.select().from(helpRequests)).length;
    const res = await whileFailing(t.db, 'events', 'insert', () =>
      tech.post(`/api/restorations/${ids.restoration}/help-requests`).send({ symptom: 'Crackles' }),
    );
    expect(res.status).toBe(500);
    expect((await t.db.select().from(helpRequests)).length).toBe(before);
    const req = await newRequest();
    const links = (await t.db.select().from(helpLinks)).length;
    expect(
      (await whileFailing(t.db, 'events', 'insert', () => tech.post(`/api/help-requests/${req.id}/links`).send({})))
        .status,
    ).toBe(500);
    expect((await t.db.select().from(helpLinks)).length).toBe(links);
  });
});

describe('the read-only link', () => {
  it('when opened with no account, then it shows the shared set, chart, part and pin, and never anything internal or personal', async () => {
    const link = await newLink((await newRequest()).id);
    const res = await visitor().get(`/api/shared/help/${link.token}`);
    expect(res.status).toBe(200);
    expect(res.headers['x-robots-tag']).toMatch(/noindex/);
    expect(res.headers['set-cookie']).toBeUndefined();
    const body = res.body;
    expect(body.set).toMatchObject({ make: 'Farrowby', model: 'Lark 3', mains: '240 V tap', chassis: null });
    expect(body.readings).toEqual([
      expect.objectContaining({ id: ids.sharedReading, reading: '212', meter: '10 MΩ', chartMeter: '1k/V 250 V' }),
    ]);
    expect(body.readings[0].verdict).not.toBe('unknown');
    expect(body.parts).toEqual([
      expect.objectContaining({ componentRef: 'C27', old: 'wax paper 22nF 350V', new: 'film 22nF 630V' }),
    ]);
    expect(body.photos.map((p: { id: number }) => p.id)).toEqual([ids.sharedPhoto]);
    expect(body.photos[0].pins).toEqual([
      expect.objectContaining({ id: ids.sharedFinding, points: [{ x: 0.553, y: 0.393 }] }),
    ]);
    for (const secret of [
      INTERNAL,
      'SERIAL-7731',
      'Pennyfeather',
      'orla.pennyfeather',
      '4321',
      'Teodor',
      'Mira',
      'costMinor',
    ])
      expect(res.text).not.toContain(secret);
    expect(res.text).not.toContain(`"id":${ids.internalFinding}`);
    expect(res.text).not.toContain(`"id":${ids.privatePhoto}`);
    // The page the link opens carries the same header, whichever way the client is served.
    expect((await visitor().get(`/shared/help/${link.token}`)).headers['x-robots-tag']).toMatch(/noindex/);
  });

  it('when the technician removes a photo and the valves, then the link no longer shows them', async () => {
    const req = await newRequest();
    const link = await newLink(req.id);
    expect((await tech.patch(`/api/help-requests/${req.id}`).send({ photoIds: [], includeValves: false })).status).toBe(
      200,
    );
    const body = (await visitor().get(`/api/shared/help/${link.token}`)).body;
    expect(body.photos).toEqual([]);
    expect(body.valves).toBeNull();
  });

  it('when the technician chooses a photo of another restoration, then the change is refused', async () => {
    const req = await newRequest();
    const other = await createRestoration(t.db, []);
    const foreign = await createPhotoRow(t.db, other.id, true);
    expect((await tech.patch(`/api/help-requests/${req.id}`).send({ photoIds: [foreign] })).status).toBe(400);
  });

  it('when a link has expired, was revoked or was guessed, then it answers 404 and takes no replies', async () => {
    const req = await newRequest();
    const expired = await newLink(req.id);
    await t.db
      .update(helpLinks)
      .set({ expiresAt: new Date(Date.now() - 1000) })
      .where(eq(helpLinks.tokenHash, createHash('sha256').update(expired.token).digest('hex')));
    const revoked = await newLink(req.id);
    expect((await visitor().get(`/api/shared/help/${revoked.token}`)).status).toBe(200);
    expect((await tech.delete(`/api/help-links/${revoked.token}`)).status).toBe(204);
    const guessed = randomBytes(32).toString('base64url');
    for (const token of [expired.token, revoked.token, guessed]) {
      expect((await visitor().get(`/api/shared/help/${token}`)).status).toBe(404);
      expect((await visitor().post(`/api/shared/help/${token}/replies`).send({ name: 'A', body: 'B' })).status).toBe(
        404,
      );
    }
    expect((await tech.delete(`/api/help-links/${guessed}`)).status).toBe(404);
  });

  it('when someone replies through the link, then the reply is held until the technician approves it', async () => {
    const req = await newRequest();
    const link = await newLink(req.id);
    const posted = await visitor()
      .post(`/api/shared/help/${link.token}/replies`)
      .send({ name: 'Club member', body: 'Reform the can first.' });
    expect(posted.status).toBe(202);
    expect(posted.body.held).toBe(true);
    expect((await visitor().get(`/api/shared/help/${link.token}`)).body.replies).toEqual([]);
    const inside = (await tech.get(`/api/help-requests/${req.id}`)).body;
    expect(inside.replies).toEqual([
      expect.objectContaining({ id: posted.body.id, approved: false, body: 'Reform the can first.' }),
    ]);
    expect((await mentor.post(`/api/help-replies/${posted.body.id}/approve`)).status).toBe(403);
    expect((await tech.post(`/api/help-replies/${posted.body.id}/approve`)).status).toBe(200);
    const shown = (await visitor().get(`/api/shared/help/${link.token}`)).body.replies;
    expect(shown).toEqual([
      expect.objectContaining({ name: 'Club member', body: 'Reform the can first.', approved: true }),
    ]);
  });

  it('when one address sends replies past the hourly limit, then it gets 429 and nothing more is stored', async () => {
    const req = await newRequest();
    const link = await newLink(req.id);
    const statuses: number[] = [];
    for (let i = 0; i <= helpReplyLimits.perIp; i++)
      statuses.push(
        (
          await visitor()
            .post(`/api/shared/help/${link.token}/replies`)
            .send({ name: 'Flood', body: `n${i}` })
        ).status,
      );
    expect(statuses).toContain(429);
    const held = (await tech.get(`/api/help-requests/${req.id}`)).body.replies.length;
    expect(held).toBe(statuses.filter((s) => s === 202).length);
    expect(held).toBeLessThanOrEqual(helpReplyLimits.perIp);
  });
});

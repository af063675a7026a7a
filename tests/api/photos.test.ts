import { count, eq } from 'drizzle-orm';
import sharp from 'sharp';
import type { Agent } from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { photos } from '../../server/db/schema';
import { backfillPhoneVariants } from '../../server/features/photos/backfill-phone-variants';
import { photoKeys } from '../../server/features/photos/photo-objects';
import { sweepOrphanedObjects } from '../../server/features/photos/sweep-orphans';
import { jpegWithGpsAndOrientation6, pngClaiming, twoToneJpeg } from '../factories/images';
import { createRestoration } from '../factories/restorations';
import { createUser, signedIn } from '../factories/users';
import { startTestApp } from '../support/test-app';

let t: Awaited<ReturnType<typeof startTestApp>>;
let tech: Agent, mentor: Agent, owner: Agent, stranger: Agent;
let restorationId: number;
let otherRestorationId: number;
const MAX_BYTES = 2 * 1024 * 1024;

beforeAll(async () => {
  t = await startTestApp({ uploads: { maxBytes: MAX_BYTES, maxPixels: 100e6 } });
  const [a, b, c, d] = await Promise.all([createUser(t.db), createUser(t.db), createUser(t.db), createUser(t.db)]);
  restorationId = (
    await createRestoration(t.db, [
      { userId: a.id, role: 'technician' },
      { userId: b.id, role: 'mentor' },
      { userId: c.id, role: 'owner' },
    ])
  ).id;
  otherRestorationId = (await createRestoration(t.db, [{ userId: d.id, role: 'technician' }])).id;
  [tech, mentor, owner, stranger] = await Promise.all([
    signedIn(t.app, a),
    signedIn(t.app, b),
    signedIn(t.app, c),
    signedIn(t.app, d),
  ]);
});
afterAll(() => t.stop());

async function objectCount() {
  const keys: string[] = [];
  for await (const o of t.deps.storage.listObjects('photos/')) keys.push(o.key);
  return keys.length;
}
const rowCount = async () => (await t.db.select({ n: count() }).from(photos))[0]!.n;
const upload = (agent: Agent, id: number, file: Buffer, name: string, fields: Record<string, string> = {}) => {
  const req = agent.post(`/api/restorations/${id}/photos`);
  for (const [k, v] of Object.entries(fields)) req.field(k, v);
  return req.attach('file', file, name);
};

describe('uploading photos', () => {
  it('when a JPEG carries GPS and orientation 6, then it comes back upright and no served variant carries GPS or EXIF', async () => {
    const res = await upload(tech, restorationId, await jpegWithGpsAndOrientation6(), 'IMG_0001.jpg', {
      view: 'underside',
      phase: 'before',
      caption: 'As found',
    });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({
      view: 'underside',
      phase: 'before',
      caption: 'As found',
      width: 400,
      height: 600,
      ownerVisible: false,
    });
    expect(res.body.takenAt).toMatch(/^2026-11-20T14:05:09/);
    expect(res.body.urls.original).toBeDefined();
    const [row] = await t.db.select().from(photos).where(eq(photos.id, res.body.id));
    const keys = photoKeys(row!.storageKey);
    for (const key of [keys.display, keys.phone, keys.thumb]) {
      const stored = await t.deps.storage.getObject(key);
      const meta = await sharp(stored).metadata();
      expect(meta.format).toBe('webp');
      expect(meta.exif).toBeUndefined();
      expect(meta.height).toBeGreaterThan(meta.width!);
      // Upright: the red half that was on the left is now on top.
      const { data } = await sharp(stored)
        .extract({ left: Math.floor(meta.width! / 2), top: 2, width: 1, height: 1 })
        .raw()
        .toBuffer({ resolveWithObject: true });
      expect(data[0]).toBeGreaterThan(150);
      expect(data[2]).toBeLessThan(90);
    }
    // The original is kept untouched, for technicians only.
    expect((await sharp(await t.deps.storage.getObject(keys.original)).metadata()).exif).toBeDefined();
  });

  const bad: [string, () => Promise<Buffer> | Buffer, string, number][] = [
    ['a truncated JPEG', async () => (await twoToneJpeg(1200, 800)).subarray(0, 3000), 'cut.jpg', 400],
    ['a text file named .jpg', () => Buffer.from('not a photo, just words\n'), 'notes.jpg', 415],
    [
      'an SVG',
      () =>
        Buffer.from(
          '<svg xmlns="http://www.w3.org/2000/svg" width="10" height="10"><rect width="10" height="10"/></svg>',
        ),
      'chassis.svg',
      415,
    ],
    ['a PNG declaring 50000×50000 pixels', () => pngClaiming(50000, 50000), 'bomb.png', 413],
    ['an empty file', () => Buffer.alloc(0), 'empty.jpg', 400],
    ['an oversize file', () => Buffer.alloc(MAX_BYTES + 1024, 0xff), 'huge.jpg', 413],
  ];
  for (const [what, make, name, status] of bad)
    it(`when the file is ${what}, then ${status} with a clear message and nothing is stored`, async () => {
      const [rows, objects] = [await rowCount(), await objectCount()];
      const res = await upload(tech, restorationId, await make(), name);
      expect(res.status).toBe(status);
      expect(res.body.error.message.length).toBeGreaterThan(10);
      expect([await rowCount(), await objectCount()]).toEqual([rows, objects]);
    });

  it("when the file field is missing, or the photo goes to someone else's restoration, then 400 and 404 and nothing changes", async () => {
    const [rows, objects] = [await rowCount(), await objectCount()];
    const missing = await tech.post(`/api/restorations/${restorationId}/photos`).field('view', 'top');
    expect(missing.status).toBe(400);
    expect(missing.body.error.message).toMatch(/field "file"/);
    const elsewhere = await upload(tech, otherRestorationId, await twoToneJpeg(), 'x.jpg');
    expect(elsewhere.status).toBe(404);
    const badView = await upload(tech, restorationId, await twoToneJpeg(), 'x.jpg', { view: 'sideways' });
    expect(badView.status).toBe(400);
    expect([await rowCount(), await objectCount()]).toEqual([rows, objects]);
  });
});

describe('the orphan sweep', () => {
  it('when objects have no row, then the sweep removes them and leaves every photo that has one', async () => {
    const kept = (await upload(tech, restorationId, await twoToneJpeg(), 'kept.jpg')).body;
    await t.deps.storage.putObject(
      'photos/999/orphan-uuid/original',
      Buffer.from('left behind by a crash'),
      'image/jpeg',
    );
    const before = await objectCount();
    // Everything counts as "older than a day" here, so only the row check protects the objects.
    expect(await sweepOrphanedObjects(t.db, t.deps.storage, -1000)).toBe(1);
    expect(await objectCount()).toBe(before - 1);
    const image = await fetch((await tech.get(`/api/photos/${kept.id}`)).body.urls.thumb);
    expect(image.status).toBe(200);
    await image.arrayBuffer();
  });
});

describe('who sees which photo', () => {
  it('when a photo is not shared, then the owner and strangers never get a URL for it; once shared, the owner does', async () => {
    const created = (
      await upload(tech, restorationId, await twoToneJpeg(), 'a.jpg', { view: 'top', caption: 'private' })
    ).body;
    const ownerList = (await owner.get(`/api/restorations/${restorationId}/photos`)).body;
    expect(ownerList.map((p: { id: number }) => p.id)).not.toContain(created.id);
    expect((await owner.get(`/api/photos/${created.id}`)).status).toBe(404);
    expect((await stranger.get(`/api/photos/${created.id}`)).status).toBe(404);
    expect((await stranger.get(`/api/restorations/${restorationId}/photos`)).status).toBe(404);
    const mentorView = (await mentor.get(`/api/photos/${created.id}`)).body;
    expect(mentorView.urls.display).toBeDefined();
    expect(mentorView.urls.original).toBeUndefined();

    expect((await tech.patch(`/api/photos/${created.id}`).send({ ownerVisible: true, phase: 'after' })).status).toBe(
      200,
    );
    const shared = (await owner.get(`/api/photos/${created.id}`)).body;
    expect(shared).toMatchObject({ id: created.id, phase: 'after', ownerVisible: true });
    expect(shared.urls.original).toBeUndefined();
    const image = await fetch(shared.urls.display);
    expect(image.status).toBe(200);
    expect(image.headers.get('content-type')).toBe('image/webp');
    await image.arrayBuffer();
  });

  it('when a technician deletes a photo, then its objects go too', async () => {
    const created = (await upload(tech, restorationId, await twoToneJpeg(), 'b.jpg')).body;
    const objects = await objectCount();
    expect((await mentor.delete(`/api/photos/${created.id}`)).status).toBe(403);
    expect((await tech.delete(`/api/photos/${created.id}`)).status).toBe(204);
    // original, display, phone and thumbnail
    expect(await objectCount()).toBe(objects - 4);
    expect((await tech.get(`/api/photos/${created.id}`)).status).toBe(404);
  });
});

describe('the phone-sized variant', () => {
  it('when a photo stored before the variant existed is backfilled, then it gets one no wider than 1,280 px, and a second run makes none', async () => {
    const created = (await upload(tech, restorationId, await twoToneJpeg(3000, 2000), 'wide.jpg')).body;
    const [row] = await t.db.select().from(photos).where(eq(photos.id, created.id));
    const keys = photoKeys(row!.storageKey);
    // A 3,000 × 2,000 original: the phone variant is 1,280 px wide (its longest side) at the same proportions.
    expect((await sharp(await t.deps.storage.getObject(keys.phone)).metadata()).width).toBe(1280);
    await t.deps.storage.deleteObject(keys.phone);
    expect(await backfillPhoneVariants(t.db, t.deps.storage)).toBeGreaterThanOrEqual(1);
    const meta = await sharp(await t.deps.storage.getObject(keys.phone)).metadata();
    expect([meta.format, meta.width]).toEqual(['webp', 1280]);
    expect(Math.abs(meta.height! - (1280 * 2000) / 3000)).toBeLessThanOrEqual(1);
    expect(await backfillPhoneVariants(t.db, t.deps.storage)).toBe(0);
  });
});

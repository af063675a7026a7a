import { inArray } from 'drizzle-orm';
import type { Agent, Response } from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { PAGE_DEFAULT, PAGE_MAX } from '../../shared/schemas/pagination';
import { comments, findings, measurements, memberships, photos, restorations } from '../../server/db/schema';
import { createPhotoRow } from '../factories/photos';
import { createRestoration } from '../factories/restorations';
import { createUser, signedIn } from '../factories/users';
import { startTestApp } from '../support/test-app';

let t: Awaited<ReturnType<typeof startTestApp>>;
let tech: Agent;
let techId: number;
let restorationId: number;
let photoId: number;
let findingId: number;

beforeAll(async () => {
  t = await startTestApp();
  const user = await createUser(t.db, { name: 'Teodor Paging' });
  techId = user.id;
  restorationId = (await createRestoration(t.db, [{ userId: user.id, role: 'technician' }])).id;
  photoId = await createPhotoRow(t.db, restorationId);
  const [f] = await t.db
    .insert(findings)
    .values({
      restorationId,
      photoId,
      number: 1,
      shape: 'pin',
      points: [{ x: 0.5, y: 0.5 }],
      title: 'Hum',
      kind: 'note',
      severity: 'info',
      authorId: techId,
    })
    .returning();
  findingId = f!.id;
  tech = await signedIn(t.app, user);
});
afterAll(() => t.stop());

type Item = Record<string, unknown>;
/** Reads a list page by page (limit 3), calling `between` after each page; returns every item seen, in order. */
async function walk(path: string, between: (page: number) => Promise<unknown>) {
  const items: Item[] = [];
  let cursor: string | undefined;
  for (let page = 0; page < 100; page++) {
    const res: Response = await tech.get(path).query({ limit: 3, ...(cursor ? { cursor } : {}) });
    expect(res.status).toBe(200);
    expect(Array.isArray(res.body)).toBe(true);
    expect(res.body.length).toBeLessThanOrEqual(3);
    items.push(...res.body);
    cursor = res.headers['x-next-cursor'];
    if (!cursor) return items;
    expect(res.headers.link).toContain('rel="next"');
    await between(page);
  }
  throw new Error('the pages never ended');
}

/**
 * The list read whole first, then page by page while `add` puts new items in: every item of the whole read
 * comes exactly once, in the same order, and the limit's maximum is kept (500 allowed, 501 refused).
 */
async function checkPaging(path: string, key: (item: Item) => number, add: () => Promise<unknown>) {
  const whole: Response = await tech.get(path).query({ limit: PAGE_MAX });
  expect(whole.status).toBe(200);
  expect(whole.headers['x-next-cursor']).toBeUndefined();
  const before = (whole.body as Item[]).map(key);
  expect(before.length).toBeGreaterThan(6);
  const seen = (await walk(path, add)).map(key);
  expect(new Set(seen).size).toBe(seen.length);
  expect(seen.filter((k) => before.includes(k))).toEqual(before);
  expect((await tech.get(path).query({ limit: PAGE_MAX + 1 })).status).toBe(400);
  expect((await tech.get(path).query({ cursor: 'bm90LWEtY3Vyc29y' })).status).toBe(400);
}

/** Sets one instant on rows, so the order has ties the cursor must break by its later keys. */
const sameInstant = new Date(Date.UTC(2026, 10, 20, 9, 30, 0, 0));

describe('lists in pages (limit, cursor, stable order)', () => {
  it("when photos are added while a restoration's photos are read page by page, then each earlier photo comes once, oldest first", async () => {
    const ids: number[] = [];
    for (let i = 0; i < 8; i++) ids.push(await createPhotoRow(t.db, restorationId));
    await t.db
      .update(photos)
      .set({ createdAt: sameInstant })
      .where(inArray(photos.id, ids.slice(0, 4)));
    await checkPaging(
      `/api/restorations/${restorationId}/photos`,
      (p) => p.id as number,
      () => createPhotoRow(t.db, restorationId),
    );
  });

  it('when restorations are added while the bench is read page by page, then each earlier one comes once, most recently changed first', async () => {
    const ids: number[] = [];
    for (let i = 0; i < 8; i++)
      ids.push(
        (await createRestoration(t.db, [{ userId: techId, role: 'technician' }], { make: 'Kestrel', model: `K-${i}` }))
          .id,
      );
    await t.db
      .update(restorations)
      .set({ updatedAt: sameInstant })
      .where(inArray(restorations.id, ids.slice(2, 6)));
    await checkPaging(
      '/api/restorations',
      (r) => r.id as number,
      () => createRestoration(t.db, [{ userId: techId, role: 'technician' }]),
    );
  });

  it("when findings are added while a restoration's findings are read page by page, then each earlier one comes once, by number", async () => {
    let n = 100;
    const add = () =>
      t.db.insert(findings).values({
        restorationId,
        photoId,
        number: n++,
        shape: 'pin',
        points: [{ x: 0.2, y: 0.2 }],
        title: `Joint ${n}`,
        kind: 'note',
        severity: 'info',
        authorId: techId,
      });
    for (let i = 0; i < 8; i++) await add();
    await checkPaging(`/api/restorations/${restorationId}/findings`, (f) => f.id as number, add);
  });

  it('when readings are recorded while the readings are read page by page, then each earlier one comes once, in the order taken', async () => {
    const add = () =>
      tech
        .post(`/api/restorations/${restorationId}/measurements`)
        .send({ location: 'V3 pin 7', quantity: 'dc-voltage', expected: '250 V', tolerance: '±10%', reading: '243 V' })
        .expect(201);
    const ids: number[] = [];
    for (let i = 0; i < 8; i++) ids.push((await add()).body.id);
    await t.db
      .update(measurements)
      .set({ measuredAt: sameInstant })
      .where(inArray(measurements.id, ids.slice(1, 5)));
    await checkPaging(`/api/restorations/${restorationId}/measurements`, (m) => m.id as number, add);
  });

  it('when comments are posted while a thread is read page by page, then each earlier comment comes once, oldest first', async () => {
    const add = () =>
      tech.post(`/api/findings/${findingId}/comments`).send({ body: 'Re-measured the HT: 248 V.' }).expect(201);
    const ids: number[] = [];
    for (let i = 0; i < 8; i++) ids.push((await add()).body.id);
    await t.db
      .update(comments)
      .set({ createdAt: sameInstant })
      .where(inArray(comments.id, ids.slice(3, 7)));
    await checkPaging(`/api/findings/${findingId}/comments`, (c) => c.id as number, add);
  });

  it('when people join while the members are read page by page, then each earlier member comes once, in the order they joined', async () => {
    const add = async () => {
      const u = await createUser(t.db, { name: `Imogen ${Math.random().toString(36).slice(2, 7)}` });
      await t.db.insert(memberships).values({ restorationId, userId: u.id, role: 'mentor' });
      return u.id;
    };
    const ids: number[] = [];
    for (let i = 0; i < 8; i++) ids.push(await add());
    // People who joined at one instant are ordered by name, then id.
    await t.db
      .update(memberships)
      .set({ createdAt: sameInstant })
      .where(inArray(memberships.userId, ids.slice(0, 5)));
    await checkPaging(`/api/restorations/${restorationId}/members`, (m) => m.userId as number, add);
  });

  it('when no limit is given, then a page holds the default number of items and names the next', async () => {
    const rows = Array.from({ length: PAGE_DEFAULT + 1 - 2 }, (_, i) => ({
      restorationId,
      photoId,
      number: 1000 + i,
      shape: 'pin' as const,
      points: [{ x: 0.1, y: 0.1 }],
      title: `Bulk ${i}`,
      kind: 'note' as const,
      severity: 'info' as const,
      authorId: techId,
    }));
    await t.db.insert(findings).values(rows);
    const res = await tech.get(`/api/restorations/${restorationId}/findings`);
    expect(res.status).toBe(200);
    expect(res.body).toHaveLength(PAGE_DEFAULT);
    expect(res.headers['x-next-cursor']).toEqual(expect.any(String));
  });
});

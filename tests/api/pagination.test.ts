import type { Agent, Response } from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { events, notifications, findings } from '../../server/db/schema';
import { createPhotoRow } from '../factories/photos';
import { createRestoration } from '../factories/restorations';
import { createUser, signedIn } from '../factories/users';
import { startTestApp } from '../support/test-app';

let t: Awaited<ReturnType<typeof startTestApp>>;
let tech: Agent;
let techId: number;
let restorationId: number;

beforeAll(async () => {
  t = await startTestApp();
  const user = await createUser(t.db, { name: 'Mara Bench' });
  techId = user.id;
  restorationId = (await createRestoration(t.db, [{ userId: user.id, role: 'technician' }])).id;
  tech = await signedIn(t.app, user);
});
afterAll(() => t.stop());

/** Reads a list page by page (limit 4), calling `between` after each page; returns every id seen, in order. */
async function walk(path: string, between: (page: number) => Promise<void>) {
  const ids: number[] = [];
  let cursor: string | undefined;
  for (let page = 0; page < 100; page++) {
    const res: Response = await tech.get(path).query({ limit: 4, ...(cursor ? { cursor } : {}) });
    expect(res.status).toBe(200);
    expect(Array.isArray(res.body)).toBe(true);
    expect(res.body.length).toBeLessThanOrEqual(4);
    ids.push(...res.body.map((x: { id: number }) => x.id));
    cursor = res.headers['x-next-cursor'];
    if (!cursor) return ids;
    expect(res.headers.link).toContain('rel="next"');
    await between(page);
  }
  throw new Error('the pages never ended');
}

const once = (ids: number[]) => expect(new Set(ids).size).toBe(ids.length);

describe('paged lists', () => {
  it('when parts are added while the ledger is read page by page, then every part there at the start comes exactly once', async () => {
    const add = (ref: string) =>
      tech
        .post(`/api/restorations/${restorationId}/parts`)
        .send({ componentRef: ref })
        .then((r) => r.body.id as number);
    const before: number[] = [];
    for (const ref of ['C1', 'C2', 'C12', 'C30', 'R1', 'R1', 'R23', 'R7', 'V1', 'V2', 'V3'])
      before.push(await add(ref));
    const seen = await walk(`/api/restorations/${restorationId}/parts`, async (page) => {
      await add(page % 2 ? 'A9' : 'Z9'); // one before the read position, one after
    });
    once(seen);
    expect(seen).toEqual(expect.arrayContaining(before));
  });

  it('when events are added while the history is read page by page, then every earlier event comes exactly once, newest first', async () => {
    const at = (minutes: number) => new Date(Date.UTC(2026, 10, 20, 9, minutes, 0, 0));
    // Several events share one instant: the cursor must tell them apart by id.
    const rows = await t.db
      .insert(events)
      .values(
        Array.from({ length: 13 }, (_, i) => ({
          restorationId,
          kind: 'stage-changed' as const,
          actorId: techId,
          data: { from: 'intake', to: 'assessment' },
          createdAt: at(Math.floor(i / 3)),
        })),
      )
      .returning({ id: events.id });
    const seen = await walk(`/api/restorations/${restorationId}/events`, async () => {
      await t.db
        .insert(events)
        .values({ restorationId, kind: 'stage-changed', actorId: techId, data: { from: 'assessment', to: 'repair' } });
    });
    once(seen);
    // Later instants were inserted with higher ids, so newest first is highest id first.
    const earlier = new Set(rows.map((r) => r.id));
    expect(seen.filter((id) => earlier.has(id))).toEqual(rows.map((r) => r.id).sort((a, b) => b - a));
  });

  it('when notifications arrive while the list is read page by page, then every earlier one comes exactly once', async () => {
    const photoId = await createPhotoRow(t.db, restorationId);
    const [finding] = await t.db
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
    const note = () => ({
      userId: techId,
      restorationId,
      findingId: finding!.id,
      kind: 'reply' as const,
      summary: 'A reply on #1 Hum',
    });
    const rows = await t.db
      .insert(notifications)
      .values(Array.from({ length: 10 }, note))
      .returning({ id: notifications.id });
    const seen = await walk('/api/notifications', async () => {
      await t.db.insert(notifications).values(note());
    });
    once(seen);
    expect(seen).toEqual(expect.arrayContaining(rows.map((r) => r.id)));
  });

  it('when the limit is over the maximum or the cursor is forged, then 400', async () => {
    expect((await tech.get(`/api/restorations/${restorationId}/parts`).query({ limit: 501 })).status).toBe(400);
    expect((await tech.get(`/api/restorations/${restorationId}/parts`).query({ cursor: 'not-a-cursor' })).status).toBe(
      400,
    );
  });
});

import type { Agent } from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { eq } from 'drizzle-orm';
import { users } from '../../server/db/schema';
import { createPhotoRow } from '../factories/photos';
import { createRestoration } from '../factories/restorations';
import { createUser, signedIn } from '../factories/users';
import { startTestApp } from '../support/test-app';

let t: Awaited<ReturnType<typeof startTestApp>>;
let tech: Agent, owner: Agent;
let photoId: number;

beforeAll(async () => {
  t = await startTestApp();
  const people = {
    tech: await createUser(t.db, { name: 'Mara Bench' }),
    owner: await createUser(t.db, { name: 'Philippa Home' }),
  };
  const restorationId = (
    await createRestoration(t.db, [
      { userId: people.tech.id, role: 'technician' },
      { userId: people.owner.id, role: 'owner' },
    ])
  ).id;
  photoId = await createPhotoRow(t.db, restorationId, true);
  [tech, owner] = await Promise.all([signedIn(t.app, people.tech), signedIn(t.app, people.owner)]);
});
afterAll(() => t.stop());

const pin = (title: string, ownerVisible: boolean) => ({
  shape: 'pin',
  points: [{ x: 0.42, y: 0.31 }],
  title,
  componentRef: 'C7',
  ownerVisible,
});
const titles = (body: { title: string }[]) => body.map((f) => f.title).sort();
const list = (agent: Agent, etag?: string) => {
  const req = agent.get(`/api/photos/${photoId}/findings`);
  return etag ? req.set('If-None-Match', etag) : req;
};

describe('the findings list of a photo, cached per version', () => {
  it('when nothing changed, then the ETag answers 304; after a comment, 200 with the new count and a new ETag', async () => {
    const created = await tech.post(`/api/photos/${photoId}/findings`).send(pin('Leaky coupling capacitor', false));
    expect(created.status).toBe(201);
    const first = await list(tech);
    expect(first.status).toBe(200);
    const etag = first.headers.etag as string;
    expect(etag).toBeTruthy();
    expect((await list(tech, etag)).status).toBe(304);
    expect((await list(tech, etag)).status).toBe(304);

    expect(
      (await tech.post(`/api/findings/${created.body.id}/comments`).send({ body: 'Measured 2 µA leakage at 250 V.' }))
        .status,
    ).toBe(201);
    const after = await list(tech, etag);
    expect(after.status).toBe(200);
    expect(after.headers.etag).not.toBe(etag);
    expect(after.body.find((f: { id: number }) => f.id === created.body.id).commentCount).toBe(
      first.body[0].commentCount + 1,
    );
  });

  it('when a finding is edited, deleted or its author renamed, then the next read shows it', async () => {
    const created = await tech.post(`/api/photos/${photoId}/findings`).send(pin('Hum at idle', false));
    expect(titles((await list(tech)).body)).toContain('Hum at idle');
    await tech.patch(`/api/findings/${created.body.id}`).send({ title: 'Hum at idle, 100 Hz' });
    expect(titles((await list(tech)).body)).toContain('Hum at idle, 100 Hz');
    await t.db.update(users).set({ name: 'Mara Bench-Hale' }).where(eq(users.name, 'Mara Bench'));
    expect((await list(tech)).body.every((f: { authorName: string }) => f.authorName === 'Mara Bench-Hale')).toBe(true);
    expect((await tech.delete(`/api/findings/${created.body.id}`)).status).toBe(204);
    expect(titles((await list(tech)).body)).not.toContain('Hum at idle, 100 Hz');
  });

  it('when the staff list is cached, then an owner still gets only what is shared, follows sharing, and never the staff ETag', async () => {
    await tech.post(`/api/photos/${photoId}/findings`).send(pin('Shared: dial lamp replaced', true));
    await tech.post(`/api/photos/${photoId}/findings`).send(pin('Internal: suspect wiring', false));
    const staff = await list(tech);
    expect(titles(staff.body)).toEqual(
      expect.arrayContaining(['Shared: dial lamp replaced', 'Internal: suspect wiring']),
    );
    // The owner presenting the staff ETag must not be told "unchanged": that list is not theirs.
    const ownerRead = await list(owner, staff.headers.etag as string);
    expect(ownerRead.status).toBe(200);
    expect(ownerRead.headers.etag).not.toBe(staff.headers.etag);
    expect(titles(ownerRead.body)).toEqual(['Shared: dial lamp replaced']);
    expect((await list(owner, ownerRead.headers.etag as string)).status).toBe(304);

    const internal = staff.body.find((f: { title: string }) => f.title === 'Internal: suspect wiring');
    await tech.patch(`/api/findings/${internal.id}`).send({ ownerVisible: true });
    expect(titles((await list(owner, ownerRead.headers.etag as string)).body)).toEqual([
      'Internal: suspect wiring',
      'Shared: dial lamp replaced',
    ]);

    await tech.patch(`/api/photos/${photoId}`).send({ ownerVisible: false });
    expect((await list(owner, ownerRead.headers.etag as string)).status).toBe(404);
    expect((await list(tech)).status).toBe(200);
  });
});

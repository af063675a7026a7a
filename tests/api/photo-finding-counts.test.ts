import type { Agent } from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { photoSchema } from '../../shared/schemas/photos';
import { createPhotoRow } from '../factories/photos';
import { createRestoration } from '../factories/restorations';
import { createUser, signedIn } from '../factories/users';
import { startTestApp } from '../support/test-app';

let t: Awaited<ReturnType<typeof startTestApp>>;
let tech: Agent, owner: Agent;
let restorationId: number;
let sharedPhoto: number, workshopPhoto: number, emptyPhoto: number;

async function finding(photoId: number, status: string, ownerVisible: boolean) {
  const res = await tech
    .post(`/api/photos/${photoId}/findings`)
    .send({ title: `A ${status} joint`, shape: 'pin', points: [{ x: 0.5, y: 0.5 }], ownerVisible });
  expect(res.status).toBe(201);
  if (status !== 'observed') {
    const patch = await tech
      .patch(`/api/findings/${res.body.id}`)
      .send(status === 'dismissed' ? { status, dismissReason: 'Not a fault' } : { status });
    expect(patch.status).toBe(200);
  }
}

beforeAll(async () => {
  t = await startTestApp();
  const [a, c] = await Promise.all([createUser(t.db), createUser(t.db)]);
  restorationId = (
    await createRestoration(t.db, [
      { userId: a.id, role: 'technician' },
      { userId: c.id, role: 'owner' },
    ])
  ).id;
  [tech, owner] = await Promise.all([signedIn(t.app, a), signedIn(t.app, c)]);
  [sharedPhoto, workshopPhoto, emptyPhoto] = await Promise.all([
    createPhotoRow(t.db, restorationId, true),
    createPhotoRow(t.db, restorationId, false),
    createPhotoRow(t.db, restorationId, true),
  ]);
  // On the shared photo: two observed (one shared), one confirmed (shared), one dismissed (not shared).
  await finding(sharedPhoto, 'observed', true);
  await finding(sharedPhoto, 'observed', false);
  await finding(sharedPhoto, 'confirmed', true);
  await finding(sharedPhoto, 'dismissed', false);
  // On the workshop-only photo: one repaired finding, marked shared, which an owner still must not count.
  await finding(workshopPhoto, 'repaired', true);
});
afterAll(() => t.stop());

const countsOf = async (agent: Agent) => {
  const res = await agent.get(`/api/restorations/${restorationId}/photos`);
  expect(res.status).toBe(200);
  const list = photoSchema.array().parse(res.body);
  return new Map(list.map((p) => [p.id, p.findingCounts]));
};

describe('finding counts on the photos list', () => {
  it('when a technician lists the photos, then each has its findings counted by status, and a photo with none has an empty count', async () => {
    const counts = await countsOf(tech);
    expect(counts.get(sharedPhoto)).toEqual({ observed: 2, confirmed: 1, dismissed: 1 });
    expect(counts.get(workshopPhoto)).toEqual({ repaired: 1 });
    expect(counts.get(emptyPhoto)).toEqual({});
  });

  it('when the owner lists the photos, then only findings shared with them count, under the same rule as the findings themselves', async () => {
    const counts = await countsOf(owner);
    expect(counts.has(workshopPhoto)).toBe(false);
    expect(counts.get(sharedPhoto)).toEqual({ observed: 1, confirmed: 1 });
    // The same answer as counting the findings list the owner is given.
    const listed = await owner.get(`/api/restorations/${restorationId}/findings`);
    expect(listed.status).toBe(200);
    const byStatus: Record<string, number> = {};
    for (const f of listed.body as { photoId: number; status: string }[])
      if (f.photoId === sharedPhoto) byStatus[f.status] = (byStatus[f.status] ?? 0) + 1;
    expect(counts.get(sharedPhoto)).toEqual(byStatus);
  });
});

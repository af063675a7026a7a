import { count, eq } from 'drizzle-orm';
import type { Agent } from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { memberships, restorations } from '../../server/db/schema';
import { createUser, signedIn } from '../factories/users';
import { startTestApp } from '../support/test-app';

let t: Awaited<ReturnType<typeof startTestApp>>;
let tech: Agent;
let other: Agent;
beforeAll(async () => {
  t = await startTestApp();
  tech = await signedIn(t.app, await createUser(t.db));
  other = await signedIn(t.app, await createUser(t.db));
});
afterAll(() => t.stop());

const rowCount = async () => (await t.db.select({ n: count() }).from(restorations))[0]!.n;

describe('restorations', () => {
  it('when a set is taken in with make and model, then its creator is its technician and sees it listed', async () => {
    const created = await tech.post('/api/restorations').send({ make: 'Farrowby', model: 'Lark 3', year: 1957 });
    expect(created.status).toBe(201);
    expect(created.body).toMatchObject({
      make: 'Farrowby',
      model: 'Lark 3',
      year: 1957,
      stage: 'intake',
      serial: null,
      role: 'technician',
    });
    const list = await tech.get('/api/restorations');
    expect(list.body.map((r: { id: number }) => r.id)).toContain(created.body.id);
    const others = await other.get('/api/restorations');
    expect(others.body.map((r: { id: number }) => r.id)).not.toContain(created.body.id);
  });

  it('when the make is missing or the year is nonsense, then 400 names the field and nothing is stored', async () => {
    const before = await rowCount();
    const res = await tech.post('/api/restorations').send({ model: 'X', year: 1066 });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('bad_request');
    const paths = res.body.error.details.map((d: { path: string }) => d.path);
    expect(paths).toEqual(expect.arrayContaining(['make', 'year']));
    expect(await rowCount()).toBe(before);
  });

  it('when the body is not JSON, then the answer is 400 in the error shape', async () => {
    const res = await tech.post('/api/restorations').set('Content-Type', 'application/json').send('{"make":');
    expect(res.status).toBe(400);
    expect(res.body.error.message).toMatch(/not valid JSON/);
  });

  it('when searching by serial or model, then only matching sets come back', async () => {
    await tech.post('/api/restorations').send({ make: 'Ormsby', model: 'Stonechat', serial: 'OR-777' });
    const bySerial = await tech.get('/api/restorations').query({ q: 'or-77' });
    expect(bySerial.body.map((r: { serial: string }) => r.serial)).toEqual(['OR-777']);
    const none = await tech.get('/api/restorations').query({ q: '100%_' });
    expect(none.status).toBe(200);
    expect(none.body).toEqual([]);
  });

  it('when a restoration moves to a new stage, then the change is kept, nothing else changes; an unknown stage is refused', async () => {
    const { body } = await tech
      .post('/api/restorations')
      .send({ make: 'Farrowby', model: 'Wren', liveChassis: true, workLevel: 'refurbish' });
    const res = await tech.patch(`/api/restorations/${body.id}`).send({ stage: 'assessment' });
    expect(res.status).toBe(200);
    expect((await tech.get(`/api/restorations/${body.id}`)).body).toMatchObject({
      stage: 'assessment',
      liveChassis: true,
      workLevel: 'refurbish',
    });
    const bad = await tech.patch(`/api/restorations/${body.id}`).send({ stage: 'finished' });
    expect(bad.status).toBe(400);
  });

  it('when the id is not a number or does not exist, then 400 and 404', async () => {
    expect((await tech.get('/api/restorations/abc')).status).toBe(400);
    expect((await tech.get('/api/restorations/999999')).status).toBe(404);
  });

  it('when a restoration is deleted, then its memberships go with it', async () => {
    const { body } = await tech.post('/api/restorations').send({ make: 'Farrowby', model: 'Gone' });
    const membershipsOf = async () =>
      (await t.db.select({ n: count() }).from(memberships).where(eq(memberships.restorationId, body.id)))[0]!.n;
    expect(await membershipsOf()).toBe(1);
    expect((await tech.delete(`/api/restorations/${body.id}`)).status).toBe(204);
    expect((await tech.get(`/api/restorations/${body.id}`)).status).toBe(404);
    expect(await membershipsOf()).toBe(0);
  });

  it('when a cookie-carrying write comes from another origin, then it is refused and nothing changes', async () => {
    const before = await rowCount();
    const res = await tech
      .post('/api/restorations')
      .set('Origin', 'https://elsewhere.example')
      .send({ make: 'A', model: 'B' });
    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe('bad_origin');
    const noOrigin = await tech.post('/api/restorations').unset('Origin').send({ make: 'A', model: 'B' });
    expect(noOrigin.status).toBe(403);
    expect(await rowCount()).toBe(before);
  });
});

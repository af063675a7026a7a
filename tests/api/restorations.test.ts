import { count } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { restorations } from '../../server/db/schema';
import { startTestApp, TEST_ORIGIN } from '../support/test-app';

let t: Awaited<ReturnType<typeof startTestApp>>;
beforeAll(async () => {
  t = await startTestApp();
});
afterAll(() => t.stop());

const rowCount = async () => (await t.db.select({ n: count() }).from(restorations))[0]!.n;

describe('restorations', () => {
  it('when a set is taken in with make and model, then it is listed at intake', async () => {
    const created = await t.request().post('/api/restorations').send({ make: 'Fenwick', model: 'Lark 3', year: 1957 });
    expect(created.status).toBe(201);
    expect(created.body).toMatchObject({ make: 'Fenwick', model: 'Lark 3', year: 1957, stage: 'intake', serial: null });
    const list = await t.request().get('/api/restorations');
    expect(list.body.map((r: { id: number }) => r.id)).toContain(created.body.id);
  });

  it('when the make is missing or the year is nonsense, then 400 names the field and nothing is stored', async () => {
    const before = await rowCount();
    const res = await t.request().post('/api/restorations').send({ model: 'X', year: 1066 });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('bad_request');
    const paths = res.body.error.details.map((d: { path: string }) => d.path);
    expect(paths).toEqual(expect.arrayContaining(['make', 'year']));
    expect(await rowCount()).toBe(before);
  });

  it('when the body is not JSON, then the answer is 400 in the error shape', async () => {
    const res = await t.request().post('/api/restorations').set('Content-Type', 'application/json').send('{"make":');
    expect(res.status).toBe(400);
    expect(res.body.error.message).toMatch(/not valid JSON/);
  });

  it('when searching by serial or model, then only matching sets come back', async () => {
    await t.request().post('/api/restorations').send({ make: 'Brannock', model: 'Skylark', serial: 'BR-777' });
    const bySerial = await t.request().get('/api/restorations').query({ q: 'br-77' });
    expect(bySerial.body.map((r: { serial: string }) => r.serial)).toEqual(['BR-777']);
    const none = await t.request().get('/api/restorations').query({ q: '100%_' });
    expect(none.status).toBe(200);
    expect(none.body).toEqual([]);
  });

  it('when a restoration moves to a new stage, then the change is kept', async () => {
    const { body } = await t.request().post('/api/restorations').send({ make: 'Fenwick', model: 'Wren' });
    const res = await t.request().patch(`/api/restorations/${body.id}`).send({ stage: 'assessment' });
    expect(res.status).toBe(200);
    expect((await t.request().get(`/api/restorations/${body.id}`)).body.stage).toBe('assessment');
    const bad = await t.request().patch(`/api/restorations/${body.id}`).send({ stage: 'finished' });
    expect(bad.status).toBe(400);
  });

  it('when the id is not a number or does not exist, then 400 and 404', async () => {
    expect((await t.request().get('/api/restorations/abc')).status).toBe(400);
    expect((await t.request().get('/api/restorations/999999')).status).toBe(404);
  });

  it('when a cookie-carrying write comes from another origin, then it is refused and nothing changes', async () => {
    const before = await rowCount();
    const res = await t
      .request()
      .post('/api/restorations')
      .set('Cookie', 'gridleak.sid=x')
      .set('Origin', 'https://elsewhere.example')
      .send({ make: 'A', model: 'B' });
    expect(res.status).toBe(403);
    expect(await rowCount()).toBe(before);
    const ok = await t.request().post('/api/restorations').set('Cookie', 'gridleak.sid=x').set('Origin', TEST_ORIGIN).send({ make: 'A', model: 'B' });
    expect(ok.status).toBe(201);
  });
});

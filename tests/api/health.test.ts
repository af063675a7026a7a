import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startTestApp } from '../support/test-app';

let t: Awaited<ReturnType<typeof startTestApp>>;
beforeAll(async () => {
  t = await startTestApp();
});
afterAll(() => t.stop());

describe('GET /api/health', () => {
  it('when every service answers, then it reports each as up', async () => {
    const res = await t.request().get('/api/health');
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ ok: true, database: true, storage: true, mail: true });
  });

  it('when storage is unreachable, then it says so and answers 503', async () => {
    const original = t.deps.storage.probe;
    t.deps.storage.probe = async () => false;
    try {
      const res = await t.request().get('/api/health');
      expect(res.status).toBe(503);
      expect(res.body).toMatchObject({ ok: false, database: true, storage: false });
    } finally {
      t.deps.storage.probe = original;
    }
  });
});

describe('GET /api/health when mail is down', () => {
  it('when the mail server does not answer, then health says so but stays ready (200)', async () => {
    const original = t.deps.mailer.probe;
    t.deps.mailer.probe = async () => false;
    try {
      const res = await t.request().get('/api/health');
      expect(res.status).toBe(200);
      expect(res.body).toEqual({ ok: true, database: true, storage: true, mail: false });
    } finally {
      t.deps.mailer.probe = original;
    }
  });

  it('when the database does not answer, then 503 whatever mail says', async () => {
    const original = t.deps.db.execute;
    t.deps.db.execute = (async () => {
      throw new Error('connection refused');
    }) as unknown as typeof original;
    try {
      const res = await t.request().get('/api/health');
      expect(res.status).toBe(503);
      expect(res.body).toMatchObject({ ok: false, database: false });
    } finally {
      t.deps.db.execute = original;
    }
  });
});

describe('unknown API routes', () => {
  it('when a route does not exist, then the answer is a 404 in the error shape', async () => {
    const res = await t.request().get('/api/no-such-thing');
    expect(res.status).toBe(404);
    expect(res.body.error).toMatchObject({ code: 'not_found' });
  });
});

describe('GET /api/dev/mail', () => {
  it('when a message goes through the SMTP capture, then it is listed newest first', async () => {
    await t.deps.mailer.send({ to: 'first@example.test', subject: 'First', text: 'one' });
    await t.deps.mailer.send({
      to: 'second@example.test',
      subject: 'Second',
      text: 'two\nhttp://x.test/invitations/abc',
    });
    const res = await t.request().get('/api/dev/mail');
    expect(res.status).toBe(200);
    expect(res.body.map((m: { subject: string }) => m.subject).slice(0, 2)).toEqual(['Second', 'First']);
    expect(res.body[0]).toMatchObject({ to: 'second@example.test', text: expect.stringContaining('/invitations/abc') });
  });
});

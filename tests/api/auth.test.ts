import { eq, sql } from 'drizzle-orm';
import type { Agent } from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { accountTokens, users } from '../../server/db/schema';
import { anonymous, createUser, signedIn } from '../factories/users';
import { tokenFrom, waitForMail } from '../support/mail';
import { startTestApp } from '../support/test-app';

let t: Awaited<ReturnType<typeof startTestApp>>;
beforeAll(async () => {
  t = await startTestApp();
});
afterAll(() => t.stop());

const mails = async () => (await t.request().get('/api/dev/mail')).body;
const strong = 'grid leak and a cathode bypass';

describe('sign-up and confirmation', () => {
  it('when a new address signs up, then it must confirm by e-mail, and the stored hash is argon2id', async () => {
    const visitor = anonymous(t.app);
    const res = await visitor
      .post('/api/auth/sign-up')
      .send({ name: 'Ada Quill', email: 'Ada.Quill@Example.test', password: strong });
    expect(res.status).toBe(202);
    expect(res.body).toEqual({ status: 'check-email' });
    expect(
      (await visitor.post('/api/auth/sign-in').send({ email: 'ada.quill@example.test', password: strong })).status,
    ).toBe(403);
    const token = tokenFrom(await waitForMail(mails, 'Ada.Quill@Example.test', /Confirm/), 'confirm-email');
    const confirmed = await visitor.post('/api/auth/confirm-email').send({ token });
    expect(confirmed.status).toBe(200);
    expect(confirmed.body).toEqual({ id: expect.any(Number), name: 'Ada Quill', email: 'Ada.Quill@Example.test' });
    expect((await visitor.get('/api/auth/me')).status).toBe(200);
    const [row] = await t.db
      .select()
      .from(users)
      .where(sql`lower(${users.email}) = 'ada.quill@example.test'`);
    expect(row!.passwordHash).toMatch(/^\$argon2id\$v=19\$m=19456,p=1,t=2\$/);
    expect((await visitor.post('/api/auth/confirm-email').send({ token })).status).toBe(410);
  });

  it('when an address that has an account signs up again, then the answer is the same and the owner is told by e-mail', async () => {
    const existing = await createUser(t.db);
    const res = await anonymous(t.app)
      .post('/api/auth/sign-up')
      .send({ name: 'Someone', email: existing.email.toUpperCase(), password: strong });
    expect(res.status).toBe(202);
    expect(res.body).toEqual({ status: 'check-email' });
    await waitForMail(mails, existing.email, /Your Gridleak account/);
  });

  it('when the password is short or among the most common, then sign-up is refused and nothing is created', async () => {
    const before = (await t.db.select({ n: sql<number>`count(*)::int` }).from(users))[0]!.n;
    const short = await anonymous(t.app)
      .post('/api/auth/sign-up')
      .send({ name: 'A', email: 'short@example.test', password: 'valve' });
    expect(short.status).toBe(400);
    const common = await anonymous(t.app)
      .post('/api/auth/sign-up')
      .send({ name: 'A', email: 'common@example.test', password: 'password123' });
    expect(common.status).toBe(400);
    expect(common.body.error.message).toMatch(/most common/);
    expect((await t.db.select({ n: sql<number>`count(*)::int` }).from(users))[0]!.n).toBe(before);
  });
});

describe('sign-in, sessions and throttling', () => {
  it('when the password is wrong or the account does not exist, then the message is the same', async () => {
    const user = await createUser(t.db);
    const wrong = await anonymous(t.app)
      .post('/api/auth/sign-in')
      .send({ email: user.email, password: 'not it at all' });
    const nobody = await anonymous(t.app)
      .post('/api/auth/sign-in')
      .send({ email: 'nobody@example.test', password: 'not it at all' });
    expect([wrong.status, nobody.status]).toEqual([401, 401]);
    expect(wrong.body).toEqual(nobody.body);
  });

  it('when signed in, then the cookie is httpOnly and SameSite=Lax, session-only unless kept', async () => {
    const user = await createUser(t.db);
    const plain = await anonymous(t.app).post('/api/auth/sign-in').send({ email: user.email, password: user.password });
    const cookie = plain.headers['set-cookie']![0]!;
    expect(cookie).toMatch(/gridleak\.sid=/);
    expect(cookie).toMatch(/HttpOnly/);
    expect(cookie).toMatch(/SameSite=Lax/);
    expect(cookie).not.toMatch(/Expires=/);
    const kept = await anonymous(t.app)
      .post('/api/auth/sign-in')
      .send({ email: user.email, password: user.password, remember: true });
    expect(kept.headers['set-cookie']![0]).toMatch(/Expires=/);
    expect(plain.body).not.toHaveProperty('passwordHash');
  });

  it('when served over HTTPS behind a trusted proxy, then the cookie is Secure', async () => {
    const behindProxy = await startTestApp({}, { trustProxy: '1' });
    try {
      const user = await createUser(behindProxy.db);
      const res = await anonymous(behindProxy.app)
        .post('/api/auth/sign-in')
        .set('X-Forwarded-Proto', 'https')
        .send({ email: user.email, password: user.password });
      expect(res.headers['set-cookie']![0]).toMatch(/Secure/);
    } finally {
      await behindProxy.stop();
    }
  });

  it('when one address fails across many accounts, then that address is throttled and others are not', async () => {
    const app = await startTestApp(
      { throttle: { signInPerAccount: 100, signInPerIp: 3, resetPerAccount: 100, resetPerIp: 100, windowSeconds: 60 } },
      { trustProxy: '1' },
    );
    try {
      const attempt = (ip: string) =>
        anonymous(app.app)
          .post('/api/auth/sign-in')
          .set('X-Forwarded-For', ip)
          .send({ email: `x${Math.random()}@example.test`, password: 'nope nope nope' });
      for (let i = 0; i < 3; i++) expect((await attempt('203.0.113.7')).status).toBe(401);
      expect((await attempt('203.0.113.7')).status).toBe(429);
      expect((await attempt('203.0.113.8')).status).toBe(401);
    } finally {
      await app.stop();
    }
  });

  it('when someone signs in on a browser that already had a session, then the session id changes', async () => {
    const first = await createUser(t.db);
    const second = await createUser(t.db);
    const agent = await signedIn(t.app, first);
    const before = (await agent.get('/api/auth/me')).request.cookies;
    const res = await agent.post('/api/auth/sign-in').send({ email: second.email, password: second.password });
    const after = res.headers['set-cookie']![0]!.split(';')[0]!;
    expect(after).not.toBe(before);
    expect((await t.request().get('/api/auth/me').set('Cookie', before)).status).toBe(401);
    expect((await agent.get('/api/auth/me')).body.email).toBe(second.email);
  });

  it('when a session signs out, then its cookie no longer works', async () => {
    const user = await createUser(t.db);
    const agent = await signedIn(t.app, user);
    const cookie = (await agent.get('/api/auth/me')).request.cookies;
    expect((await agent.post('/api/auth/sign-out')).status).toBe(204);
    expect((await t.request().get('/api/auth/me').set('Cookie', cookie)).status).toBe(401);
  });

  it('when the page asks who is signed in, then a signed-out visitor gets 200 with no one, and a signed-in one gets themselves', async () => {
    const user = await createUser(t.db);
    const agent = await signedIn(t.app, user);
    const mine = await agent.get('/api/auth/session');
    expect(mine.status).toBe(200);
    expect(mine.body).toEqual({ user: { id: user.id, name: user.name, email: user.email } });
    expect((await agent.post('/api/auth/sign-out')).status).toBe(204);
    const after = await agent.get('/api/auth/session');
    expect(after.status).toBe(200);
    expect(after.body).toEqual({ user: null });
  });

  it('when an account fails sign-in three times, then even the right password waits (429)', async () => {
    const user = await createUser(t.db);
    for (let i = 0; i < 3; i++)
      expect(
        (
          await anonymous(t.app)
            .post('/api/auth/sign-in')
            .send({ email: user.email, password: 'guess ' + i })
        ).status,
      ).toBe(401);
    const right = await anonymous(t.app)
      .post('/api/auth/sign-in')
      .send({ email: user.email.toUpperCase(), password: user.password });
    expect(right.status).toBe(429);
    expect(right.body.error.code).toBe('too_many_requests');
  });
});

describe('password reset', () => {
  it('when a reset is asked for, then the answer is the same whether or not the account exists', async () => {
    const user = await createUser(t.db);
    const known = await anonymous(t.app).post('/api/auth/password-reset').send({ email: user.email });
    const unknown = await anonymous(t.app).post('/api/auth/password-reset').send({ email: 'ghost@example.test' });
    expect([known.status, unknown.status]).toEqual([202, 202]);
    expect(known.body).toEqual(unknown.body);
    await waitForMail(mails, user.email, /Reset/);
  });

  it('when the link is used, then the new password works, other sessions end and the link cannot be reused', async () => {
    const user = await createUser(t.db);
    const elsewhere: Agent = await signedIn(t.app, user);
    await anonymous(t.app).post('/api/auth/password-reset').send({ email: user.email });
    const token = tokenFrom(await waitForMail(mails, user.email, /Reset/), 'reset-password');
    const newPassword = 'restuffed wax tubulars';
    const done = await anonymous(t.app).post('/api/auth/password-reset/confirm').send({ token, password: newPassword });
    expect(done.status).toBe(200);
    expect((await elsewhere.get('/api/auth/me')).status).toBe(401);
    expect(
      (await anonymous(t.app).post('/api/auth/sign-in').send({ email: user.email, password: newPassword })).status,
    ).toBe(200);
    const again = await anonymous(t.app)
      .post('/api/auth/password-reset/confirm')
      .send({ token, password: 'another long passphrase' });
    expect(again.status).toBe(410);
  });

  it('when the link is older than an hour, then it is refused', async () => {
    const user = await createUser(t.db);
    await anonymous(t.app).post('/api/auth/password-reset').send({ email: user.email });
    const token = tokenFrom(await waitForMail(mails, user.email, /Reset/), 'reset-password');
    await t.db
      .update(accountTokens)
      .set({ expiresAt: new Date(Date.now() - 1000) })
      .where(eq(accountTokens.userId, user.id));
    const res = await anonymous(t.app)
      .post('/api/auth/password-reset/confirm')
      .send({ token, password: 'restuffed wax tubulars' });
    expect(res.status).toBe(410);
  });

  it('when resets are asked for too often for one account, then the next is throttled', async () => {
    const user = await createUser(t.db);
    for (let i = 0; i < 2; i++)
      expect((await anonymous(t.app).post('/api/auth/password-reset').send({ email: user.email })).status).toBe(202);
    expect((await anonymous(t.app).post('/api/auth/password-reset').send({ email: user.email })).status).toBe(429);
  });
});

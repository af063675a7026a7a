import { createServer } from 'node:net';
import { and, count, eq, isNull, sql } from 'drizzle-orm';
import supertest from 'supertest';
import type { Agent } from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createApp } from '../../server/app';
import { invitations, memberships, users } from '../../server/db/schema';
import { createMailer } from '../../server/mail';
import { createRestoration } from '../factories/restorations';
import { anonymous, createUser, FACTORY_PASSWORD, signedIn } from '../factories/users';
import { whileFailing } from '../support/fail-writes';
import { tokenFrom, waitForMail } from '../support/mail';
import { startTestApp, TEST_ORIGIN } from '../support/test-app';

let t: Awaited<ReturnType<typeof startTestApp>>;
let techUser: Awaited<ReturnType<typeof createUser>>;
let tech: Agent;
beforeAll(async () => {
  t = await startTestApp();
  techUser = await createUser(t.db, { name: 'Mara Bench' });
  tech = await signedIn(t.app, techUser);
});
afterAll(() => t.stop());

const strong = 'grid leak resistor drifted high';
const mails = async () => (await t.request().get('/api/dev/mail')).body;
const newSet = () =>
  createRestoration(t.db, [{ userId: techUser.id, role: 'technician' }], { make: 'Farrowby', model: 'Kestrel' });
async function invite(restorationId: number, email: string) {
  expect(
    (await tech.post(`/api/restorations/${restorationId}/invitations`).send({ email, role: 'mentor' })).status,
  ).toBe(201);
  return tokenFrom(await waitForMail(mails, email, /invited you/), 'invitations');
}
const memberCount = async (restorationId: number) =>
  (await t.db.select({ n: count() }).from(memberships).where(eq(memberships.restorationId, restorationId)))[0]!.n;

describe('when joining fails, the invitation link is not spent', () => {
  it('then accepting answers 500, nobody joins, and the same link works afterwards', async () => {
    const set = await newSet();
    const guest = await createUser(t.db, { email: 'guest.mentor@example.test' });
    const token = await invite(set.id, guest.email);
    const agent = await signedIn(t.app, guest);
    const failed = await whileFailing(t.db, 'memberships', 'insert', () =>
      agent.post(`/api/invitations/${token}/accept`),
    );
    expect(failed.status).toBe(500);
    expect(await memberCount(set.id)).toBe(1);
    const [row] = await t.db.select().from(invitations).where(eq(invitations.restorationId, set.id));
    expect(row!.acceptedAt).toBeNull();
    expect((await agent.post(`/api/invitations/${token}/accept`)).body).toMatchObject({
      restorationId: set.id,
      role: 'mentor',
    });
  });

  it('then signing up from the link leaves no account, and signing up again with the same link works', async () => {
    const set = await newSet();
    const email = 'new.mentor.retry@example.test';
    const token = await invite(set.id, email);
    const signUp = () =>
      anonymous(t.app)
        .post('/api/auth/sign-up')
        .send({ name: 'New Mentor', email, password: strong, invitationToken: token });
    expect((await whileFailing(t.db, 'memberships', 'insert', signUp)).status).toBe(500);
    expect(
      await t.db
        .select()
        .from(users)
        .where(sql`lower(${users.email}) = ${email}`),
    ).toEqual([]);
    const retried = await signUp();
    expect(retried.status).toBe(201);
    expect(retried.body).toMatchObject({ status: 'signed-in', restorationId: set.id });
  });
});

describe('when a password reset cannot end the other sessions', () => {
  it('then the old password still works and the reset link can be used again', async () => {
    const person = await createUser(t.db);
    await anonymous(t.app).post('/api/auth/password-reset').send({ email: person.email });
    const token = tokenFrom(await waitForMail(mails, person.email, /Reset/), 'reset-password');
    const confirm = () => anonymous(t.app).post('/api/auth/password-reset/confirm').send({ token, password: strong });
    expect((await whileFailing(t.db, 'sessions', 'delete', confirm)).status).toBe(500);
    expect(
      (await anonymous(t.app).post('/api/auth/sign-in').send({ email: person.email, password: FACTORY_PASSWORD }))
        .status,
    ).toBe(200);
    expect((await confirm()).status).toBe(200);
    expect(
      (await anonymous(t.app).post('/api/auth/sign-in').send({ email: person.email, password: strong })).status,
    ).toBe(200);
  });
});

/** A port nothing listens on: the mail server is down. */
async function closedPort(): Promise<number> {
  const server = createServer();
  await new Promise<void>((r) => server.listen(0, '127.0.0.1', r));
  const { port } = server.address() as { port: number };
  await new Promise((r) => server.close(r));
  return port;
}

describe('when the mail server is down', () => {
  let down: ReturnType<typeof createApp>;
  beforeAll(async () => {
    down = createApp({
      ...t.deps,
      mailer: createMailer(`smtp://127.0.0.1:${await closedPort()}`, 'Gridleak <no-reply@gridleak.test>'),
    });
  });

  it('then an invitation answers 503 with a message, creates nothing and the pending one stays valid', async () => {
    const set = await newSet();
    const email = 'owner.smtp@example.test';
    const first = await invite(set.id, email);
    const agent = await signedIn(down, techUser);
    const res = await agent.post(`/api/restorations/${set.id}/invitations`).send({ email, role: 'owner' });
    expect(res.status).toBe(503);
    expect(res.body.error).toMatchObject({
      code: 'mail_unavailable',
      message: expect.stringMatching(/could not send the e-mail/),
    });
    const pending = await t.db
      .select()
      .from(invitations)
      .where(and(eq(invitations.restorationId, set.id), isNull(invitations.revokedAt)));
    expect(pending.map((i) => i.role)).toEqual(['mentor']);
    expect((await anonymous(t.app).get(`/api/invitations/${first}`)).status).toBe(200);

    const resend = await agent.post(`/api/restorations/${set.id}/invitations/${pending[0]!.id}/resend`);
    expect(resend.status).toBe(503);
    expect((await anonymous(t.app).get(`/api/invitations/${first}`)).status).toBe(200);
  });

  it('then a sign-up answers 503 with a message and creates no account', async () => {
    const email = 'newcomer.smtp@example.test';
    const res = await supertest(down)
      .post('/api/auth/sign-up')
      .set('Origin', TEST_ORIGIN)
      .send({ name: 'Newcomer', email, password: strong });
    expect(res.status).toBe(503);
    expect(res.body.error.code).toBe('mail_unavailable');
    expect(
      await t.db
        .select()
        .from(users)
        .where(sql`lower(${users.email}) = ${email}`),
    ).toEqual([]);
  });
});

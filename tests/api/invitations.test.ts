import { eq } from 'drizzle-orm';
import type { Agent } from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { invitations } from '../../server/db/schema';
import { createRestoration } from '../factories/restorations';
import { anonymous, createUser, signedIn } from '../factories/users';
import { tokenFrom, waitForMail } from '../support/mail';
import { startTestApp } from '../support/test-app';

let t: Awaited<ReturnType<typeof startTestApp>>;
let tech: Agent;
let techUser: Awaited<ReturnType<typeof createUser>>;
beforeAll(async () => {
  t = await startTestApp();
  techUser = await createUser(t.db, { name: 'Mara Test' });
  tech = await signedIn(t.app, techUser);
});
afterAll(() => t.stop());

const mails = async () => (await t.request().get('/api/dev/mail')).body;
const newSet = () =>
  createRestoration(t.db, [{ userId: techUser.id, role: 'technician' }], { make: 'Farrowby', model: 'Kestrel' });
const strong = 'signal tracer on the detector';

async function invite(restorationId: number, email: string, role: string) {
  const res = await tech.post(`/api/restorations/${restorationId}/invitations`).send({ email, role });
  expect(res.status).toBe(201);
  const mail = await waitForMail(mails, email, /invited you/);
  expect(mail.text).toMatch(new RegExp(`/invitations/[A-Za-z0-9_-]+`));
  return tokenFrom(mail, 'invitations');
}

describe('invitations', () => {
  it('when a mentor signs up from the link, then they join with that role and the link is spent', async () => {
    const set = await newSet();
    const token = await invite(set.id, 'new.mentor@example.test', 'mentor');
    const preview = await anonymous(t.app).get(`/api/invitations/${token}`);
    expect(preview.body).toMatchObject({
      restoration: { id: set.id, make: 'Farrowby' },
      role: 'mentor',
      invitedBy: 'Mara Test',
    });
    const mentor = anonymous(t.app);
    const res = await mentor
      .post('/api/auth/sign-up')
      .send({ name: 'New Mentor', email: 'New.Mentor@example.test', password: strong, invitationToken: token });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ status: 'signed-in', restorationId: set.id });
    expect((await mentor.get(`/api/restorations/${set.id}`)).body.role).toBe('mentor');
    expect((await anonymous(t.app).get(`/api/invitations/${token}`)).status).toBe(410);
    const other = await signedIn(t.app, await createUser(t.db));
    expect((await other.post(`/api/invitations/${token}/accept`)).status).toBe(410);
  });

  it('when an account with another e-mail tries to accept, then it is refused and does not join', async () => {
    const set = await newSet();
    const token = await invite(set.id, 'intended@example.test', 'owner');
    const stranger = await signedIn(t.app, await createUser(t.db));
    const res = await stranger.post(`/api/invitations/${token}/accept`);
    expect(res.status).toBe(403);
    expect((await stranger.get(`/api/restorations/${set.id}`)).status).toBe(404);
    const signUpWrong = await anonymous(t.app)
      .post('/api/auth/sign-up')
      .send({ name: 'X', email: 'other@example.test', password: strong, invitationToken: token });
    expect(signUpWrong.status).toBe(403);
  });

  it('when an existing account accepts its invitation, then it joins with the role', async () => {
    const set = await newSet();
    const owner = await createUser(t.db);
    const token = await invite(set.id, owner.email.toUpperCase(), 'owner');
    const agent = await signedIn(t.app, owner);
    const res = await agent.post(`/api/invitations/${token}/accept`);
    expect(res.status).toBe(200);
    expect((await agent.get(`/api/restorations/${set.id}`)).body.role).toBe('owner');
  });

  it('when an invitation has expired or was revoked, then its link no longer works; a resend issues a new one', async () => {
    const set = await newSet();
    const expiredToken = await invite(set.id, 'late@example.test', 'mentor');
    await t.db
      .update(invitations)
      .set({ expiresAt: new Date(Date.now() - 1000) })
      .where(eq(invitations.email, 'late@example.test'));
    expect((await anonymous(t.app).get(`/api/invitations/${expiredToken}`)).status).toBe(410);

    const token = await invite(set.id, 'maybe@example.test', 'mentor');
    const [pending] = (await tech.get(`/api/restorations/${set.id}/invitations`)).body;
    expect(pending).toMatchObject({ email: 'maybe@example.test', role: 'mentor' });
    expect((await tech.post(`/api/restorations/${set.id}/invitations/${pending.id}/resend`)).status).toBe(204);
    expect((await anonymous(t.app).get(`/api/invitations/${token}`)).status).toBe(410);
    const mailsTo = (await mails()).filter((m: { to: string }) => m.to === 'maybe@example.test');
    const fresh = tokenFrom(mailsTo[0], 'invitations');
    expect((await anonymous(t.app).get(`/api/invitations/${fresh}`)).status).toBe(200);
    expect((await tech.delete(`/api/restorations/${set.id}/invitations/${pending.id}`)).status).toBe(204);
    expect((await anonymous(t.app).get(`/api/invitations/${fresh}`)).status).toBe(410);
    expect((await tech.get(`/api/restorations/${set.id}/invitations`)).body).toEqual([]);
  });

  it('when someone already on the restoration is invited, then it is a conflict', async () => {
    const set = await newSet();
    const res = await tech
      .post(`/api/restorations/${set.id}/invitations`)
      .send({ email: techUser.email, role: 'mentor' });
    expect(res.status).toBe(409);
  });
});

describe('roles', () => {
  it('when the last technician would be demoted or removed, then it is refused; with a second technician it is allowed', async () => {
    const set = await newSet();
    expect(
      (await tech.patch(`/api/restorations/${set.id}/members/${techUser.id}`).send({ role: 'mentor' })).status,
    ).toBe(409);
    expect((await tech.delete(`/api/restorations/${set.id}/members/${techUser.id}`)).status).toBe(409);
    const helper = await createUser(t.db);
    const token = await invite(set.id, helper.email, 'mentor');
    await (await signedIn(t.app, helper)).post(`/api/invitations/${token}/accept`);
    const promoted = await tech.patch(`/api/restorations/${set.id}/members/${helper.id}`).send({ role: 'technician' });
    expect(promoted.status).toBe(200);
    expect(
      (await tech.patch(`/api/restorations/${set.id}/members/${techUser.id}`).send({ role: 'mentor' })).status,
    ).toBe(200);
    const members = (await (await signedIn(t.app, helper)).get(`/api/restorations/${set.id}/members`)).body;
    expect(members.map((m: { role: string }) => m.role).sort()).toEqual(['mentor', 'technician']);
  });
});

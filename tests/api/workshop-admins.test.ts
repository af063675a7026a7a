import { eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { CapturedMail } from '../../shared/schemas/dev-mail';
import type { WorkshopAdmins } from '../../shared/schemas/workshop';
import { users } from '../../server/db/schema';
import { createRestoration } from '../factories/restorations';
import { anonymous, createUser, signedIn } from '../factories/users';
import { tokenFrom } from '../support/mail';
import { startTestApp } from '../support/test-app';

let t: Awaited<ReturnType<typeof startTestApp>>;
beforeAll(async () => {
  t = await startTestApp();
});
afterAll(() => t.stop());

const gbp = {
  currency: 'GBP',
  labourRate: 4000,
  partsMarkupBasisPoints: 2500,
  taxName: 'VAT',
  taxRateBasisPoints: null,
  taxRounding: 'invoice-down',
  estimateApprovalRequired: false,
  invoicePrefix: 'CL-',
  timeZone: 'Europe/London',
};
const isAdmin = async (id: number) =>
  (await t.db.select({ a: users.workshopAdmin }).from(users).where(eq(users.id, id)))[0]!.a;

async function confirmationFor(email: string): Promise<string> {
  const deadline = Date.now() + 10_000;
  for (;;) {
    const mails = (await t.request().get('/api/dev/mail?limit=500')).body as CapturedMail[];
    const mail = mails.find((m) => m.to === email && /Confirm/.test(m.subject));
    if (mail) return tokenFrom(mail, 'confirm-email');
    if (Date.now() > deadline) throw new Error(`no confirmation mail to ${email}`);
    await new Promise((r) => setTimeout(r, 150));
  }
}

/** A technician of a set of their own: anyone may sign up and take one in. */
async function technician(workshopAdmin = false) {
  const user = await createUser(t.db, { workshopAdmin });
  await createRestoration(t.db, [{ userId: user.id, role: 'technician' }]);
  return { user, agent: await signedIn(t.app, user) };
}

describe('the workshop’s administrators', () => {
  // First in the file: the workshop has no administrator yet.
  it('when a new workshop’s first account is confirmed, then it runs the workshop; the next one does not', async () => {
    for (const email of ['first-hand@example.test', 'second-hand@example.test']) {
      const res = await anonymous(t.app)
        .post('/api/auth/sign-up')
        .send({ name: 'Bench hand', email, password: 'a quiet chassis hum' });
      expect(res.status).toBe(202);
    }
    const first = await anonymous(t.app)
      .post('/api/auth/confirm-email')
      .send({ token: await confirmationFor('first-hand@example.test') });
    const second = await anonymous(t.app)
      .post('/api/auth/confirm-email')
      .send({ token: await confirmationFor('second-hand@example.test') });
    expect([first.status, second.status]).toEqual([200, 200]);
    expect(await isAdmin(first.body.id)).toBe(true);
    expect(await isAdmin(second.body.id)).toBe(false);
  });

  it('when a technician who is not an administrator changes the settings, then it is refused and nothing changes', async () => {
    const admin = await technician(true);
    expect((await admin.agent.put('/api/workshop/settings').send(gbp)).status).toBe(200);
    const stranger = await technician();
    // A technician still reads the prices their estimates and invoices use.
    expect((await stranger.agent.get('/api/workshop/settings')).body).toEqual(gbp);
    const refused = await stranger.agent.put('/api/workshop/settings').send({ ...gbp, labourRate: 1 });
    expect(refused.status).toBe(403);
    expect(refused.body.error.message).toMatch(/Only the workshop's administrators change its settings/);
    expect((await admin.agent.get('/api/workshop/settings')).body.labourRate).toBe(4000);
  });

  it('when an administrator adds a confirmed account by its address, then that person may change the settings', async () => {
    const admin = await technician(true);
    const colleague = await technician();
    const unknown = await admin.agent.post('/api/workshop/admins').send({ email: 'nobody-here@example.test' });
    expect(unknown.status).toBe(404);
    const added = await admin.agent.post('/api/workshop/admins').send({ email: colleague.user.email.toUpperCase() });
    expect(added.status).toBe(201);
    expect((added.body as WorkshopAdmins).admins).toContainEqual({
      id: colleague.user.id,
      name: colleague.user.name,
      email: colleague.user.email,
    });
    expect((await colleague.agent.put('/api/workshop/settings').send({ ...gbp, labourRate: 4200 })).status).toBe(200);
    // A colleague cannot name administrators until made one.
    const outsider = await technician();
    expect((await outsider.agent.post('/api/workshop/admins').send({ email: outsider.user.email })).status).toBe(403);
  });

  it('when a technician who is not an administrator asks who they are, then names come without addresses', async () => {
    const admin = await technician(true);
    const other = await technician();
    const seen = (await other.agent.get('/api/workshop/admins')).body as WorkshopAdmins;
    expect(seen.youAreAdmin).toBe(false);
    expect(seen.admins).toContainEqual({ id: admin.user.id, name: admin.user.name, email: null });
    const own = (await admin.agent.get('/api/workshop/admins')).body as WorkshopAdmins;
    expect(own.youAreAdmin).toBe(true);
    expect(own.admins).toContainEqual({ id: admin.user.id, name: admin.user.name, email: admin.user.email });
  });

  it('when the last administrator would be removed, then it is refused; another one can be', async () => {
    // Only this file's people: take the role from everyone first, then give it to two.
    await t.db.update(users).set({ workshopAdmin: false });
    const a = await technician(true);
    const b = await technician(true);
    expect((await a.agent.delete(`/api/workshop/admins/${b.user.id}`)).status).toBe(200);
    const last = await a.agent.delete(`/api/workshop/admins/${a.user.id}`);
    expect(last.status).toBe(409);
    expect(last.body.error.message).toMatch(/at least one administrator/);
    expect(await isAdmin(a.user.id)).toBe(true);
    expect((await a.agent.delete(`/api/workshop/admins/${b.user.id}`)).status).toBe(404);
  });
});

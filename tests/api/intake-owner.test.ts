import { createServer } from 'node:net';
import { eq } from 'drizzle-orm';
import type { Agent } from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createApp } from '../../server/app';
import { restorations } from '../../server/db/schema';
import { createMailer } from '../../server/mail';
import { createUser, signedIn } from '../factories/users';
import { waitForMail } from '../support/mail';
import { startTestApp } from '../support/test-app';

let t: Awaited<ReturnType<typeof startTestApp>>;
let tech: Agent;
let techUser: Awaited<ReturnType<typeof createUser>>;
beforeAll(async () => {
  t = await startTestApp();
  techUser = await createUser(t.db);
  tech = await signedIn(t.app, techUser);
});
afterAll(() => t.stop());

const withModel = async (model: string) =>
  (await t.db.select().from(restorations).where(eq(restorations.model, model))).length;

/** A port where nothing listens, for a mail server that is down. */
async function closedPort(): Promise<number> {
  const server = createServer();
  await new Promise<void>((r) => server.listen(0, '127.0.0.1', r));
  const { port } = server.address() as { port: number };
  await new Promise((r) => server.close(r));
  return port;
}

const mails = async () => (await t.request().get('/api/dev/mail')).body;
const intake = { make: 'Harrowgate', model: 'Lark 4' };

describe('taking in a set with its owner', () => {
  it('when the owner is recorded and invited, then the set keeps their name and e-mail and they get an owner invitation', async () => {
    const res = await tech
      .post('/api/restorations')
      .send({ ...intake, ownerName: 'Odile Fenn', ownerEmail: 'odile.fenn@example.test', inviteOwner: true });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({
      ownerName: 'Odile Fenn',
      ownerEmail: 'odile.fenn@example.test',
      role: 'technician',
    });
    const pending = (await tech.get(`/api/restorations/${res.body.id}/invitations`)).body as {
      email: string;
      role: string;
    }[];
    expect(pending).toEqual([expect.objectContaining({ email: 'odile.fenn@example.test', role: 'owner' })]);
    expect((await waitForMail(mails, 'odile.fenn@example.test')).text).toContain('/invitations/');
  });

  it('when the owner is recorded without inviting, then no invitation is made', async () => {
    const res = await tech
      .post('/api/restorations')
      .send({ ...intake, ownerName: 'Piet Lowe', ownerEmail: 'piet.lowe@example.test' });
    expect(res.status).toBe(201);
    expect((await tech.get(`/api/restorations/${res.body.id}/invitations`)).body).toEqual([]);
  });

  it('when an invitation is asked for without an e-mail, then 400 says so and nothing is created', async () => {
    const res = await tech
      .post('/api/restorations')
      .send({ ...intake, model: 'No Address 2', ownerName: 'No Address', inviteOwner: true });
    expect(res.status).toBe(400);
    expect(JSON.stringify(res.body)).toContain("Enter the owner's e-mail to invite them");
    expect(await withModel('No Address 2')).toBe(0);
  });

  it('when the invitation e-mail cannot be sent, then 503 and the set is not created either (one transaction)', async () => {
    const down = createApp({
      ...t.deps,
      mailer: createMailer(`smtp://127.0.0.1:${await closedPort()}`, 'Gridleak <no-reply@gridleak.test>'),
    });
    const agent = await signedIn(down, techUser);
    const res = await agent
      .post('/api/restorations')
      .send({ ...intake, model: 'Unsent 1', ownerEmail: 'unsent@example.test', inviteOwner: true });
    expect(res.status).toBe(503);
    expect(res.body.error.code).toBe('mail_unavailable');
    expect(await withModel('Unsent 1')).toBe(0);
  });
});

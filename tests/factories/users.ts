import { randomBytes } from 'node:crypto';
import type { Express } from 'express';
import supertest from 'supertest';
import type { Database } from '../../server/db/client';
import { users } from '../../server/db/schema';
import { hashPassword } from '../../server/features/auth/password';
import { TEST_ORIGIN } from '../support/test-app';

export const FACTORY_PASSWORD = 'solder-flux-and-patience';
let passwordHash: Promise<string> | undefined;

/** A confirmed account with a known password, straight into the database; `workshopAdmin` makes it one (decision 46). */
export async function createUser(
  db: Database,
  overrides: { name?: string; email?: string; workshopAdmin?: boolean } = {},
) {
  const tag = randomBytes(4).toString('hex');
  passwordHash ??= hashPassword(FACTORY_PASSWORD);
  const [row] = await db
    .insert(users)
    .values({
      name: overrides.name ?? `Tester ${tag}`,
      email: overrides.email ?? `tester-${tag}@example.test`,
      passwordHash: await passwordHash,
      emailConfirmedAt: new Date(),
      workshopAdmin: overrides.workshopAdmin ?? false,
    })
    .returning();
  return { id: row!.id, name: row!.name, email: row!.email, password: FACTORY_PASSWORD };
}

/** A supertest agent signed in as the user, sending the app's Origin on every request like a browser. */
export async function signedIn(app: Express, user: { email: string; password: string }) {
  const agent = supertest.agent(app).set('Origin', TEST_ORIGIN);
  const res = await agent.post('/api/auth/sign-in').send({ email: user.email, password: user.password });
  if (res.status !== 200) throw new Error(`sign-in failed: ${res.status} ${JSON.stringify(res.body)}`);
  return agent;
}

export const anonymous = (app: Express) => supertest.agent(app).set('Origin', TEST_ORIGIN);

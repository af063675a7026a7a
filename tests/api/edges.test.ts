import http from 'node:http';
import type { AddressInfo } from 'node:net';
import { parse } from 'csv-parse/sync';
import { count, eq, sql } from 'drizzle-orm';
import { pino } from 'pino';
import type { Agent } from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { photos } from '../../server/db/schema';
import { closeupKey, ensureCloseup } from '../../server/features/closeups/closeups';
import { twoToneJpeg } from '../factories/images';
import { createRestoration } from '../factories/restorations';
import { anonymous, createUser, signedIn } from '../factories/users';
import { startTestApp, TEST_ORIGIN } from '../support/test-app';

/** Every line the app logs, as text, so a test can look for what must never be there. */
const logLines: string[] = [];
const logger = pino({ level: 'info' }, { write: (line: string) => void logLines.push(line) });

let t: Awaited<ReturnType<typeof startTestApp>>;
let tech: Agent;
let restorationId: number;
beforeAll(async () => {
  t = await startTestApp({}, {}, { logger });
  const user = await createUser(t.db);
  restorationId = (await createRestoration(t.db, [{ userId: user.id, role: 'technician' }])).id;
  tech = await signedIn(t.app, user);
});
afterAll(() => t.stop());

async function objectsUnder(prefix: string) {
  const keys: string[] = [];
  for await (const o of t.deps.storage.listObjects(prefix)) keys.push(o.key);
  return keys;
}
const until = async (check: () => Promise<boolean>, ms = 10_000) => {
  const deadline = Date.now() + ms;
  while (!(await check())) {
    if (Date.now() > deadline) return false;
    await new Promise((r) => setTimeout(r, 100));
  }
  return true;
};

describe('input the database cannot hold', () => {
  it('when an id is beyond the integer column, then 400, and the largest id is a plain 404', async () => {
    for (const path of [
      '/api/restorations/99999999999',
      '/api/restorations/2147483648',
      '/api/photos/1e20',
      `/api/restorations/${restorationId}/measurements?findingId=4294967296`,
    ])
      expect((await tech.get(path)).status, path).toBe(400);
    expect((await tech.get('/api/restorations/2147483647')).status).toBe(404);
    const part = await tech
      .post(`/api/restorations/${restorationId}/parts`)
      .send({ componentRef: 'R1', findingId: 3_000_000_000 });
    expect(part.status).toBe(400);
  });

  it('when a NUL character arrives in a body, a query or a path, then 400 in the error shape', async () => {
    const body = await tech.post('/api/restorations').send({ make: 'Fen\u0000wick', model: 'Lark 3' });
    expect(body.status).toBe(400);
    expect(body.body.error).toMatchObject({
      code: 'bad_request',
      details: [expect.objectContaining({ location: 'body', path: 'make' })],
    });
    expect((await tech.get(`/api/restorations/${restorationId}/events?kind=%00`)).status).toBe(400);
    expect((await tech.get('/api/restorations/%00')).status).toBe(400);
    const signUp = await anonymous(t.app)
      .post('/api/auth/sign-up')
      .send({ name: 'A\u0000B', email: 'nul@example.test', password: 'grid leak and a cathode bypass' });
    expect(signUp.status).toBe(400);
  });
});

describe('error logs', () => {
  it('when an insert fails, then the log says what failed and never carries the values (no password hash)', async () => {
    await t.db.execute(
      sql`create function refuse_users() returns trigger language plpgsql as $$ begin raise exception 'users are closed'; end $$`,
    );
    await t.db.execute(
      sql`create trigger refuse_users before insert on users for each row execute function refuse_users()`,
    );
    try {
      logLines.length = 0;
      const res = await anonymous(t.app)
        .post('/api/auth/sign-up')
        .send({ name: 'Log Probe', email: 'log-probe@example.test', password: 'grid leak and a cathode bypass' });
      expect(res.status).toBe(500);
      const log = logLines.join('\n');
      expect(log).toMatch(/unhandled error/);
      expect(log).toMatch(/users are closed/);
      expect(log).toContain('insert into \\"users\\"'); // as JSON writes it
      expect(log).toContain('DrizzleQueryError');
      expect(log).not.toMatch(/\$argon2id/);
      expect(log).not.toMatch(/log-probe@example\.test/);
    } finally {
      await t.db.execute(sql`drop trigger refuse_users on users`);
      await t.db.execute(sql`drop function refuse_users()`);
    }
  });
});

describe('CSV export', () => {
  it('when a cell starts with =, +, -, @, a tab or a carriage return, then it is exported as text behind a quote', async () => {
    // OWASP, "CSV Injection": prefix such cells with a single quote so spreadsheets do not evaluate them.
    // (The API trims text, so a leading tab or carriage return arrives as the formula after it; the unit test
    // of neutraliseFormula covers those two characters.)
    const risky = {
      notes: '=HYPERLINK("http://evil.test","open")',
      source: '+1 555 0100',
      originalPart: '@SUM(A1:A9)',
      replacementPart: '-2+3',
      testedAfter: '\t=1+1',
      originalRating: '\r=2',
    };
    expect(
      (await tech.post(`/api/restorations/${restorationId}/parts`).send({ componentRef: 'CSV1', ...risky })).status,
    ).toBe(201);
    const res = await tech.get(`/api/restorations/${restorationId}/parts.csv`);
    const row = (parse(res.text, { bom: true, columns: true }) as Record<string, string>[]).find(
      (r) => r.Reference === 'CSV1',
    )!;
    expect(row.Notes).toBe(`'${risky.notes}`);
    expect(row.Source).toBe(`'${risky.source}`);
    expect(row['Original part']).toBe(`'${risky.originalPart}`);
    expect(row['Replacement part']).toBe(`'${risky.replacementPart}`);
    expect(row['Tested after']).toBe("'=1+1");
    expect(row['Original rating']).toBe("'=2");
    expect(row.Quantity).toBe('1');
  });
});

describe('uploads abandoned by the client', () => {
  it('when the client hangs up while the photo is being stored, then neither objects nor a row remain', async () => {
    const user = await createUser(t.db);
    const id = (await createRestoration(t.db, [{ userId: user.id, role: 'technician' }])).id;
    const cookie = (await (await signedIn(t.app, user)).get('/api/auth/me')).request.cookies;
    const server = t.app.listen(0, '127.0.0.1');
    await new Promise((r) => server.once('listening', r));
    const original = t.deps.storage.putObject;
    let hangUp = () => {};
    let puts = 0;
    t.deps.storage.putObject = async (...args) => {
      puts++;
      hangUp();
      await new Promise((r) => setTimeout(r, 300)); // the server notices the closed connection meanwhile
      return original(...args);
    };
    try {
      const boundary = 'gridleakboundary';
      const body = Buffer.concat([
        Buffer.from(
          `--${boundary}\r\nContent-Disposition: form-data; name="file"; filename="a.jpg"\r\nContent-Type: image/jpeg\r\n\r\n`,
        ),
        await twoToneJpeg(),
        Buffer.from(`\r\n--${boundary}--\r\n`),
      ]);
      const req = http.request({
        host: '127.0.0.1',
        port: (server.address() as AddressInfo).port,
        method: 'POST',
        path: `/api/restorations/${id}/photos`,
        headers: {
          Cookie: cookie,
          Origin: TEST_ORIGIN,
          'Content-Type': `multipart/form-data; boundary=${boundary}`,
          'Content-Length': body.length,
        },
      });
      req.on('error', () => {});
      hangUp = () => req.destroy();
      req.end(body);
      expect(await until(async () => puts > 0)).toBe(true);
      await new Promise((r) => setTimeout(r, 2000));
      expect((await t.db.select({ n: count() }).from(photos).where(eq(photos.restorationId, id)))[0]!.n).toBe(0);
      expect(await objectsUnder(`photos/${id}/`)).toEqual([]);
    } finally {
      t.deps.storage.putObject = original;
      await new Promise((r) => server.close(r));
    }
  });
});

describe('close-ups', () => {
  const mark = {
    shape: 'circle',
    points: [
      { x: 0.4, y: 0.4 },
      { x: 0.45, y: 0.4 },
    ],
    title: 'Scorched tag strip',
  };
  async function uploadedPhoto() {
    const res = await tech
      .post(`/api/restorations/${restorationId}/photos`)
      .attach('file', await twoToneJpeg(), 'chassis.jpg');
    expect(res.status).toBe(201);
    return (await t.db.select().from(photos).where(eq(photos.id, res.body.id)))[0]!;
  }

  it('when a finding is placed or moved, then its close-up is cut without anyone opening it', async () => {
    const photo = await uploadedPhoto();
    const created = (await tech.post(`/api/photos/${photo.id}/findings`).send(mark)).body;
    expect(await until(() => t.deps.storage.exists(closeupKey(photo, created)))).toBe(true);
    const moved = (
      await tech.patch(`/api/findings/${created.id}`).send({
        points: [
          { x: 0.6, y: 0.6 },
          { x: 0.65, y: 0.6 },
        ],
      })
    ).body;
    expect(closeupKey(photo, moved)).not.toBe(closeupKey(photo, created));
    expect(await until(() => t.deps.storage.exists(closeupKey(photo, moved)))).toBe(true);
  });

  it('when several requests want the same close-up at once, then the original is read and cut once', async () => {
    const photo = await uploadedPhoto();
    let reads = 0;
    const storage = { ...t.deps.storage, getObject: (key: string) => (reads++, t.deps.storage.getObject(key)) };
    const finding = { id: 900_001, shape: 'circle' as const, points: mark.points };
    const deps = { db: t.db, storage, config: t.deps.config };
    const keys = await Promise.all(Array.from({ length: 4 }, () => ensureCloseup(deps, photo, finding)));
    expect(new Set(keys).size).toBe(1);
    expect(reads).toBe(1);
  });

  it('when the original has more pixels than uploads may, then no close-up is cut from it', async () => {
    const photo = await uploadedPhoto();
    const finding = { id: 900_002, shape: 'circle' as const, points: mark.points };
    const deps = {
      db: t.db,
      storage: t.deps.storage,
      config: { ...t.deps.config, uploads: { maxBytes: 1e6, maxPixels: 10_000 } },
    };
    await expect(ensureCloseup(deps, photo, finding)).rejects.toThrow();
    expect(await t.deps.storage.exists(closeupKey(photo, finding))).toBe(false);
  });
});

describe('captured mail', () => {
  it('when a request reaches the app through a proxy, then captured mail is not served and not advertised', async () => {
    expect((await t.request().get('/api/dev/mail')).status).toBe(200);
    expect((await t.request().get('/api/dev/mail').set('X-Forwarded-For', '203.0.113.50')).status).toBe(404);
    expect((await t.request().get('/api/meta')).body.devMail).toBe(true);
    expect((await t.request().get('/api/meta').set('X-Forwarded-For', '203.0.113.50')).body.devMail).toBe(false);
  });
});

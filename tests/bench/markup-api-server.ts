/**
 * Child process for the markup API benchmark: the real app with one photo carrying 1,000 findings and
 * 5,000 comments across the restoration, and a bare Express route serving the same JSON from memory.
 * Prints one JSON line: { appPort, barePort, cookie, photoId }.
 */
import express from 'express';
import supertest from 'supertest';
import { comments, findings } from '../../server/db/schema';
import { createPhotoRow } from '../factories/photos';
import { createRestoration } from '../factories/restorations';
import { createUser } from '../factories/users';
import { startTestApp, TEST_ORIGIN } from '../support/test-app';

const t = await startTestApp();
const user = await createUser(t.db);
const r = await createRestoration(t.db, [{ userId: user.id, role: 'technician' }]);
const photoId = await createPhotoRow(t.db, r.id, true);
const shapes = ['pin', 'circle', 'rect', 'arrow'] as const;
const rows = Array.from({ length: 1000 }, (_, i) => {
  const shape = shapes[i % 4]!;
  const x = (i % 40) / 40 + 0.01;
  const y = Math.floor(i / 40) / 25 + 0.01;
  return {
    restorationId: r.id,
    photoId,
    number: i + 1,
    shape,
    points:
      shape === 'pin'
        ? [{ x, y }]
        : [
            { x, y },
            { x: x + 0.015, y: y + 0.02 },
          ],
    title: `Finding ${i + 1}`,
    componentRef: `R${i + 1}`,
    kind: 'note' as const,
    severity: 'info' as const,
    authorId: user.id,
  };
});
const ids = (await t.db.insert(findings).values(rows).returning({ id: findings.id })).map((f) => f.id);
for (let i = 0; i < 5000; i += 1000)
  await t.db.insert(comments).values(
    Array.from({ length: 1000 }, (_, j) => ({
      findingId: ids[(i + j) % ids.length]!,
      authorId: user.id,
      body: `Reading ${i + j}: 2${j % 10}0 V at the anode`,
    })),
  );
const signIn = await supertest(t.app)
  .post('/api/auth/sign-in')
  .set('Origin', TEST_ORIGIN)
  .send({ email: user.email, password: user.password });
const cookie = String(signIn.headers['set-cookie']![0]).split(';')[0]!;
const body = (await supertest(t.app).get(`/api/photos/${photoId}/findings`).set('Cookie', cookie)).text;

const bare = express();
bare.get('/findings', (_req, res) => res.type('application/json').send(body));
const listen = (app: express.Express) =>
  new Promise<number>((resolve) => {
    const s = app.listen(0, '127.0.0.1', () => resolve((s.address() as { port: number }).port));
  });
const [appPort, barePort] = [await listen(t.app), await listen(bare)];
console.log(JSON.stringify({ appPort, barePort, cookie, photoId, bytes: body.length }));
process.on('SIGTERM', () => void t.stop().then(() => process.exit(0)));

/**
 * Child process for the load test: the real app on a fresh test database with 10 restorations, each with
 * five technicians, a photo carrying 60 findings and a few comments. Prints one JSON line with the port,
 * a session cookie per person and the ids to use; answers `rss` messages with its memory use
 * (resident set, V8 heap, external and array buffers) once no request is in flight, after a full garbage collection.
 */
import supertest from 'supertest';
import { comments, findings } from '../../server/db/schema';
import { createPhotoRow } from '../factories/photos';
import { createRestoration } from '../factories/restorations';
import { createUser } from '../factories/users';
import { startTestApp, TEST_ORIGIN } from '../support/test-app';

const t = await startTestApp();
const people: { cookie: string; restorationId: number; photoId: number; findingId: number }[] = [];
for (let s = 0; s < 10; s++) {
  const users = await Promise.all(
    Array.from({ length: 5 }, (_, i) => createUser(t.db, { name: `Bench hand ${s}-${i}` })),
  );
  const r = await createRestoration(
    t.db,
    users.map((u) => ({ userId: u.id, role: 'technician' as const })),
    { make: 'Larkfield', model: `Model ${s}` },
  );
  const photoId = await createPhotoRow(t.db, r.id, true);
  const ids = (
    await t.db
      .insert(findings)
      .values(
        Array.from({ length: 60 }, (_, i) => ({
          restorationId: r.id,
          photoId,
          number: i + 1,
          shape: 'pin' as const,
          points: [{ x: (i % 10) / 10 + 0.05, y: Math.floor(i / 10) / 6 + 0.05 }],
          title: `Finding ${i + 1}`,
          componentRef: `C${i + 1}`,
          kind: 'note' as const,
          severity: 'info' as const,
          authorId: users[0]!.id,
        })),
      )
      .returning({ id: findings.id })
  ).map((f) => f.id);
  await t.db
    .insert(comments)
    .values(
      ids.slice(0, 20).map((findingId) => ({ findingId, authorId: users[1]!.id, body: 'Checked at 250 V, fine.' })),
    );
  for (const u of users) {
    const res = await supertest(t.app)
      .post('/api/auth/sign-in')
      .set('Origin', TEST_ORIGIN)
      .send({ email: u.email, password: u.password });
    if (res.status !== 200) throw new Error(`sign-in failed: ${res.status}`);
    people.push({
      cookie: String(res.headers['set-cookie']![0]).split(';')[0]!,
      restorationId: r.id,
      photoId,
      findingId: ids[0]!,
    });
  }
}
const server = t.app.listen(0, '127.0.0.1', () => {
  console.log(JSON.stringify({ port: (server.address() as { port: number }).port, people }));
});
// Requests still being answered: memory is read once none is, so work in flight (a queued upload's image buffers)
// is not counted as growth.
let inFlight = 0;
server.on('request', (_req, res) => {
  inFlight += 1;
  res.once('close', () => (inFlight -= 1));
});
process.on('message', (m) => {
  if (m !== 'rss') return;
  void (async () => {
    const asked = Date.now();
    while (inFlight > 0 && Date.now() - asked < 30_000) await new Promise((r) => setTimeout(r, 50));
    const waitedMs = Date.now() - asked;
    (globalThis as { gc?: () => void }).gc?.();
    process.send!({ ...process.memoryUsage(), waitedMs, inFlight });
  })();
});
process.on('SIGTERM', () => void t.stop().then(() => process.exit(0)));

/**
 * Child process for the photo benchmark: the real app (test database, s3rver, mail capture) listening on
 * a port, with a technician and a restoration ready. Prints one JSON line: { port, cookie, restorationId }.
 */
import supertest from 'supertest';
import { createRestoration } from '../factories/restorations';
import { createUser } from '../factories/users';
import { startTestApp, TEST_ORIGIN } from '../support/test-app';

const t = await startTestApp({ uploads: { maxBytes: 80 * 1024 * 1024, maxPixels: 100e6 } });
const user = await createUser(t.db);
const r = await createRestoration(t.db, [{ userId: user.id, role: 'technician' }]);
const signIn = await supertest(t.app)
  .post('/api/auth/sign-in')
  .set('Origin', TEST_ORIGIN)
  .send({ email: user.email, password: user.password });
const cookie = String(signIn.headers['set-cookie']![0]).split(';')[0];
const server = t.app.listen(0, '127.0.0.1', () => {
  const address = server.address();
  const port = typeof address === 'object' && address ? address.port : 0;
  console.log(JSON.stringify({ port, cookie, restorationId: r.id }));
});
process.on('SIGTERM', () => server.close(() => void t.stop().then(() => process.exit(0))));

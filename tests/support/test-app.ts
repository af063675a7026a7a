import { mkdtempSync, rmSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { pino } from 'pino';
import supertest from 'supertest';
import { createApp, type AppDeps } from '../../server/app';
import { startMailCapture } from '../../server/local-services/mail-capture';
import { startPaymentFake } from '../../server/local-services/payments/payment-fake';
import { startS3StandIn } from '../../server/local-services/s3-stand-in';
import { createPaymentService } from '../../server/features/payments/payment-service';
import { defaultThrottle } from '../../server/features/auth/throttle';
import { createMailer } from '../../server/mail';
import { createStorage } from '../../server/storage';
import { createTestDatabase } from './test-database';

export const TEST_ORIGIN = 'http://gridleak.test';

/** The real app on a fresh database, a real local S3 and a real SMTP capture, for one test file. */
export async function startTestApp(
  config: Partial<AppDeps['config']> = {},
  appOptions: Parameters<typeof createApp>[1] = {},
  services: { logger?: AppDeps['logger'] } = {},
) {
  const database = await createTestDatabase();
  const dir = mkdtempSync(path.join(os.tmpdir(), 'gridleak-s3-'));
  const s3 = await startS3StandIn(dir, 0, 'test-bucket');
  const capture = await startMailCapture(database.db, 0);
  // The payment fake posts its events nowhere until a test listens (`listen()`) and points it there.
  const paymentFake = await startPaymentFake({ port: 0 });
  const deps: AppDeps = {
    db: database.db,
    pool: database.pool,
    storage: createStorage({ ...s3, region: 'us-east-1' }),
    mailer: createMailer(capture.url, 'Gridleak <no-reply@gridleak.test>'),
    logger: services.logger ?? pino({ level: 'silent' }),
    payments: createPaymentService({
      secretKey: paymentFake.secretKey,
      webhookSecret: paymentFake.webhookSecret,
      api: paymentFake.api,
    }),
    config: {
      publicOrigin: TEST_ORIGIN,
      sessionSecret: 'test-secret-test-secret-test-secret-0123',
      demo: false,
      devMail: true,
      throttle: {
        ...defaultThrottle,
        signInPerAccount: 3,
        signInPerIp: 50,
        resetPerAccount: 2,
        resetPerIp: 50,
        signUpPerIp: 500,
      },
      uploads: { maxBytes: 40 * 1024 * 1024, maxPixels: 100e6 },
      notificationWindowSeconds: 180,
      ...config,
    },
  };
  const app = createApp(deps, appOptions);
  return {
    app,
    deps,
    db: database.db,
    request: () => supertest(app),
    paymentFake,
    async stop() {
      await paymentFake.close();
      await capture.close();
      await s3.close();
      await database.drop();
      rmSync(dir, { recursive: true, force: true });
    },
  };
}

import type pg from 'pg';
import type { Logger } from 'pino';
import type { Database } from './db/client';
import type { ThrottleConfig } from './features/auth/throttle';
import type { PaymentService } from './features/payments/payment-service';
import type { Mailer } from './mail';
import type { Storage } from './storage';

/** Everything the app needs from outside; tests build the app with real services of their own. */
export interface AppDeps {
  db: Database;
  /** The same pool as `db`, for the session store and the throttles. */
  pool: pg.Pool;
  storage: Storage;
  mailer: Mailer;
  logger: Logger;
  /** The hosted payment service's SDK (the real service, or the local fake) and its webhook signing secret. */
  payments: PaymentService;
  config: {
    /** e.g. https://gridleak.example.org; writes from other origins are refused, links in e-mail point here. */
    publicOrigin: string;
    sessionSecret: string;
    /** Demo mode lists the demo accounts on the sign-in page. */
    demo: boolean;
    /** GET /api/dev/mail is mounted (development and test only). */
    devMail: boolean;
    throttle: ThrottleConfig;
    uploads: { maxBytes: number; maxPixels: number };
    /** A person gets at most one notification e-mail per this many seconds. */
    notificationWindowSeconds: number;
  };
}

import type { Logger } from 'pino';
import type { Database } from './db/client';
import type { Mailer } from './mail';
import type { Storage } from './storage';

/** Everything the app needs from outside; tests build the app with real services of their own. */
export interface AppDeps {
  db: Database;
  storage: Storage;
  mailer: Mailer;
  logger: Logger;
  config: {
    /** e.g. https://gridleak.example.org; writes from other origins are refused. */
    publicOrigin: string;
    /** Demo mode lists demo accounts and allows the dev mail page. */
    demo: boolean;
    /** GET /api/dev/mail is mounted (development and test only). */
    devMail: boolean;
  };
}

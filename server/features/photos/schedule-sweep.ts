import type { Logger } from 'pino';
import type { Database } from '../../db/client';
import { redactedError } from '../../http/redact-error';
import type { Storage } from '../../storage';
import { sweepOrphanedObjects } from './sweep-orphans';

const EVERY_MS = 6 * 60 * 60 * 1000;

/** Sweeps orphaned photo objects shortly after start and every six hours; never keeps the process alive. */
export function scheduleSweep(db: Database, storage: Storage, logger: Logger): void {
  const run = () =>
    sweepOrphanedObjects(db, storage)
      .then((n) => n > 0 && logger.info(`removed ${n} orphaned photo objects`))
      .catch((err: unknown) => logger.warn({ err: redactedError(err) }, 'orphan sweep failed'));
  setTimeout(run, 30_000).unref();
  setInterval(run, EVERY_MS).unref();
}

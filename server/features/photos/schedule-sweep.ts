import type { Logger } from 'pino';
import type { Database } from '../../db/client';
import { redactedError } from '../../http/redact-error';
import type { Storage } from '../../storage';
import { sweepOrphanedSheetObjects } from '../sheets/sweep-sheet-orphans';
import { sweepOrphanedObjects } from './sweep-orphans';

const EVERY_MS = 6 * 60 * 60 * 1000;

/** Sweeps orphaned photo and service sheet objects shortly after start and every six hours; never keeps the process alive. */
export function scheduleSweep(db: Database, storage: Storage, logger: Logger): void {
  const run = () =>
    Promise.all([sweepOrphanedObjects(db, storage), sweepOrphanedSheetObjects(db, storage)])
      .then(
        ([photos, sheets]) =>
          photos + sheets > 0 &&
          logger.info(`removed ${photos} orphaned photo objects and ${sheets} service sheet objects`),
      )
      .catch((err: unknown) => logger.warn({ err: redactedError(err) }, 'orphan sweep failed'));
  setTimeout(run, 30_000).unref();
  setInterval(run, EVERY_MS).unref();
}

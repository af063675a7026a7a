import type { LabourLog } from '../../../shared/schemas/labour';
import type { Database, Tx } from '../../db/client';
import { unitOfWork } from '../../db/unit-of-work';
import { BadRequestError, ConflictError } from '../../http/errors';
import { recordEvent } from '../events/record-event';
import { lockRestoration } from '../restorations/lock-restoration';
import { labourRepo, type LabourRow as Row } from './labour.repo';

type Target = {
  findingId: number | null;
  stage: LabourLog['entries'][number]['stage'];
  note: string;
  billable: boolean;
};

const present = (e: Row, technician: string | null) => ({
  id: e.id,
  technician,
  findingId: e.findingId,
  stage: e.stage,
  note: e.note,
  billable: e.billable,
  startedAt: e.startedAt.toISOString(),
  stoppedAt: e.stoppedAt?.toISOString() ?? null,
  minutes: e.minutes,
});

/** Monday 00:00 UTC of the week `now` falls in (ISO 8601 weeks start on Monday). */
export function weekStart(now: Date): Date {
  const day = (now.getUTCDay() + 6) % 7;
  return new Date(Date.UTC(now.getUTCFullYear(), now.getUTCMonth(), now.getUTCDate() - day));
}

async function assertTarget(tx: Tx, restorationId: number, findingId: number | null) {
  await lockRestoration(tx, restorationId);
  if (findingId === null) return;
  if (!(await labourRepo(tx).findingOn(restorationId, findingId)))
    throw new BadRequestError('findingId: no such finding on this restoration.');
}

const logged = (tx: Tx, e: Row, actorId: number) =>
  recordEvent(tx, {
    restorationId: e.restorationId,
    kind: 'labour-logged',
    actorId,
    findingId: e.findingId,
    data: { labourEntryId: e.id, minutes: e.minutes, billable: e.billable },
  });

/** An entry's own fields, whether typed or timed. */
const entryOf = (restorationId: number, input: Target, userId: number) => ({
  restorationId,
  technicianId: userId,
  findingId: input.findingId,
  stage: input.stage,
  note: input.note,
  billable: input.billable,
});

/** The labour log: typed hours or a server-side timer; each finished entry writes its history line in the same transaction. */
export function labourService(db: Database) {
  const repo = labourRepo(db);
  async function log(restorationId: number, userId: number, now = new Date()): Promise<LabourLog> {
    const rows = await repo.entries(restorationId);
    const running = await repo.runningOf(userId);
    const week = await repo.week(restorationId, weekStart(now));
    return {
      entries: rows.map(({ e, by }) => present(e, by)),
      running: running ? { ...present(running.e, running.by), restorationId: running.e.restorationId } : null,
      week,
    };
  }

  return {
    log,

    async add(restorationId: number, input: Target & { minutes: number; workedAt?: string }, userId: number) {
      await unitOfWork(db, async (tx) => {
        await assertTarget(tx, restorationId, input.findingId);
        const at = input.workedAt ? new Date(input.workedAt) : new Date();
        const entries = labourRepo(tx);
        const e = await entries.insert({
          ...entryOf(restorationId, input, userId),
          startedAt: at,
          stoppedAt: at,
          minutes: input.minutes,
        });
        await logged(tx, e, userId);
      });
      return log(restorationId, userId);
    },

    /** Starts the reader's timer; the start time is the server's, so a reload or another device shows it running. */
    async start(restorationId: number, input: Target, userId: number) {
      await unitOfWork(db, async (tx) => {
        await assertTarget(tx, restorationId, input.findingId);
        const entries = labourRepo(tx);
        if (await entries.lockRunningId(userId))
          throw new ConflictError('Your timer is already running: stop it before starting another.');
        await entries.insert(entryOf(restorationId, input, userId));
      });
      return log(restorationId, userId);
    },

    /** Stops the reader's timer on this restoration and writes its minutes (at least one). */
    async stop(restorationId: number, userId: number) {
      await unitOfWork(db, async (tx) => {
        const entries = labourRepo(tx);
        const running = await entries.lockRunningOn(userId, restorationId);
        if (!running) throw new ConflictError('No timer of yours is running on this restoration.');
        const stoppedAt = new Date();
        const minutes = Math.max(1, Math.round((stoppedAt.getTime() - running.startedAt.getTime()) / 60_000));
        const e = await entries.stop(running.id, { stoppedAt, minutes });
        await logged(tx, e, userId);
      });
      return log(restorationId, userId);
    },
  };
}

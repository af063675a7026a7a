import type { z } from 'zod';
import { BenchInputError, parseQuantity } from '../../../shared/bench';
import type { SoakLog, SoakSession, soakStopSchema } from '../../../shared/schemas/safety';
import type { Database } from '../../db/client';
import { unitOfWork } from '../../db/unit-of-work';
import { BadRequestError, ConflictError } from '../../http/errors';
import { recordEvent } from '../events/record-event';
import { safetyRepo, type SoakRow as Row } from './safety.repo';

type Stop = z.output<typeof soakStopSchema>;
const HOUR_MS = 3_600_000;

const toSession = (r: Row, startedBy: string | null): SoakSession => ({
  id: r.id,
  startedAt: r.startedAt.toISOString(),
  endedAt: r.endedAt?.toISOString() ?? null,
  hours: r.endedAt ? (r.endedAt.getTime() - r.startedAt.getTime()) / HOUR_MS : null,
  ambientC: r.ambientC,
  chassisC: r.chassisC,
  mainsCurrentAmps: r.mainsCurrentAmps,
  faults: r.faults,
  actionTaken: r.actionTaken,
  findingId: r.findingId,
  startedBy,
});

function amps(text: string): number | null {
  if (!text) return null;
  try {
    return parseQuantity(text, { expectUnit: 'A' }).value;
  } catch (err) {
    if (err instanceof BenchInputError) throw new BadRequestError(`mainsCurrent: ${err.message}`);
    throw err;
  }
}

/** Soak runs: the clock is the server's, so a running session survives a reload or another device. */
export function soakService(db: Database) {
  const repo = safetyRepo(db);
  return {
    async log(restorationId: number): Promise<SoakLog> {
      const rows = await repo.soakSessions(restorationId);
      const sessions = rows.map((r) => toSession(r.s, r.by));
      const totalHours = sessions.reduce((sum, s) => sum + (s.hours ?? 0), 0);
      return { sessions, totalHours, running: sessions.find((s) => s.endedAt === null) ?? null };
    },
    /** Starts a session; one at a time per set (a unique index holds even under two clicks at once). */
    async start(restorationId: number, actorId: number): Promise<SoakLog> {
      if (await repo.runningSoak(restorationId))
        throw new ConflictError('A soak session is already running: stop it before starting another.');
      try {
        await unitOfWork(db, async (tx) => {
          const s = await safetyRepo(tx).startSoak(restorationId, actorId);
          await recordEvent(tx, {
            restorationId,
            kind: 'soak-session',
            actorId,
            data: { soakSessionId: s.id, started: true },
          });
        });
      } catch (err) {
        if (
          (err as { cause?: { code?: string }; code?: string }).cause?.code === '23505' ||
          (err as { code?: string }).code === '23505'
        )
          throw new ConflictError('A soak session is already running: stop it before starting another.');
        throw err;
      }
      return this.log(restorationId);
    },
    /**
     * Stops the running session with what was seen. A fault opens a finding (pinned at the middle of the chosen
     * photo, or the newest, for the technician to move), in the same transaction as the session and its history lines.
     */
    async stop(restorationId: number, input: Stop, actorId: number): Promise<SoakLog> {
      const mainsCurrentAmps = amps(input.mainsCurrent);
      await unitOfWork(db, async (tx) => {
        const soak = safetyRepo(tx);
        await soak.lockSet(restorationId);
        const running = await soak.runningSoak(restorationId);
        if (!running) throw new ConflictError('No soak session is running: start one first.');
        let findingId: number | null = null;
        if (input.faults) {
          const photo = await soak.photoFor(restorationId, input.photoId);
          if (!photo)
            throw new ConflictError(
              'A fault opens a finding pinned on a chassis photo: upload a photo first, then stop the session.',
            );
          const f = await soak.insertFinding({
            restorationId,
            photoId: photo.id,
            number: (await soak.topFindingNumber(restorationId)) + 1,
            shape: 'pin',
            points: [{ x: 0.5, y: 0.5 }],
            title: `Soak fault: ${input.faults}`.slice(0, 200),
            kind: 'hazard',
            severity: 'fault',
            authorId: actorId,
          });
          findingId = f.id;
          await recordEvent(tx, { restorationId, kind: 'finding-opened', actorId, findingId, photoId: photo.id });
        }
        const endedAt = new Date();
        await soak.endSoak(running.id, {
          endedAt,
          ambientC: input.ambientC ?? null,
          chassisC: input.chassisC ?? null,
          mainsCurrentText: input.mainsCurrent,
          mainsCurrentAmps,
          faults: input.faults,
          actionTaken: input.actionTaken,
          findingId,
        });
        const hours = (endedAt.getTime() - running.startedAt.getTime()) / HOUR_MS;
        await recordEvent(tx, {
          restorationId,
          kind: 'soak-session',
          actorId,
          data: { soakSessionId: running.id, findingId, hours, fault: input.faults !== '' },
        });
      });
      return this.log(restorationId);
    },
  };
}

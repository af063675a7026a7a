import { and, eq } from 'drizzle-orm';
import type { Role } from '../../../shared/permissions';
import type { ReadingAnswerInput, ReadingRequest, ReadingRequestInput } from '../../../shared/schemas/reading-requests';
import type { AppDeps } from '../../app-deps';
import { helpRequests, photos, restorations } from '../../db/schema';
import { unitOfWork } from '../../db/unit-of-work';
import { BadRequestError, ConflictError, NotFoundError } from '../../http/errors';
import { recordEvent } from '../events/record-event';
import { measurementsService } from '../measurements/measurements.service';
import { notificationsService } from '../notifications/notifications.service';
import { readingRequestsRepo } from './reading-requests.repo';

type Actor = { id: number; name: string; role: Role };
type Answer = { reading?: ReadingAnswerInput['reading']; photoId?: number; note: string };

/**
 * A mentor asks for something specific; it is a task on the technician's bench until answered with a reading,
 * a photo or a note, filed on the restoration and linked back. Each action is one transaction with its history
 * line and its notifications (mailed in the usual batches after the commit).
 */
export function readingRequestsService(deps: AppDeps) {
  const { db } = deps;
  const repo = readingRequestsRepo(deps);
  const notifications = notificationsService(deps);
  const readings = measurementsService(db);

  return {
    restorationOf: (id: number) => repo.restorationOf(id),
    list: (restorationId: number, role: Role) => repo.list(restorationId, role),
    bench: (userId: number) => repo.bench(userId),
    async create(restorationId: number, input: ReadingRequestInput, actor: Actor): Promise<ReadingRequest> {
      const id = await unitOfWork(db, async (tx, afterCommit) => {
        if (input.helpRequestId) {
          const [h] = await tx
            .select({ id: helpRequests.id })
            .from(helpRequests)
            .where(and(eq(helpRequests.id, input.helpRequestId), eq(helpRequests.restorationId, restorationId)));
          if (!h) throw new BadRequestError('helpRequestId: no such help request on this restoration.');
        }
        const [set] = await tx
          .select({ make: restorations.make, model: restorations.model })
          .from(restorations)
          .where(eq(restorations.id, restorationId));
        const row = await readingRequestsRepo({ ...deps, db: tx }).insert({
          restorationId,
          helpRequestId: input.helpRequestId ?? null,
          kind: input.kind,
          body: input.body,
          askedById: actor.id,
        });
        await recordEvent(tx, {
          restorationId,
          kind: 'reading-requested',
          actorId: actor.id,
          data: { readingRequestId: row.id, body: input.body },
        });
        await notifications.readingRequested(tx, { ...row, set: `${set!.make} ${set!.model}` }, actor);
        afterCommit(notifications.kick);
        return row.id;
      });
      return (await repo.one(id, actor.role))!;
    },
    async answer(id: number, input: Answer, actor: Actor): Promise<ReadingRequest> {
      await unitOfWork(db, async (tx, afterCommit) => {
        const inTx = readingRequestsRepo({ ...deps, db: tx });
        const current = await inTx.lock(id);
        if (!current) throw new NotFoundError();
        if (current.answeredAt) throw new ConflictError('This request was already answered.');
        if (input.photoId) {
          const [p] = await tx
            .select({ id: photos.id })
            .from(photos)
            .where(and(eq(photos.id, input.photoId), eq(photos.restorationId, current.restorationId)));
          if (!p) throw new BadRequestError('photoId: no such photo on this restoration.');
        }
        const measurementId = input.reading
          ? await readings.createIn(
              tx,
              current.restorationId,
              { ...input.reading, findingId: input.reading.findingId ?? null },
              actor.id,
            )
          : null;
        await inTx.answer(id, {
          answeredAt: new Date(),
          answeredById: actor.id,
          answerNote: input.note,
          measurementId,
          photoId: input.photoId ?? null,
        });
        await recordEvent(tx, {
          restorationId: current.restorationId,
          kind: 'reading-answered',
          actorId: actor.id,
          measurementId,
          photoId: input.photoId ?? null,
          data: { readingRequestId: id, body: current.body },
        });
        const said = [
          input.reading && `${input.reading.location} reads ${input.reading.reading}`,
          input.photoId && 'a photo',
          input.note,
        ]
          .filter(Boolean)
          .join('; ');
        await notifications.readingAnswered(tx, current, said, actor);
        afterCommit(notifications.kick);
      });
      return (await repo.one(id, actor.role))!;
    },
  };
}

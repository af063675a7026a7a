import { and, eq } from 'drizzle-orm';
import { findCause, findSymptom } from '../../../shared/bench/symptoms';
import type { Role } from '../../../shared/permissions';
import { causeResultLabels, type SymptomCheck, type SymptomCheckInput } from '../../../shared/schemas/symptom-checks';
import type { AppDeps } from '../../app-deps';
import { photos } from '../../db/schema';
import { unitOfWork } from '../../db/unit-of-work';
import { BadRequestError, NotFoundError } from '../../http/errors';
import { scheduleCloseup } from '../closeups/closeups';
import { recordEvent } from '../events/record-event';
import { openFindingIn } from '../findings/findings.service';
import { measurementsService } from '../measurements/measurements.service';
import { listSymptomChecks, symptomChecksRepo } from './symptom-checks.repo';

type Input = {
  result: SymptomCheckInput['result'];
  note: string;
  reading?: SymptomCheckInput['reading'];
  finding?: SymptomCheckInput['finding'];
};

/** The symptom checklist on one restoration: each cause ticked off with its result, its reading and its finding. */
export function symptomChecksService(deps: AppDeps) {
  const { db } = deps;
  const readings = measurementsService(db);
  return {
    list: (restorationId: number, role: Role) => listSymptomChecks(db, restorationId, role),
    /**
     * One action, one transaction: the check, the reading it files, the finding a confirmed cause opens (pinned in the
     * photo's middle, to be moved onto the part) and the history line commit together or not at all.
     */
    async record(
      restorationId: number,
      symptomId: string,
      causeId: string,
      input: Input,
      actorId: number,
      role: Role,
    ): Promise<SymptomCheck> {
      const cause = findCause(symptomId, causeId);
      if (!cause) throw new NotFoundError("No such cause on this symptom's checklist.");
      if (input.finding && input.result !== 'confirmed')
        throw new BadRequestError('finding: only a confirmed cause opens a finding.');
      await unitOfWork(db, async (tx, afterCommit) => {
        const current = await symptomChecksRepo(tx).lock(restorationId, symptomId, causeId);
        const measurementId = input.reading
          ? await readings.createIn(
              tx,
              restorationId,
              { ...input.reading, findingId: input.reading.findingId ?? null },
              actorId,
            )
          : (current?.measurementId ?? null);
        let findingId = current?.findingId ?? null;
        if (input.finding) {
          const [photo] = await tx
            .select()
            .from(photos)
            .where(and(eq(photos.id, input.finding.photoId), eq(photos.restorationId, restorationId)));
          if (!photo) throw new BadRequestError('finding.photoId: no such photo on this restoration.');
          findingId = await openFindingIn(
            tx,
            {
              restorationId,
              photoId: photo.id,
              shape: 'pin',
              points: [{ x: 0.5, y: 0.5 }],
              title: cause.cause.slice(0, 140),
              kind: 'note',
              severity: 'fault',
              status: 'confirmed',
              authorId: actorId,
            },
            actorId,
          );
          const finding = { id: findingId, shape: 'pin' as const, points: [{ x: 0.5, y: 0.5 }] };
          afterCommit(() => scheduleCloseup(deps, photo, finding));
        }
        await symptomChecksRepo(tx).upsert({
          restorationId,
          symptomId,
          causeId,
          result: input.result,
          note: input.note,
          measurementId,
          findingId,
          checkedById: actorId,
        });
        await recordEvent(tx, {
          restorationId,
          kind: 'cause-checked',
          actorId,
          measurementId,
          findingId,
          data: {
            symptom: findSymptom(symptomId)!.title,
            cause: cause.cause,
            result: causeResultLabels[input.result].toLowerCase(),
          },
        });
      });
      const all = await listSymptomChecks(db, restorationId, role, [symptomId]);
      return all.find((c) => c.causeId === causeId)!;
    },
  };
}
